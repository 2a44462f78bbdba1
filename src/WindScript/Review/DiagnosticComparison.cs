using System.Collections.Immutable;
using WindScript.Diagnostics;

namespace WindScript.Review;

/// <summary>
/// Diagnostics that appeared or disappeared, compared by code and message (not position, which
/// moves whenever lines are added above). Repeated findings are matched one for one.
/// </summary>
internal static class DiagnosticComparison
{
    public static ImmutableArray<DiagnosticChange> Compare(Compilation? a, Compilation? b)
    {
        var before = a?.Diagnostics ?? [];
        var after = b?.Diagnostics ?? [];
        var changes = ImmutableArray.CreateBuilder<DiagnosticChange>();
        AddUnmatched(before, after, a, added: false, changes);
        AddUnmatched(after, before, b, added: true, changes);
        return changes.ToImmutable();
    }

    private static void AddUnmatched(IReadOnlyList<Diagnostic> these, IReadOnlyList<Diagnostic> others, Compilation? owner, bool added,
        ImmutableArray<DiagnosticChange>.Builder changes)
    {
        var remaining = others.GroupBy(Key).ToDictionary(g => g.Key, g => g.Count());
        foreach (var d in these)
        {
            var key = Key(d);
            if (remaining.GetValueOrDefault(key) > 0) { remaining[key]--; continue; }
            int line = owner is null ? 0 : owner.Source.GetPosition(d.Span.Start).Line + 1;
            changes.Add(new DiagnosticChange(added, d.Code, d.Severity, d.Message, line));
        }
    }

    private static (string, string) Key(Diagnostic d) => (d.Code, d.Message);
}
