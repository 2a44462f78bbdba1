using System.Text.Json;
using System.Text.RegularExpressions;
using WindScript.Reporting.Report;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// docs/quantities.md is the one table of names, units and meanings; the outputs follow it.
/// These checks catch the drift the table was written against: a JSON field the table names that no
/// schema has, MMF written in "ampere-turns" in one output and "A" in another, the differential
/// leakage coefficient shown as a percentage in one place and a fraction in another.
/// </summary>
public class QuantityTableTests
{
    private static readonly string Table = File.ReadAllText(Path.Combine(Repo.Root, "docs", "quantities.md"));

    /// <summary>The JSON field names of the table's last column (backticked, the last dotted part).</summary>
    private static IEnumerable<string> JsonFields() =>
        Table.Split('\n').Where(l => l.StartsWith("| ", StringComparison.Ordinal) && !l.StartsWith("| ---", StringComparison.Ordinal) && !l.StartsWith("| quantity", StringComparison.Ordinal))
            .Select(l => l.TrimEnd().TrimEnd('|').Split('|')[^1])
            .SelectMany(cell => Regex.Matches(cell, "`([^`]+)`").Select(m => m.Groups[1].Value))
            .Select(f => f.Split('.')[^1].Replace("[]", "").TrimEnd('…'))
            .Where(f => f.Length > 0 && !f.EndsWith("At", StringComparison.Ordinal) || f == "fluxTubeDeviationAt");

    [Fact]
    public void Every_json_field_the_table_names_is_in_a_schema()
    {
        var schemas = string.Join("\n", Directory.EnumerateFiles(Path.Combine(Repo.Root, "schemas"), "*.schema.json").Select(File.ReadAllText));
        var fields = JsonFields().Distinct().ToArray();
        Assert.True(fields.Length >= 20, $"read only {fields.Length} fields from the table");
        foreach (var field in fields)
            Assert.True(schemas.Contains($"\"{field}", StringComparison.Ordinal), $"docs/quantities.md names JSON field '{field}', which no schema under schemas/ has");
    }

    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_output_writes_mmf_in_amperes_and_the_leakage_coefficient_as_a_fraction(string example)
    {
        var path = Path.Combine(Repo.Examples, example);
        var text = File.ReadAllText(path);
        var outputs = new Dictionary<string, string>
        {
            ["eval"] = CliRunner.Run("eval", path).Out,
            ["eval json"] = CliRunner.Run("eval", path, "--format", "json").Out,
            ["eval csv"] = CliRunner.Run("eval", path, "--format", "csv").Out,
            ["show"] = CliRunner.Run("show", path).Out,
            ["report"] = Regex.Replace(HtmlReport.Render(Compilation.Compile(text, example), example), "<[^>]+>", " "),
        };
        foreach (var (name, output) in outputs)
        {
            Assert.False(string.IsNullOrWhiteSpace(output), $"{name} wrote nothing");
            // One unit for MMF: A (the ampere-turn is the same unit under another name: the table says A).
            var turns = Regex.Match(output, @".{0,40}((?i:ampere-turns?)|\bA-turns?\b|\d At\b).{0,20}");
            Assert.False(turns.Success, $"{name}: '{turns.Value}'");
            // The differential leakage coefficient is a fraction everywhere, never a percentage.
            var percent = Regex.Match(output, @"differential leakage[^\n%]{0,40}\d\s*%", RegexOptions.IgnoreCase);
            Assert.False(percent.Success, $"{name}: '{percent.Value}'");
        }

        // And the same fraction: eval's JSON figure is the one show prints (to its printed digits).
        using var json = JsonDocument.Parse(outputs["eval json"]);
        if (json.RootElement.TryGetProperty("differentialLeakage", out var sigma) && sigma.ValueKind == JsonValueKind.Number)
        {
            var shown = Regex.Match(outputs["show"], @"differential leakage coefficient: ([0-9.eE+-]+)");
            Assert.True(shown.Success, "show prints no differential leakage coefficient");
            // show writes six significant digits and at most six decimals: within half a unit of the last.
            double inJson = sigma.GetDouble(), inShow = double.Parse(shown.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
            Assert.True(Math.Abs(inJson - inShow) <= 5.01e-7 + 5e-6 * Math.Abs(inJson), $"eval JSON {inJson}, show {inShow}");
        }
    }
}
