using WindScript.Diagnostics;
using WindScript.Syntax;

namespace WindScript.Checking;

/// <summary>
/// A quick fix is offered only if it repairs: the edited text is compiled again and must be free
/// of the problem the fix is for, of winding errors (WS3xxx: the winding checks that offer fixes
/// run only when none were found before them) and of any error the original did not have. The
/// inner compilation verifies no fixes of its own.
/// </summary>
internal static class FixVerifier
{
    [ThreadStatic] private static bool _verifying;

    /// <summary>True while a fix is being re-checked (then no fix is verified).</summary>
    public static bool Verifying => _verifying;

    public static bool Repairs(CheckContext c, SyntaxTree tree, IReadOnlyList<TextEdit> edits, Func<Diagnostic, bool> sameProblem)
    {
        if (_verifying || edits.Count == 0) return false;
        string text = RepairEdits.Apply(tree.Source.Text, edits);
        _verifying = true;
        try
        {
            var before = c.OtherErrors ??= OtherErrors(Compilation.Compile(tree.Source));
            var after = Compilation.Compile(text, tree.Source.Path);
            return !after.Diagnostics.Any(sameProblem)
                && !after.Diagnostics.Any(d => d.Severity == Severity.Error && d.Code.StartsWith("WS3", StringComparison.Ordinal))
                && OtherErrors(after).IsSubsetOf(before);
        }
        finally
        {
            _verifying = false;
        }
    }

    // Errors outside the winding checks, by code and message (their spans may move with the edit).
    private static HashSet<string> OtherErrors(Compilation compilation) =>
        compilation.Diagnostics.Where(d => d.Severity == Severity.Error && !d.Code.StartsWith("WS3", StringComparison.Ordinal))
            .Select(d => d.Code + " " + d.Message).ToHashSet();
}
