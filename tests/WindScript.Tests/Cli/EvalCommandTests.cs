using System.Globalization;
using System.Text.Json;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

public class EvalCommandTests
{
    private static string Example(string name) => Path.Combine(Repo.Examples, name);

    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    private static readonly Lazy<JsonElement> Schema = new(() =>
        JsonDocument.Parse(File.ReadAllText(Path.Combine(Repo.Root, "schemas", "eval.schema.json"))).RootElement);

    // Every example's JSON validates against schemas/eval.schema.json (types, required fields,
    // enums), and the schema documents every field the output has.
    [Theory]
    [MemberData(nameof(Examples))]
    public void Json_output_of_every_example_validates_against_the_schema(string example)
    {
        var r = CliRunner.Run("eval", Example(example), "--format", "json", "--orders", "9", "--at", "1.5ms");
        Assert.True(r.Exit == 0, r.Err);
        using var doc = JsonDocument.Parse(r.Out);
        var problems = new List<string>();
        Validate(doc.RootElement, Schema.Value, "$", problems);
        Assert.Empty(problems);
        Assert.Equal(0.0015, doc.RootElement.GetProperty("drives")[0].GetProperty("time").GetDouble(), 12);
    }

    [Fact]
    public void Json_carries_the_figures_the_issue_names()
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json");
        var root = JsonDocument.Parse(r.Out).RootElement;
        var machine = root.GetProperty("machine");
        Assert.Equal(48, machine.GetProperty("slots").GetInt32());
        Assert.Equal(2, machine.GetProperty("periodicity").GetInt32());
        Assert.Equal(48, machine.GetProperty("coggingOrder").GetInt32());
        var u = root.GetProperty("phases")[0];
        Assert.Equal(48, u.GetProperty("conductors").GetArrayLength());
        var h = u.GetProperty("harmonics")[0];
        Assert.Equal(2, h.GetProperty("order").GetInt32());
        Assert.Equal(1, h.GetProperty("electricalOrder").GetDouble());
        // 48 slots, 4 poles, q = 4, pitch 10/12: k_d1·k_p1 = 0.9577 × 0.9659 (Pyrhonen et al. ch. 2).
        Assert.Equal(0.9250, h.GetProperty("windingFactor").GetDouble(), 4);
        Assert.True(root.GetProperty("differentialLeakage").GetDouble() > 0);
        var wave = root.GetProperty("drives")[0].GetProperty("harmonics")[0];
        Assert.Equal("forward", wave.GetProperty("kind").GetString());
        Assert.Equal(JsonValueKind.Array, root.GetProperty("diagnostics").ValueKind);
    }

    [Fact]
    public void A_drive_in_the_reverse_sequence_makes_a_backward_fundamental()
    {
        var text = File.ReadAllText(Example("mill_fan_lap.wind")) + "\ndrive reversed {\n  balanced sine 38 A rms at 50 Hz sequence U W V\n}\n";
        var r = CliRunner.RunWithInput(text, "eval", "-", "--format", "json");
        var reversed = JsonDocument.Parse(r.Out).RootElement.GetProperty("drives").EnumerateArray().Single(d => d.GetProperty("name").GetString() == "reversed");
        var fundamental = reversed.GetProperty("harmonics").EnumerateArray().First(w => w.GetProperty("order").GetInt32() == 2);
        Assert.Equal("backward", fundamental.GetProperty("kind").GetString());
        Assert.Equal("<stdin>", JsonDocument.Parse(r.Out).RootElement.GetProperty("file").GetString());
    }

    [Fact]
    public void Orders_limits_the_highest_electrical_order()
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json", "--orders", "7");
        var orders = JsonDocument.Parse(r.Out).RootElement.GetProperty("phases")[0].GetProperty("harmonics").EnumerateArray()
            .Select(h => h.GetProperty("electricalOrder").GetDouble()).ToArray();
        Assert.Equal([1.0, 3, 5, 7], orders);
    }

    [Fact]
    public void Text_shows_the_analysis_tables_and_assumptions()
    {
        var r = CliRunner.Run("eval", Example("scooter_hub_12s10p.wind"), "--orders", "5");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("winding factors (every phase)", r.Out);
        Assert.Matches(@"\n\s+5\s+1\.000\s+0\.9330\s", r.Out);      // 12 slots / 10 poles: 0.933 (Cros & Viarouge 2002)
        Assert.Contains("differential leakage", r.Out);
        Assert.Contains("Carter coefficient", r.Out);
        Assert.Contains("ideal iron", r.Out);
        Assert.Contains("drive cruise at t = 0 s", r.Out);
    }

    [Fact]
    public void Csv_has_one_row_per_harmonic()
    {
        var r = CliRunner.Run("eval", Example("pump_skid_single_layer.wind"), "--format", "csv", "--orders", "5");
        Assert.True(r.Exit == 0, r.Err);
        var lines = r.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("kind,name,order,electricalOrder,windingFactor", lines[0]);
        int columns = lines[0].Split(',').Length;
        Assert.All(lines, l => Assert.Equal(columns, l.Split(',').Length));
        var fundamental = lines.First(l => l.StartsWith("phase,U,2,")).Split(',');
        Assert.Equal(0.9659, double.Parse(fundamental[4], CultureInfo.InvariantCulture), 4);   // q = 2 single layer: k_d1 (Pyrhonen ch. 2)
    }

    [Theory]
    [InlineData("--at", "soon")]
    [InlineData("--orders", "0")]
    [InlineData("--format", "xml")]
    public void Bad_options_are_usage_errors(string option, string value)
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), option, value);
        Assert.Equal(2, r.Exit);
        Assert.True(r.Err.Contains(option) || r.Err.Contains(value), r.Err);
    }

    [Theory]
    [InlineData("0", 0)]
    [InlineData("0.004", 0.004)]
    [InlineData("2.5ms", 0.0025)]
    [InlineData("250 us", 0.00025)]
    [InlineData("1s", 1)]
    public void At_accepts_seconds_with_an_optional_unit(string text, double seconds) =>
        Assert.Equal(seconds, WindScript.Cli.Commands.EvalCommand.ParseTime(text)!.Value, 15);

    // A small JSON Schema checker: type (with null), required, properties, items, enum; and every
    // property present in the output must be documented in the schema.
    private static void Validate(JsonElement value, JsonElement schema, string path, List<string> problems)
    {
        if (schema.TryGetProperty("enum", out var options))
        {
            if (!options.EnumerateArray().Any(o => o.ToString() == value.ToString())) problems.Add($"{path}: {value} not in enum");
            return;
        }
        if (schema.TryGetProperty("type", out var type))
        {
            var types = type.ValueKind == JsonValueKind.Array ? type.EnumerateArray().Select(t => t.GetString()!).ToArray() : [type.GetString()!];
            if (value.ValueKind == JsonValueKind.Null)
            {
                if (!types.Contains("null")) problems.Add($"{path}: null where {string.Join("|", types)} expected");
                return;
            }
            if (!types.Any(t => Is(value, t))) { problems.Add($"{path}: {value.ValueKind} where {string.Join("|", types)} expected"); return; }
        }
        if (value.ValueKind == JsonValueKind.Object)
        {
            if (schema.TryGetProperty("required", out var required))
                foreach (var name in required.EnumerateArray())
                    if (!value.TryGetProperty(name.GetString()!, out _)) problems.Add($"{path}: missing required '{name.GetString()}'");
            var properties = schema.TryGetProperty("properties", out var p) ? p : default;
            foreach (var property in value.EnumerateObject())
            {
                if (properties.ValueKind != JsonValueKind.Object || !properties.TryGetProperty(property.Name, out var sub))
                    problems.Add($"{path}.{property.Name}: not documented in the schema");
                else Validate(property.Value, sub, $"{path}.{property.Name}", problems);
            }
        }
        if (value.ValueKind == JsonValueKind.Array && schema.TryGetProperty("items", out var items))
        {
            int i = 0;
            foreach (var element in value.EnumerateArray()) Validate(element, items, $"{path}[{i++}]", problems);
        }
    }

    private static bool Is(JsonElement value, string type) => type switch
    {
        "object" => value.ValueKind == JsonValueKind.Object,
        "array" => value.ValueKind == JsonValueKind.Array,
        "string" => value.ValueKind == JsonValueKind.String,
        "boolean" => value.ValueKind is JsonValueKind.True or JsonValueKind.False,
        "number" => value.ValueKind == JsonValueKind.Number,
        "integer" => value.ValueKind == JsonValueKind.Number && value.TryGetInt64(out _),
        "null" => value.ValueKind == JsonValueKind.Null,
        _ => false,
    };
}
