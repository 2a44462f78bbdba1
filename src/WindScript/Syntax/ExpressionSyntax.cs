using WindScript.Text;

namespace WindScript.Syntax;

internal abstract record ExpressionSyntax(TextSpan Span) : SyntaxNode(Span);

/// <summary>A number with an optional unit written right after it: <c>150 mm</c>, <c>11</c>.</summary>
internal sealed record NumberSyntax(double Value, string Literal, KeywordSyntax? Unit, TextSpan Span) : ExpressionSyntax(Span);

/// <summary>A reference to a <c>let</c> value or loop variable.</summary>
internal sealed record NameExpressionSyntax(NameSyntax Name) : ExpressionSyntax(Name.Span);

internal sealed record UnaryExpressionSyntax(TokenKind Operator, ExpressionSyntax Operand, TextSpan Span) : ExpressionSyntax(Span);

internal sealed record BinaryExpressionSyntax(TokenKind Operator, ExpressionSyntax Left, ExpressionSyntax Right)
    : ExpressionSyntax(Left.Span.Cover(Right.Span));

/// <summary>A built-in function call such as <c>wrap(k + 7)</c>.</summary>
internal sealed record CallExpressionSyntax(NameSyntax Function, IReadOnlyList<ExpressionSyntax> Arguments, TextSpan Span) : ExpressionSyntax(Span);

/// <summary>A parenthesised expression (kept so spans and the formatter see the parentheses).</summary>
internal sealed record ParenthesizedExpressionSyntax(ExpressionSyntax Inner, TextSpan Span) : ExpressionSyntax(Span);
