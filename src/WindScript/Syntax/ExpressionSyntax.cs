using WindScript.Text;

namespace WindScript.Syntax;

public abstract record ExpressionSyntax(TextSpan Span) : SyntaxNode(Span);

/// <summary>A number with an optional unit written right after it: <c>150 mm</c>, <c>11</c>.</summary>
public sealed record NumberSyntax(double Value, string Literal, KeywordSyntax? Unit, TextSpan Span) : ExpressionSyntax(Span);

/// <summary>A reference to a <c>let</c> value or loop variable.</summary>
public sealed record NameExpressionSyntax(NameSyntax Name) : ExpressionSyntax(Name.Span);

public sealed record UnaryExpressionSyntax(TokenKind Operator, ExpressionSyntax Operand, TextSpan Span) : ExpressionSyntax(Span);

public sealed record BinaryExpressionSyntax(TokenKind Operator, ExpressionSyntax Left, ExpressionSyntax Right)
    : ExpressionSyntax(Left.Span.Cover(Right.Span));

/// <summary>A built-in function call such as <c>wrap(k + 7)</c>.</summary>
public sealed record CallExpressionSyntax(NameSyntax Function, IReadOnlyList<ExpressionSyntax> Arguments, TextSpan Span) : ExpressionSyntax(Span);

/// <summary>A parenthesised expression (kept so spans and the formatter see the parentheses).</summary>
public sealed record ParenthesizedExpressionSyntax(ExpressionSyntax Inner, TextSpan Span) : ExpressionSyntax(Span);
