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
            var edit = new TextEdit(RepairEdits.SignedNameSpan(tree, coil.Phase.Span, coil.Reversed), (coil.Reversed ? "" : "-") + coil.Phase.Text);
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

    /// <summary>The 'coil' statement written at <paramref name="span"/>, if any.</summary>
    public static CoilSyntax? FindCoil(SyntaxTree tree, TextSpan span) => Find<CoilSyntax>(tree.Root.Statements, span);

    /// <summary>The slot-pattern entry written at <paramref name="span"/>, if any.</summary>
    public static PatternEntrySyntax? FindEntry(SyntaxTree tree, TextSpan span) =>
        Patterns(tree.Root.Statements).SelectMany(p => p.Entries).FirstOrDefault(e => e.Span == span);

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
