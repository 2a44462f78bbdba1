using System.Globalization;
using WindScript.Diagnostics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>
/// The source edits that make a <see cref="Repair"/>: the phase name and its '-' of a coil line
/// or pattern entry, or a coil's turns, found from the syntax tree's tokens (the '-' a coil or entry keeps). An edit is
/// only a proposal: <see cref="FixVerifier"/> re-checks the edited text before it is offered.
/// </summary>
internal static class RepairEdits
{
    public static IReadOnlyList<TextEdit>? For(SyntaxTree tree, Repair repair, Func<int, string> phaseName)
    {
        var edits = new List<TextEdit>();
        foreach (var change in repair.Changes)
        {
            var coil = change.First;
            if (coil.Span == default) return null;
            var written = SourceEdits.FindCoil(tree, coil.Span);
            if (written is CoilSyntax statement)
            {
                if (change.NewTurns != coil.Turns)
                {
                    if (statement.Turns is null) return null;
                    edits.Add(new TextEdit(statement.Turns.Span, change.NewTurns.ToString(CultureInfo.InvariantCulture)));
                    continue;
                }
                // The model's polarity is the written one (a '-' reverses); keep that relation.
                int newWritten = change.NewPolarity * coil.Polarity * (statement.Reversed ? -1 : 1);
                var from = statement.Minus is { } minus ? minus.Span.Start : statement.Phase.Span.Start;
                edits.Add(new TextEdit(TextSpan.FromBounds(from, statement.Phase.Span.End), Signed(newWritten, phaseName(change.NewPhase))));
            }
            else if (change.NewTurns != coil.Turns)
            {
                return null; // a pattern's turns belong to its whole group
            }
            else if (SourceEdits.FindEntry(tree, coil.Span) is { } entry)
            {
                int newWritten = change.NewPolarity * coil.Polarity * (entry.Reversed ? -1 : 1);
                edits.Add(new TextEdit(entry.Span, Signed(newWritten, phaseName(change.NewPhase))));
            }
            else if (SourceEdits.FindEntryPair(tree, coil.Span) is { } pair && change.NewPolarity == coil.Polarity)
            {
                // A single-layer coil: its '+' go entry and its '-' return entry.
                edits.Add(new TextEdit(pair.Go.Span, Signed(1, phaseName(change.NewPhase))));
                edits.Add(new TextEdit(pair.Return.Span, Signed(-1, phaseName(change.NewPhase))));
            }
            else
            {
                return null;
            }
        }
        return edits;
    }

    private static string Signed(int sign, string name) => (sign < 0 ? "-" : "") + name;

    /// <summary>The text with the edits applied (edits do not overlap).</summary>
    public static string Apply(string text, IEnumerable<TextEdit> edits)
    {
        var sb = new System.Text.StringBuilder(text);
        foreach (var e in edits.OrderByDescending(e => e.Span.Start))
            sb.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText);
        return sb.ToString();
    }
}
