namespace WindScript.Syntax;

/// <summary>
/// The one-line message of a syntax error, composed from the error node after parsing: the
/// parser only records what it found and what it expected.
/// </summary>
internal static class SyntaxErrorMessages
{
    private const int MaxExpected = 6;

    public static string Describe(ErrorStatementSyntax error)
    {
        var found = error.Found;
        switch (error.Kind)
        {
            case SyntaxErrorKind.StrayBrace:
                return "this '}' closes no block";
            case SyntaxErrorKind.UnknownStatement:
                return $"'{found.Text}' does not start a statement; expected a keyword such as coil, turns, pitch or let, or a phase current 'U = ...'";
            case SyntaxErrorKind.BadCharacter:
                return $"the character '{found.Text}' is not part of the language";
        }
        var expected = error.Expected.Take(MaxExpected).ToList();
        string expectedText = expected.Count switch
        {
            0 => "something else",
            1 => expected[0],
            _ => string.Join(", ", expected.Take(expected.Count - 1)) + " or " + expected[^1],
        };
        string after = error.ErrorIndex > 0 ? $" after '{error.Tokens[error.ErrorIndex - 1].Text}'" : "";
        return found.Kind is TokenKind.NewLine or TokenKind.End
            ? $"expected {expectedText}{after}"
            : $"expected {expectedText}{after}, but found {found}";
    }
}
