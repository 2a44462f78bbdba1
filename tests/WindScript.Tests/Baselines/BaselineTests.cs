using System.Text;
using WindScript.Analysis;
using WindScript.Cli.Output;
using WindScript.Diagnostics;
using WindScript.Formatting;
using WindScript.Tests.Support;

namespace WindScript.Tests.Baselines;

/// <summary>
/// Snapshot tests: for every file in examples/ and tests/cases/, the diagnostics (each printed
/// under the line that caused it), the formatted text and the evaluated summary are compared
/// with tests/baselines/&lt;folder&gt;/&lt;name&gt;.txt (the eval part includes the MMF/field analysis to electrical order 13). Regenerate after an intended change with
/// tests/update-baselines.sh (WINDSCRIPT_UPDATE_BASELINES=1) and review the diff.
/// </summary>
public class BaselineTests
{
    public static TheoryData<string> Samples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles().Concat(Repo.CaseFiles())) data.Add(Path.GetRelativePath(Repo.Root, f));
        return data;
    }

    [Theory]
    [MemberData(nameof(Samples))]
    public void Matches_baseline(string relativePath)
    {
        var actual = Render(relativePath);
        var baseline = Path.Combine(Repo.Baselines, Path.GetDirectoryName(relativePath)!.Replace("tests" + Path.DirectorySeparatorChar, ""),
            Path.GetFileNameWithoutExtension(relativePath) + ".txt");
        if (Environment.GetEnvironmentVariable("WINDSCRIPT_UPDATE_BASELINES") == "1")
        {
            Directory.CreateDirectory(Path.GetDirectoryName(baseline)!);
            File.WriteAllText(baseline, actual);
            return;
        }
        Assert.True(File.Exists(baseline), $"no baseline {baseline}: run tests/update-baselines.sh");
        Assert.Equal(File.ReadAllText(baseline), actual);
    }

    [Fact]
    public void Every_baseline_has_its_source()
    {
        // A baseline whose example or case was renamed or removed would otherwise be kept, unchecked, for ever.
        var sources = new Dictionary<string, string> { ["examples"] = Repo.Examples, ["cases"] = Repo.Cases };
        var orphans = Directory.EnumerateFiles(Repo.Baselines, "*.txt", SearchOption.AllDirectories)
            .Where(b =>
            {
                var folder = Path.GetFileName(Path.GetDirectoryName(b)!);
                return !sources.TryGetValue(folder, out var dir) || !File.Exists(Path.Combine(dir, Path.GetFileNameWithoutExtension(b) + ".wind"));
            })
            .Select(b => Path.GetRelativePath(Repo.Root, b))
            .ToList();
        Assert.True(orphans.Count == 0, "baselines without a source (delete them or restore the source): " + string.Join(", ", orphans));
    }

    private static string Render(string relativePath)
    {
        var text = File.ReadAllText(Path.Combine(Repo.Root, relativePath));
        var c = Compilation.Compile(text, relativePath);
        var sb = new StringBuilder();
        sb.AppendLine("== diagnostics");
        foreach (var d in c.Diagnostics) AppendDiagnostic(sb, c, d);
        sb.AppendLine("== formatted");
        sb.Append(Formatter.Format(c.Syntax) ?? "(refused: syntax errors)\n");
        sb.AppendLine("== eval");
        if (c.Design is { } design)
        {
            using var writer = new StringWriter();
            EvalText.WriteSummary(writer, design);
            EvalAnalysisText.Write(writer, MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = 13 }));
            sb.Append(writer.ToString().Replace("\r\n", "\n"));
        }
        else
        {
            sb.AppendLine("(no design)");
        }
        return sb.ToString();
    }

    // The diagnostic under its source line, with carets under the span.
    private static void AppendDiagnostic(StringBuilder sb, Compilation c, Diagnostic d)
    {
        var start = c.Source.GetPosition(d.Span.Start);
        var end = c.Source.GetPosition(d.Span.End);
        string line = c.Source.GetLineText(start.Line);
        int width = end.Line == start.Line ? Math.Max(1, end.Character - start.Character) : Math.Max(1, line.Length - start.Character);
        sb.AppendLine($"{start.Line + 1,4} | {line}");
        sb.AppendLine($"     | {new string(' ', start.Character)}{new string('^', width)} {DiagnosticText.SeverityName(d.Severity)} {d.Code}: {d.Message}");
        foreach (var related in d.Related)
        {
            var at = c.Source.GetPosition(related.Span.Start);
            sb.AppendLine($"     |   related ({at.Line + 1},{at.Character + 1}): {related.Message}");
        }
        if (d.Fix is { } fix) sb.AppendLine($"     |   fix: {fix.Title}");
    }
}
