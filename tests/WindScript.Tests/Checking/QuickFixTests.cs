using WindScript.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Checking;

/// <summary>
/// Every quick fix repairs what it claims: applied to its file, the diagnostic it was offered
/// for is gone and no new error appears. Run over every example and every test case.
/// </summary>
public class QuickFixTests
{
    public static TheoryData<string> Files() => Repo.ExamplesAndCases();

    [Theory]
    [MemberData(nameof(Files))]
    public void Every_offered_fix_repairs_its_problem(string relativePath)
    {
        var text = File.ReadAllText(Path.Combine(Repo.Root, relativePath));
        var before = Compilation.Compile(text, relativePath);
        foreach (var d in before.Diagnostics.Where(d => d.Fix is not null))
            AssertRepairs(text, before, d);
    }

    internal static void AssertRepairs(string text, Compilation before, Diagnostic d)
    {
        var after = Compilation.Compile(Apply(text, d.Fix!.Edits));
        string context = $"fix '{d.Fix.Title}' for {d.Code} ({d.Message})";
        Assert.True(after.Diagnostics.Count(x => x.Code == d.Code) < before.Diagnostics.Count(x => x.Code == d.Code), context + " leaves the problem");
        // A file with several mistakes may show another once this one is fixed, but a fix never adds errors.
        int errorsBefore = before.Diagnostics.Count(x => x.Severity == Severity.Error);
        int errorsAfter = after.Diagnostics.Count(x => x.Severity == Severity.Error);
        Assert.True(errorsAfter <= errorsBefore, $"{context} leaves {errorsAfter} errors where there were {errorsBefore}:\n{string.Join("\n", after.Diagnostics)}");
        if (errorsBefore == 1 && d.Severity == Severity.Error) Assert.False(after.HasErrors, context + " leaves errors: " + string.Join("\n", after.Diagnostics));
    }

    [Theory]
    [InlineData("check_coil_in_wrong_phase.wind", "WS3008", "Move the coil to phase V")]
    [InlineData("check_coil_reversed.wind", "WS3009", "Reverse the coil")]
    [InlineData("check_coils_swapped.wind", "WS3009", "Exchange the phases of the two coils")]
    [InlineData("check_coil_turns_differ.wind", "WS3008", "Give the coil 12 turns")]
    [InlineData("check_pattern_entry_in_wrong_phase.wind", "WS3008", "Move the coil to phase V")]
    public void The_repair_the_mistake_needs_is_offered(string file, string code, string title)
    {
        var c = Compilation.Compile(File.ReadAllText(Path.Combine(Repo.Root, "tests", "cases", file)));
        var d = Assert.Single(c.Diagnostics, x => x.Severity == Severity.Error);
        Assert.Equal(code, d.Code);
        Assert.Equal(title, d.Fix?.Title);
        Assert.NotEmpty(d.Related);
    }

    internal static string Apply(string text, IEnumerable<TextEdit> edits)
    {
        foreach (var e in edits.OrderByDescending(e => e.Span.Start))
            text = text[..e.Span.Start] + e.NewText + text[e.Span.End..];
        return text;
    }
}
