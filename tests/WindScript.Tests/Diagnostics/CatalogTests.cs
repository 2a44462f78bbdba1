using System.Text.RegularExpressions;
using WindScript.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Diagnostics;

/// <summary>The catalogue: codes unique, well-formed, documented, and each produced by some test case.</summary>
public class CatalogTests
{
    [Fact]
    public void Codes_are_unique_and_well_formed()
    {
        var codes = DiagnosticCatalog.All.Select(d => d.Code).ToArray();
        Assert.Equal(codes.Length, codes.Distinct().Count());
        Assert.All(codes, c => Assert.Matches(new Regex("^WS[1-6][0-9]{3}$"), c));
    }

    [Fact]
    public void Every_code_has_a_title_and_a_long_explanation()
    {
        foreach (var d in DiagnosticCatalog.All)
        {
            Assert.False(string.IsNullOrWhiteSpace(d.Title), d.Code);
            Assert.True(d.Explanation.Length >= 80, $"{d.Code} needs a longer explanation");
        }
    }

    [Fact]
    public void Every_code_is_produced_by_a_case_file()
    {
        var produced = Repo.CaseFiles()
            .SelectMany(f => Compilation.Compile(File.ReadAllText(f), f).Diagnostics)
            .Select(d => d.Code)
            .ToHashSet();
        var missing = DiagnosticCatalog.All.Select(d => d.Code).Where(c => !produced.Contains(c) && !ProducedOutsideFiles.Contains(c)).ToArray();
        Assert.True(missing.Length == 0, "no case under tests/cases/ produces " + string.Join(", ", missing));
    }

    /// <summary>Codes that no small case file can produce: only 'windscript synth' (no .wind input), or
    /// only a file over 1 MiB (WS1020; <c>LimitTests</c> triggers it).</summary>
    private static readonly HashSet<string> ProducedOutsideFiles = ["WS6003", "WS6004", "WS1020"];

    [Fact]
    public void No_check_fires_on_any_example_except_information()
    {
        foreach (var file in Repo.ExampleFiles())
        {
            var c = Compilation.Compile(File.ReadAllText(file), file);
            Assert.True(c.Diagnostics.All(d => d.Severity == Severity.Info),
                $"{Path.GetFileName(file)}: " + string.Join("; ", c.Diagnostics.Select(d => $"{d.Code} {d.Message}")));
        }
    }

    [Fact]
    public void Syntax_errors_do_not_hide_physical_problems_in_the_parts_that_parsed()
    {
        var c = Compilation.Compile(File.ReadAllText(Path.Combine(Repo.Cases, "syntax_and_physics.wind")));
        var codes = c.Diagnostics.Select(d => d.Code).ToArray();
        Assert.Equal(["WS5001", "WS3002", "WS1001", "WS4002"], codes);
    }
}
