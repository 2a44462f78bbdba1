namespace WindScript.Syntax;

/// <summary>
/// Walking the tree by position, for tools that start from a place in the text (the language
/// server's hover, completion and symbols): the children of a node, and the chain of nodes
/// from the root down to the most specific one at an offset.
/// </summary>
internal static class SyntaxNavigation
{
    /// <summary>The direct children of a node, in source order.</summary>
    public static IEnumerable<SyntaxNode> Children(SyntaxNode node)
    {
        switch (node)
        {
            case CompilationUnitSyntax unit: return unit.Statements;
            case BlockSyntax b: return Present(b.Keyword, b.Name).Concat(b.Body);
            case ForSyntax f: return Present(f.Variable, f.From, f.To, f.Step).Concat(f.Body);
            case LetSyntax l: return [l.Name, l.Value];
            case PropertySyntax p: return [p.Keyword, p.Value];
            case PhasesSyntax p: return [p.Keyword, .. p.Names];
            case FlagSyntax f: return [f.Keyword];
            case CoilSyntax c: return Present(c.Phase, c.Go, c.Return).Concat(c.Options);
            case CoilTurnsSyntax t: return [t.Keyword, t.Value];
            case CoilLayerSyntax l: return [l.Keyword, l.Layer];
            case PatternSyntax p: return [p.Layer, .. p.Entries, .. Present(p.Repeat)];
            case PatternEntrySyntax e: return Present(e.Phase);
            case PhaseCurrentSyntax c: return [c.Phase, .. c.Terms];
            case SignedTermSyntax t: return [t.Term];
            case DcTermSyntax d: return [d.Current];
            case SineTermSyntax s: return Present(s.Amplitude, s.Measure, s.Frequency, s.Phase);
            case BalancedSyntax b: return [b.Wave, b.SequenceKeyword, .. b.Sequence];
            case NumberSyntax n: return Present(n.Unit);
            case NameExpressionSyntax n: return [n.Name];
            case UnaryExpressionSyntax u: return [u.Operand];
            case BinaryExpressionSyntax b: return [b.Left, b.Right];
            case CallExpressionSyntax c: return [c.Function, .. c.Arguments];
            case ParenthesizedExpressionSyntax p: return [p.Inner];
            default: return [];
        }
    }

    /// <summary>
    /// The nodes that contain <paramref name="offset"/>, outermost first. A node also counts when
    /// the offset sits just after its end, so a caret at the end of a word still finds the word.
    /// </summary>
    public static IReadOnlyList<SyntaxNode> PathAt(SyntaxNode root, int offset)
    {
        var path = new List<SyntaxNode> { root };
        var current = root;
        while (true)
        {
            SyntaxNode? next = null;
            foreach (var child in Children(current))
            {
                if (child.Span.Contains(offset)) { next = child; break; }
                if (child.Span.End == offset && child.Span.Length > 0) next ??= child; // touching on the right
            }
            if (next is null) return path;
            path.Add(next);
            current = next;
        }
    }

    /// <summary>The innermost node of type <typeparamref name="T"/> at an offset, or null.</summary>
    public static T? Innermost<T>(SyntaxNode root, int offset) where T : SyntaxNode =>
        PathAt(root, offset).OfType<T>().LastOrDefault();

    /// <summary>Every node under (and including) a node, in source order.</summary>
    public static IEnumerable<SyntaxNode> DescendantsAndSelf(SyntaxNode node)
    {
        var stack = new Stack<SyntaxNode>();
        stack.Push(node);
        while (stack.Count > 0)
        {
            var n = stack.Pop();
            yield return n;
            foreach (var child in Children(n).Reverse()) stack.Push(child);
        }
    }

    private static IEnumerable<SyntaxNode> Present(params SyntaxNode?[] nodes) => nodes.OfType<SyntaxNode>();
}
