using WindScript.Diagnostics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>Text edits for quick fixes, found from the syntax tree.</summary>
internal static class SourceEdits
{
    /// <summary>Replaces the value of the property statement at <paramref name="statementSpan"/>.</summary>
    public static CodeFix? ReplaceValue(SyntaxTree tree, TextSpan statementSpan, string newValue, string title)
    {
        var property = Find<PropertySyntax>(tree.Root.Statements, statementSpan);
        return property is null ? null : new CodeFix(title, [new TextEdit(property.Value.Span, newValue)]);
    }

    /// <summary>
    /// Reverses the coil written at <paramref name="coilSpan"/>: a 'coil' statement or a
    /// slot-pattern entry. The edit comes from the tokens: the sign token is removed (with the
    /// space between it and the phase) or a '-' is written before the phase, however the line is spaced.
    /// </summary>
    public static CodeFix? FlipPolarity(SyntaxTree tree, TextSpan coilSpan)
    {
        if (Find<CoilSyntax>(tree.Root.Statements, coilSpan) is { } coil)
        {
            var edit = coil.Minus is { } minus
                ? new TextEdit(TextSpan.FromBounds(minus.Span.Start, coil.Phase.Span.Start), "")
                : new TextEdit(new TextSpan(coil.Phase.Span.Start, 0), "-");
            return new CodeFix($"Reverse the coil (write {(coil.Reversed ? "" : "-")}{coil.Phase.Text})", [edit]);
        }
        // A pattern entry such as "-U" or "U". A single-layer coil spans two entries: no local fix.
        if (FindEntry(tree.Root.Statements, coilSpan) is { Phase: { } phase } entry)
        {
            var edit = entry.Sign switch
            {
                { Kind: TokenKind.Minus } sign => new TextEdit(TextSpan.FromBounds(sign.Span.Start, phase.Span.Start), ""),
                { } plus => new TextEdit(plus.Span, "-"),
                null => new TextEdit(new TextSpan(phase.Span.Start, 0), "-"),
            };
            return new CodeFix("Reverse the coil", [edit]);
        }
        return null;
    }

    /// <summary>The span of the property statement 'keyword value' in the block at <paramref name="blockSpan"/>, if written.</summary>
    public static TextSpan? PropertySpan(SyntaxTree? tree, TextSpan blockSpan, PropertyName property) =>
        tree?.Root.Statements.OfType<BlockSyntax>().FirstOrDefault(b => b.Span == blockSpan)?.Body
            .OfType<PropertySyntax>().FirstOrDefault(p => p.Property.Name == property)?.Span;

    /// <summary>The 'coil' statement written at <paramref name="span"/>, if any.</summary>
    public static CoilSyntax? FindCoil(SyntaxTree tree, TextSpan span) => Find<CoilSyntax>(tree.Root.Statements, span);

    /// <summary>The slot-pattern entry written at <paramref name="span"/>, if any.</summary>
    public static PatternEntrySyntax? FindEntry(SyntaxTree tree, TextSpan span) => FindEntry(tree.Root.Statements, span);

    /// <summary>The two entries a single-layer pattern coil spans: its go entry starts the span and its return entry ends it.</summary>
    public static (PatternEntrySyntax Go, PatternEntrySyntax Return)? FindEntryPair(SyntaxTree tree, TextSpan span)
    {
        var entries = Patterns(tree.Root.Statements).SelectMany(p => p.Entries).ToArray();
        var go = entries.FirstOrDefault(e => e.Span.Start == span.Start);
        var ret = entries.FirstOrDefault(e => e.Span.End == span.End);
        return go is null || ret is null || ReferenceEquals(go, ret) ? null : (go, ret);
    }

    private static IEnumerable<PatternSyntax> Patterns(IEnumerable<StatementSyntax> statements)
    {
        foreach (var s in statements)
        {
            if (s is PatternSyntax p) yield return p;
            var body = s switch { BlockSyntax b => b.Body, ForSyntax f => f.Body, _ => null };
            if (body is not null) foreach (var inner in Patterns(body)) yield return inner;
        }
    }

    private static PatternEntrySyntax? FindEntry(IEnumerable<StatementSyntax> statements, TextSpan span)
    {
        foreach (var s in statements)
        {
            if (!s.Span.Contains(span)) continue;
            if (s is PatternSyntax pattern) return pattern.Entries.FirstOrDefault(e => e.Span == span);
            var body = s switch { BlockSyntax b => b.Body, ForSyntax f => f.Body, _ => null };
            if (body is not null && FindEntry(body, span) is { } inner) return inner;
        }
        return null;
    }

    private static T? Find<T>(IEnumerable<StatementSyntax> statements, TextSpan span) where T : StatementSyntax
    {
        foreach (var s in statements)
        {
            if (s is T match && match.Span == span) return match;
            var body = s switch { BlockSyntax b => b.Body, ForSyntax f => f.Body, _ => null };
            if (body is not null && s.Span.Contains(span) && Find<T>(body, span) is { } inner) return inner;
        }
        return null;
    }
}
