using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>One line of a file or block (a block statement spans its whole body).</summary>
internal abstract record StatementSyntax(TextSpan Span) : SyntaxNode(Span);

/// <summary><c>let n = 9</c>: a named value, visible below it in its block and nested blocks.</summary>
internal sealed record LetSyntax(NameSyntax Name, ExpressionSyntax Value, TextSpan Span) : StatementSyntax(Span);

/// <summary>A keyword with one value: <c>slots 36</c>, <c>bore 150 mm</c>, <c>turns 11</c>, <c>pitch 7 slots</c>.</summary>
internal sealed record PropertySyntax(KeywordSyntax Keyword, ExpressionSyntax Value, TextSpan Span) : StatementSyntax(Span);

/// <summary><c>phases U V W</c>.</summary>
internal sealed record PhasesSyntax(KeywordSyntax Keyword, IReadOnlyList<NameSyntax> Names, TextSpan Span) : StatementSyntax(Span);

/// <summary>A bare flag: <c>neutral</c>.</summary>
internal sealed record FlagSyntax(KeywordSyntax Keyword, TextSpan Span) : StatementSyntax(Span);

/// <summary>
/// A block: <c>machine NAME { ... }</c>, <c>winding NAME { ... }</c>, <c>group NAME { ... }</c>,
/// <c>drive NAME { ... }</c>. <see cref="Closed"/> is false when the closing brace is missing.
/// </summary>
internal sealed record BlockSyntax(KeywordSyntax Keyword, NameSyntax? Name, IReadOnlyList<StatementSyntax> Body, bool Closed, TextSpan Span)
    : StatementSyntax(Span);

/// <summary><c>for k in 0 .. 11 step 1 { ... }</c>: the range is inclusive at both ends.</summary>
internal sealed record ForSyntax(NameSyntax Variable, ExpressionSyntax From, ExpressionSyntax To, ExpressionSyntax? Step,
    IReadOnlyList<StatementSyntax> Body, bool Closed, TextSpan Span) : StatementSyntax(Span);

/// <summary>
/// <c>coil -U: 1 -> 10 turns 9 layer bottom</c>: phase with optional reversal, go and return
/// slots, optional turns (else the group's or winding's) and the go side's layer.
/// </summary>
internal sealed record CoilSyntax(
    bool Reversed,
    NameSyntax Phase,
    ExpressionSyntax Go,
    ExpressionSyntax Return,
    ExpressionSyntax? Turns,
    KeywordSyntax? Layer,
    TextSpan Span) : StatementSyntax(Span);

/// <summary>One entry of a slot pattern: a phase with polarity, or '_' for an empty position.</summary>
internal sealed record PatternEntrySyntax(bool Reversed, NameSyntax? Phase, TextSpan Span) : SyntaxNode(Span);

/// <summary>
/// <c>top: U U -W -W repeat 3</c>: the phase of each slot in one layer, in slot order from
/// slot 1. Several lines for the same layer continue one another.
/// </summary>
internal sealed record PatternSyntax(KeywordSyntax Layer, IReadOnlyList<PatternEntrySyntax> Entries, ExpressionSyntax? Repeat, TextSpan Span)
    : StatementSyntax(Span);

/// <summary>A statement the parser could not read; it carries its own diagnostic.</summary>
internal sealed record ErrorStatementSyntax(string Message, TextSpan ErrorSpan, TextSpan Span) : StatementSyntax(Span);
