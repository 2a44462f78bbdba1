namespace WindScript.Syntax;

internal enum TokenKind
{
    Word,        // identifiers and keywords: letters, digits, '_' (not starting with a digit)
    Number,      // 12, 0.5, 1e-3
    Unit,        // a unit symbol directly after a number on the same line: mm, A, Hz, rad/s, ...
    NewLine,     // one or more line breaks (blank and comment-only lines folded in)
    LBrace,
    RBrace,
    LParen,
    RParen,
    Colon,
    Comma,
    Equals,
    Arrow,       // ->
    DotDot,      // ..
    Plus,
    Minus,
    Star,
    Slash,
    Percent,
    Bad,         // a character the language does not use
    End,
}
