using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>One line of a file or block (a block statement spans its whole body).</summary>
internal abstract record StatementSyntax(TextSpan Span) : SyntaxNode(Span);

/// <summary><c>let n = 9</c>: a named value, visible below it in its block and nested blocks.</summary>
internal sealed record LetSyntax(KeywordSyntax Keyword, NameSyntax Name, ExpressionSyntax Value, TextSpan Span) : StatementSyntax(Span);

/// <summary>A keyword with one value: <c>slots 36</c>, <c>bore 150 mm</c>, <c>turns 11</c>, <c>pitch 7 slots</c>.</summary>
internal sealed record PropertySyntax(KeywordSyntax Keyword, ExpressionSyntax Value, TextSpan Span) : StatementSyntax(Span)
{
    /// <summary>The property's entry in the vocabulary (the parser reads only words that have one).</summary>
    public PropertyWord Property => Vocabulary.Property(Keyword.Text)!;
}

/// <summary><c>phases U V W</c>.</summary>
internal sealed record PhasesSyntax(KeywordSyntax Keyword, IReadOnlyList<NameSyntax> Names, TextSpan Span) : StatementSyntax(Span);

/// <summary>A bare flag: <c>neutral</c>.</summary>
internal sealed record FlagSyntax(KeywordSyntax Keyword, TextSpan Span) : StatementSyntax(Span);

/// <summary>
/// A block: <c>machine NAME { ... }</c>, <c>winding NAME { ... }</c>, <c>group NAME { ... }</c>,
/// <c>drive NAME { ... }</c>. <see cref="Name"/> is a missing name (<see cref="NameSyntax.IsMissing"/>)
/// when none is written; <see cref="Closed"/> is false when the closing brace is missing.
/// </summary>
internal sealed record BlockSyntax(KeywordSyntax Keyword, NameSyntax Name, IReadOnlyList<StatementSyntax> Body, bool Closed, TextSpan Span)
    : StatementSyntax(Span)
{
    public BlockKind Kind => Vocabulary.Block(Keyword.Text)!.Kind;
}

/// <summary><c>for k in 0 .. 11 step 1 { ... }</c>: the range is inclusive at both ends.</summary>
internal sealed record ForSyntax(KeywordSyntax Keyword, NameSyntax Variable, ExpressionSyntax From, ExpressionSyntax To, ExpressionSyntax? Step,
    IReadOnlyList<StatementSyntax> Body, bool Closed, TextSpan Span) : StatementSyntax(Span);

/// <summary>
/// <c>coil -U: 1 -> 10 turns 9 layer bottom</c>: phase with optional reversal (the <c>-</c> token
/// is kept, wherever it stands), go and return slots, and every option as written, in order
/// (a repeated option is the binder's to report).
/// </summary>
internal sealed record CoilSyntax(
    KeywordSyntax Keyword,
    Token? Minus,
    NameSyntax Phase,
    ExpressionSyntax Go,
    ExpressionSyntax Return,
    IReadOnlyList<CoilOptionSyntax> Options,
    TextSpan Span) : StatementSyntax(Span)
{
    public bool Reversed => Minus is not null;

    /// <summary>The first <c>turns</c> option's value (else the group's or winding's turns apply).</summary>
    public ExpressionSyntax? Turns => Options.OfType<CoilTurnsSyntax>().FirstOrDefault()?.Value;

    /// <summary>The first <c>layer</c> option's layer: the go side's layer.</summary>
    public KeywordSyntax? Layer => Options.OfType<CoilLayerSyntax>().FirstOrDefault()?.Layer;

    /// <summary>The go side's layer as written, or null when the coil does not say.</summary>
    public LayerName? GoLayer => Options.OfType<CoilLayerSyntax>().FirstOrDefault()?.LayerKind;
}

/// <summary>An option after a coil's slots, introduced by its keyword.</summary>
internal abstract record CoilOptionSyntax(KeywordSyntax Keyword, TextSpan Span) : SyntaxNode(Span);

/// <summary><c>turns 9</c> on a coil.</summary>
internal sealed record CoilTurnsSyntax(KeywordSyntax Keyword, ExpressionSyntax Value, TextSpan Span) : CoilOptionSyntax(Keyword, Span);

/// <summary><c>layer bottom</c> on a coil.</summary>
internal sealed record CoilLayerSyntax(KeywordSyntax Keyword, KeywordSyntax Layer, TextSpan Span) : CoilOptionSyntax(Keyword, Span)
{
    public LayerName LayerKind => Vocabulary.LayerOf(Layer.Text)!.Name;
}

/// <summary>One entry of a slot pattern: a phase with its sign token (<c>-</c>, <c>+</c> or none), or '_' for an empty position.</summary>
internal sealed record PatternEntrySyntax(Token? Sign, NameSyntax? Phase, TextSpan Span) : SyntaxNode(Span)
{
    public bool Reversed => Sign is { Kind: TokenKind.Minus };
}

/// <summary>
/// <c>top: U U -W -W repeat 3</c>: the phase of each slot in one layer, in slot order from
/// slot 1. Several lines for the same layer continue one another.
/// </summary>
internal sealed record PatternSyntax(KeywordSyntax Layer, IReadOnlyList<PatternEntrySyntax> Entries, ExpressionSyntax? Repeat, TextSpan Span)
    : StatementSyntax(Span)
{
    public LayerName LayerKind => Vocabulary.LayerOf(Layer.Text)!.Name;
}

/// <summary>What went wrong on a line the parser could not read.</summary>
internal enum SyntaxErrorKind
{
    /// <summary>A token other than the grammar expected (see <see cref="ErrorStatementSyntax.Expected"/>).</summary>
    Unexpected,
    /// <summary>A word at the start of the line that no statement starts with.</summary>
    UnknownStatement,
    /// <summary>A character the language does not use.</summary>
    BadCharacter,
    /// <summary>A '}' with no block to close.</summary>
    StrayBrace,
}

/// <summary>
/// A statement the parser could not read. It keeps the line's tokens (from the statement's
/// first token through the offending one, <see cref="Tokens"/>[<see cref="ErrorIndex"/>]) and
/// what the grammar expected there; the message is composed from these after parsing
/// (<see cref="SyntaxErrorMessages"/>), so nothing re-reads the source text.
/// </summary>
internal sealed record ErrorStatementSyntax(
    SyntaxErrorKind Kind, IReadOnlyList<Token> Tokens, int ErrorIndex, IReadOnlyList<string> Expected, TextSpan ErrorSpan, TextSpan Span)
    : StatementSyntax(Span)
{
    /// <summary>The token the parser stopped at (an end of line or of file when something is missing).</summary>
    public Token Found => Tokens[ErrorIndex];
}
