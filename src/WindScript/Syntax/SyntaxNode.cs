using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>Every syntax node knows the exact span of source it came from.</summary>
internal abstract record SyntaxNode(TextSpan Span);

/// <summary>A name as written: a definition or a reference.</summary>
internal sealed record NameSyntax(string Text, TextSpan Span) : SyntaxNode(Span)
{
    public static NameSyntax From(Token t) => new(t.Text, t.Span);
}

/// <summary>A keyword as written (kept so diagnostics can point at it).</summary>
internal sealed record KeywordSyntax(string Text, TextSpan Span) : SyntaxNode(Span)
{
    public static KeywordSyntax From(Token t) => new(t.Text, t.Span);
}
