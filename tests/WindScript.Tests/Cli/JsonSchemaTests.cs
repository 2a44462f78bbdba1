using System.Reflection;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// Every JSON output has a schema under schemas/ and validates against it (JsonSchema.Net), and
/// the public field names are spelled out by the output types, never derived from core names.
/// </summary>
public class JsonSchemaTests
{
    public static TheoryData<string> Inputs() => Repo.ExamplesAndCases();

    [Fact]
    public void Every_output_has_a_schema_and_every_schema_closes_its_objects()
    {
        Assert.Equal(["check.schema.json", "diagnostic.schema.json", "diff.schema.json", "eval.schema.json", "sweep-record.schema.json"],
            Schemas.Names().ToArray());
        foreach (var name in Schemas.Names())
        {
            var open = new List<string>();
            FindOpenObjects(JsonNode.Parse(File.ReadAllText(Path.Combine(Schemas.Folder, name)))!, "#", open);
            Assert.True(open.Count == 0, $"{name}: objects without additionalProperties false: {string.Join(", ", open)}");
        }
    }

    [Theory]
    [MemberData(nameof(Inputs))]
    public void Check_json_of_every_example_and_case_validates(string file)
    {
        var r = CliRunner.Run("check", Path.Combine(Repo.Root, file), "--format", "json");
        Assert.True(r.Exit is 0 or 1, r.Err);
        Assert.Empty(Schemas.Problems("check.schema.json", r.Out));
    }

    [Theory]
    [MemberData(nameof(Inputs))]
    public void Eval_json_of_every_example_and_case_validates_even_with_errors(string file)
    {
        var r = CliRunner.Run("eval", Path.Combine(Repo.Root, file), "--format", "json", "--orders", "5");
        if (!r.Out.TrimStart().StartsWith('{')) return;   // no design: diagnostics on standard error only
        var schema = r.Out.Contains("\"schemaVersion\"") ? "eval.schema.json" : "check.schema.json";
        var problems = Schemas.Problems(schema, r.Out);
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    [Fact]
    public void Diff_json_validates_for_every_pair_of_examples_and_for_a_file_against_itself()
    {
        var examples = Repo.ExampleFiles().ToArray();
        for (int i = 0; i < examples.Length; i++)
        {
            var other = examples[(i + 1) % examples.Length];
            foreach (var (a, b) in new[] { (examples[i], other), (examples[i], examples[i]) })
            {
                var r = CliRunner.Run("diff", a, b, "--format", "json");
                Assert.True(r.Exit is 0 or 1, r.Err);
                Assert.Empty(Schemas.Problems("diff.schema.json", r.Out));
            }
        }
    }

    [Fact]
    public void Every_sweep_record_validates()
    {
        var r = CliRunner.Run("sweep", "--slots", "6..30", "--poles", "2..12", "--orders", "7");
        Assert.Equal(0, r.Exit);
        var lines = r.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.True(lines.Length > 20);
        foreach (var line in lines) Assert.Empty(Schemas.Problems("sweep-record.schema.json", line));
    }

    [Fact]
    public void The_validator_refuses_an_undocumented_field_a_missing_field_and_a_wrong_type()
    {
        var r = CliRunner.Run("eval", Path.Combine(Repo.Examples, "scooter_hub_12s10p.wind"), "--format", "json");
        var extra = JsonNode.Parse(r.Out)!.AsObject();
        extra["machine"]!.AsObject()["surprise"] = 1;
        Assert.NotEmpty(Schemas.Problems("eval.schema.json", extra.ToJsonString()));
        var missing = JsonNode.Parse(r.Out)!.AsObject();
        missing.Remove("gap");
        Assert.NotEmpty(Schemas.Problems("eval.schema.json", missing.ToJsonString()));
        var wrong = JsonNode.Parse(r.Out)!.AsObject();
        wrong["machine"]!.AsObject()["slots"] = "twelve";
        Assert.NotEmpty(Schemas.Problems("eval.schema.json", wrong.ToJsonString()));
    }

    // Renaming a C# property must never rename a public field: each property of an output type
    // names its field itself.
    [Fact]
    public void Every_property_of_the_eval_output_types_names_its_json_field()
    {
        var types = typeof(WindScript.Cli.CliApp).Assembly.GetTypes()
            .Where(t => t.Namespace == "WindScript.Cli.Output.Json" && t.IsPublic && !t.IsAbstract).ToArray();
        Assert.True(types.Length >= 10);
        foreach (var type in types)
            foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
                Assert.True(property.GetCustomAttribute<JsonPropertyNameAttribute>() is not null,
                    $"{type.Name}.{property.Name} has no [JsonPropertyName]");
    }

    private static void FindOpenObjects(JsonNode node, string path, List<string> open)
    {
        if (node is JsonObject o)
        {
            bool isObject = o["type"] is JsonValue t && t.ToString() == "object"
                || o["type"] is JsonArray types && types.Any(x => x?.ToString() == "object");
            if (isObject && o["additionalProperties"]?.GetValueKind() != JsonValueKind.False) open.Add(path);
            foreach (var (key, child) in o)
                if (child is not null) FindOpenObjects(child, $"{path}/{key}", open);
        }
        else if (node is JsonArray a)
        {
            for (int i = 0; i < a.Count; i++)
                if (a[i] is { } child) FindOpenObjects(child, $"{path}/{i}", open);
        }
    }
}
