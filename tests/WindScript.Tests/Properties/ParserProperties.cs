using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.Tests.Properties;

/// <summary>Parsing never fails, whatever the text, and every span lies in the text and nests in its parent.</summary>
public class ParserProperties
{
    [Property(MaxTest = 1000)]
    public Property Parsing_and_checking_never_throw_on_random_text() =>
        Prop.ForAll(TextMutations.RandomText.ToArbitrary(), text =>
        {
            var c = Compilation.Compile(text);
            return c.Diagnostics.All(d => d.Span.Start >= 0 && d.Span.End <= text.Length);
        });

    [Property(MaxTest = 1000)]
    public Property Parsing_and_checking_never_throw_on_damaged_examples() =>
        Prop.ForAll(TextMutations.MutatedExample.ToArbitrary(), text =>
        {
            var c = Compilation.Compile(text);
            return c.Diagnostics.All(d => d.Span.Start >= 0 && d.Span.End <= text.Length);
        });

    [Property(MaxTest = 1000)]
    public Property Spans_lie_within_the_text_and_nest_within_their_parents() =>
        Prop.ForAll(TextMutations.MutatedExample.ToArbitrary(), text =>
        {
            var tree = SyntaxTree.Parse(text);
            var root = new TextSpan(0, text.Length);
            return SpansNest(tree.Root.Statements, root);
        });

    private static bool SpansNest(IEnumerable<SyntaxNode> nodes, TextSpan parent)
    {
        foreach (var node in nodes)
        {
            if (node.Span.Start < 0 || !parent.Contains(node.Span)) return false;
            if (!SpansNest(Children(node), node.Span)) return false;
        }
        return true;
    }

    private static IEnumerable<SyntaxNode> Children(SyntaxNode node) => node switch
    {
        BlockSyntax b => b.Body.Cast<SyntaxNode>().Prepend(b.Keyword).Concat([b.Name]),
        ForSyntax f => f.Body.Cast<SyntaxNode>().Concat([f.Variable, f.From, f.To]).Concat(f.Step is null ? [] : [f.Step]),
        LetSyntax l => [l.Name, l.Value],
        PropertySyntax p => [p.Keyword, p.Value],
        PhasesSyntax p => p.Names,
        CoilSyntax c => new SyntaxNode[] { c.Keyword, c.Phase, c.Go, c.Return }.Concat(c.Options),
        CoilTurnsSyntax t => [t.Keyword, t.Value],
        CoilLayerSyntax l => [l.Keyword, l.Layer],
        PatternSyntax p => p.Entries.Cast<SyntaxNode>().Prepend(p.Layer).Concat(p.Repeat is null ? [] : [p.Repeat]),
        PhaseCurrentSyntax c => c.Terms.Cast<SyntaxNode>().Prepend(c.Phase),
        SignedTermSyntax s => [s.Term],
        BalancedSyntax b => b.Sequence.Cast<SyntaxNode>().Prepend(b.Wave),
        SineTermSyntax s => new SyntaxNode?[] { s.Amplitude, s.Measure, s.Frequency, s.Phase }.OfType<SyntaxNode>(),
        DcTermSyntax d => [d.Current],
        BinaryExpressionSyntax b => [b.Left, b.Right],
        UnaryExpressionSyntax u => [u.Operand],
        ParenthesizedExpressionSyntax p => [p.Inner],
        CallExpressionSyntax c => c.Arguments.Cast<SyntaxNode>().Prepend(c.Function),
        ErrorStatementSyntax => [],
        _ => [],
    };
}
