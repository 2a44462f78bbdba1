using WindScript.Diagnostics;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>What every block enforces, shared by the block binders: a statement stands only where it is allowed, a property is given once.</summary>
internal static class BlockRules
{
    public static void ReportMisplaced(DiagnosticBag diagnostics, StatementSyntax statement, string blockKind)
    {
        if (statement is ErrorStatementSyntax) return; // already reported by the parser
        var (what, span) = statement switch
        {
            PropertySyntax p => ($"'{p.Keyword.Text}'", p.Keyword.Span),
            BlockSyntax b => ($"a {b.Keyword.Text} block", b.Keyword.Span),
            PhasesSyntax p => ("'phases'", p.Keyword.Span),
            FlagSyntax f => ($"'{f.Keyword.Text}'", f.Keyword.Span),
            CoilSyntax c => ("a coil", c.Keyword.Span),
            PatternSyntax p => ("a slot pattern", p.Layer.Span),
            ForSyntax f => ("a 'for' loop", f.Keyword.Span),
            PhaseCurrentSyntax c => ("a phase current", c.Phase.Span),
            BalancedSyntax b => ("'balanced'", b.Keyword.Span),
            LetSyntax l => ("'let'", l.Keyword.Span),
            _ => ("this statement", statement.Span),
        };
        diagnostics.Add(DiagnosticCatalog.MisplacedStatement, span, $"{what} is not allowed in {blockKind}");
    }

    /// <summary>Returns false (and reports) if a property was already given in this block.</summary>
    public static bool FirstTime(DiagnosticBag diagnostics, Dictionary<string, PropertySyntax> seen, PropertySyntax property)
    {
        if (seen.TryGetValue(property.Keyword.Text, out var earlier))
        {
            diagnostics.Add(DiagnosticCatalog.RepeatedProperty.At(property.Keyword.Span, $"'{property.Keyword.Text}' is already given in this block")
                with { Related = [new RelatedSpan(earlier.Span, "first given here")] });
            return false;
        }
        seen[property.Keyword.Text] = property;
        return true;
    }
}
