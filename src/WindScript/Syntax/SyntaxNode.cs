using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>Every syntax node knows the exact span of source it came from.</summary>
internal abstract record SyntaxNode(TextSpan Span);

/// <summary>
/// A name as written: a definition or a reference. Where the grammar wants a name and none is
/// written (a block such as <c>winding {</c>), the parser leaves a missing name: empty text and
/// a zero-width span at the place the name belongs, so later stages still see the block.
/// </summary>
internal sealed record NameSyntax(string Text, TextSpan Span) : SyntaxNode(Span)
{
    public static NameSyntax From(Token t) => new(t.Text, t.Span);

    /// <summary>The name that should stand at <paramref name="offset"/> but does not.</summary>
    public static NameSyntax Missing(int offset) => new("", new TextSpan(offset, 0));

    public bool IsMissing => Text.Length == 0;
}

/// <summary>A keyword as written (kept so diagnostics can point at it).</summary>
internal sealed record KeywordSyntax(string Text, TextSpan Span) : SyntaxNode(Span)
{
    public static KeywordSyntax From(Token t) => new(t.Text, t.Span);
}
