using WindScript.Syntax;

namespace WindScript.Tests.Syntax;

public class LexerTests
{
    private static TokenKind[] Kinds(string text) => Lexer.Lex(text).Tokens.Select(t => t.Kind).ToArray();

    [Fact]
    public void Unit_after_a_number_on_the_same_line_is_a_unit_token()
    {
        var (tokens, _) = Lexer.Lex("bore 150 mm\nat 314.2 rad/s");
        Assert.Equal(["bore", "150", "mm", "\n", "at", "314.2", "rad/s", ""], tokens.Select(t => t.Text));
        Assert.Equal(TokenKind.Unit, tokens[2].Kind);
        Assert.Equal(TokenKind.Unit, tokens[6].Kind);
    }

    [Fact]
    public void A_word_after_a_line_break_is_never_taken_as_a_unit()
    {
        // 'V' is the volt symbol, but here it names a phase on the next line.
        Assert.Equal([TokenKind.Word, TokenKind.Number, TokenKind.NewLine, TokenKind.Word, TokenKind.End], Kinds("dc 8\nV"));
    }

    [Fact]
    public void Range_dots_do_not_stick_to_numbers()
    {
        Assert.Equal([TokenKind.Number, TokenKind.DotDot, TokenKind.Number, TokenKind.End], Kinds("0..11"));
        Assert.Equal([TokenKind.Number, TokenKind.DotDot, TokenKind.Number, TokenKind.End], Kinds("0 .. 11"));
    }

    [Fact]
    public void Blank_and_comment_lines_fold_into_one_line_break_and_comments_are_kept()
    {
        var (tokens, comments) = Lexer.Lex("slots 36  # count\n\n# note\n\npoles 4\n");
        Assert.Equal([TokenKind.Word, TokenKind.Number, TokenKind.NewLine, TokenKind.Word, TokenKind.Number, TokenKind.NewLine, TokenKind.End],
            tokens.Select(t => t.Kind));
        Assert.Equal(["# count", "# note"], comments.Select(c => c.Text));
        Assert.False(comments[0].OwnLine);
        Assert.True(comments[1].OwnLine);
    }

    [Fact]
    public void Arrow_and_minus_are_told_apart()
    {
        Assert.Equal([TokenKind.Word, TokenKind.Minus, TokenKind.Word, TokenKind.Colon, TokenKind.Number, TokenKind.Arrow, TokenKind.Number, TokenKind.End],
            Kinds("coil -U: 1 -> 10"));
    }

    [Fact]
    public void Unknown_characters_become_bad_tokens_not_exceptions()
    {
        Assert.Contains(TokenKind.Bad, Kinds("slots 3$6 @"));
    }
}
