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

    /// <summary>Reverses the coil written at <paramref name="coilSpan"/>: a 'coil' statement or a slot-pattern entry.</summary>
    public static CodeFix? FlipPolarity(SyntaxTree tree, TextSpan coilSpan)
    {
        var text = tree.Source.Text;
        if (Find<CoilSyntax>(tree.Root.Statements, coilSpan) is { } coil)
        {
            var edit = coil.Reversed
                ? new TextEdit(TextSpan.FromBounds(coil.Phase.Span.Start - 1, coil.Phase.Span.Start), "")
                : new TextEdit(new TextSpan(coil.Phase.Span.Start, 0), "-");
            return new CodeFix($"Reverse the coil (write {(coil.Reversed ? "" : "-")}{coil.Phase.Text})", [edit]);
        }
        // A pattern entry such as "-U" or "U". A single-layer coil spans two entries: no local fix.
        if (coilSpan.Length > 0 && coilSpan.End <= text.Length && !text.AsSpan(coilSpan.Start, coilSpan.Length).ContainsAny(' ', '\t'))
        {
            int start = coilSpan.Start;
            char first = text[start];
            if (first is '-' or '+') return new CodeFix("Reverse the coil", [new TextEdit(new TextSpan(start, 1), first == '-' ? "" : "-")]);
            if (Lexer.IsWordStart(first)) return new CodeFix("Reverse the coil", [new TextEdit(new TextSpan(start, 0), "-")]);
        }
        return null;
    }

    /// <summary>The span of the property statement 'keyword value' in the block at <paramref name="blockSpan"/>, if written.</summary>
    public static TextSpan? PropertySpan(SyntaxTree? tree, TextSpan blockSpan, string keyword) =>
        tree?.Root.Statements.OfType<BlockSyntax>().FirstOrDefault(b => b.Span == blockSpan)?.Body
            .OfType<PropertySyntax>().FirstOrDefault(p => p.Keyword.Text == keyword)?.Span;

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
