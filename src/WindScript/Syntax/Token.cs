using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>A lexical token with its exact place in the source.</summary>
internal readonly record struct Token(TokenKind Kind, string Text, TextSpan Span)
{
    public override string ToString() => Kind switch
    {
        TokenKind.NewLine => "end of line",
        TokenKind.End => "end of file",
        _ => $"'{Text}'",
    };
}

/// <summary>A '#' comment, kept aside from the tokens so that the formatter can put it back.</summary>
internal readonly record struct Comment(string Text, TextSpan Span, bool OwnLine);
