using System.Text.Json.Nodes;
using Json.Schema;
using WindScript.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

public class SarifAndExplainTests
{
    // The SARIF 2.1.0 schema, vendored from an npm package (see Resources/SOURCES.md).
    private static readonly JsonSchema Schema = JsonSchema.FromFile(Path.Combine(AppContext.BaseDirectory, "Resources", "sarif-2.1.0.json"));

    private static EvaluationResults Validate(string json) =>
        Schema.Evaluate(System.Text.Json.JsonDocument.Parse(json).RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });

    [Fact]
    public void Sarif_output_for_files_with_findings_validates_against_the_schema()
    {
        var files = Repo.CaseFiles().Take(40).Concat(Repo.ExampleFiles()).ToArray();
        var r = CliRunner.Run(["check", "--format", "sarif", .. files]);
        Assert.Equal(1, r.Exit);
        var result = Validate(r.Out);
        Assert.True(result.IsValid, string.Join("\n", (result.Details ?? []).Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}")).Take(10)));
    }

    [Fact]
    public void Sarif_has_every_rule_with_help_and_results_with_locations_and_fixes()
    {
        var path = Path.Combine(Repo.Cases, "check_turn_counts.wind");
        var r = CliRunner.Run("check", "--format", "sarif", path);
        var root = JsonNode.Parse(r.Out)!;
        var run = root["runs"]![0]!;
        var rules = run["tool"]!["driver"]!["rules"]!.AsArray();
        Assert.Equal(DiagnosticCatalog.All.Count, rules.Count);
        Assert.All(rules, rule => Assert.False(string.IsNullOrEmpty((string?)rule!["help"]!["text"])));
        var result = run["results"]!.AsArray().First(x => (string?)x!["ruleId"] == "WS3005")!;
        Assert.Equal("error", (string?)result["level"]);
        var region = result["locations"]![0]!["physicalLocation"]!["region"]!;
        Assert.Equal(13, (int)region["startLine"]!);
        Assert.Equal(3, (int)region["startColumn"]!);
        Assert.Equal("20", (string?)result["fixes"]![0]!["artifactChanges"]![0]!["replacements"]![0]!["insertedContent"]!["text"]);
    }

    [Fact]
    public void The_schema_rejects_a_broken_log()
    {
        // Guards the guard: a log without 'runs' must fail validation.
        Assert.False(Validate("""{ "version": "2.1.0" }""").IsValid);
    }

    [Fact]
    public void Explain_lists_every_code_and_explains_one()
    {
        var list = CliRunner.Run("explain");
        Assert.Equal(0, list.Exit);
        Assert.All(DiagnosticCatalog.All, d => Assert.Contains(d.Code, list.Out));
        var one = CliRunner.Run("explain", "WS3007");
        Assert.Equal(0, one.Exit);
        Assert.Contains("Parallel paths would carry circulating currents", one.Out);
        Assert.Contains("Pyrhonen", one.Out);
        Assert.Equal(2, CliRunner.Run("explain", "WS9999").Exit);
    }

    [Fact]
    public void Fixes_applied_to_the_source_remove_the_diagnostic()
    {
        foreach (var file in new[] { "check_turn_counts.wind", "check_opposing_coil.wind", "check_drives.wind", "units_and_dimensions.wind" })
        {
            var text = File.ReadAllText(Path.Combine(Repo.Cases, file));
            var before = Compilation.Compile(text);
            foreach (var d in before.Diagnostics.Where(d => d.Fix is not null))
            {
                var edits = d.Fix!.Edits.OrderByDescending(e => e.Span.Start);
                var fixedText = edits.Aggregate(text, (t, e) => t.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText));
                var after = Compilation.Compile(fixedText);
                int count(Compilation c) => c.Diagnostics.Count(x => x.Code == d.Code);
                Assert.True(count(after) < count(before), $"{file}: the fix '{d.Fix.Title}' for {d.Code} did not remove it");
            }
        }
    }
}
