using System.Text.RegularExpressions;
using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Syntax;

/// <summary>
/// The normative grammar describes the language the parser reads, checked by structure: an
/// independent EBNF reader (<see cref="Ebnf"/>) accepts every file the parser reads without a
/// syntax error and refuses every file the parser reports a syntax error in; the grammar's
/// numbers are the lexer's numbers.
/// </summary>
public class GrammarStructureTests
{
    private static readonly Ebnf Grammar = Ebnf.Read(File.ReadAllText(Path.Combine(Repo.Root, "grammar", "windscript.ebnf")));

    public static TheoryData<string> Files() => Repo.ExamplesAndCases();

    [Theory]
    [MemberData(nameof(Files))]
    public void The_grammar_accepts_exactly_the_files_the_parser_reads_without_a_syntax_error(string relativePath)
    {
        var tree = SyntaxTree.Parse(File.ReadAllText(Path.Combine(Repo.Root, relativePath)));
        if (tree.Refused) return; // refused before parsing (too deep, too long): nothing to compare
        bool parserAccepts = !tree.Diagnostics.Any(d => d.Code is "WS1001" or "WS1002" or "WS1004");
        Assert.Equal(parserAccepts, Grammar.Accepts(tree.Tokens));
    }

    [Theory]
    [InlineData("winding w {\n  coil - U: 1 -> 7 turns 5 layer bottom\n}\n", true)]
    [InlineData("drive d { U = dc 1 A }\n", true)]
    [InlineData("let x = (1 + 2) * wrap(3, 4) - -5 mm\n", true)]
    [InlineData("machine m {\n  slots 12 12\n}\n", false)]
    [InlineData("winding {\n}\n", false)]
    [InlineData("coil U 1 -> 2\n", false)]
    [InlineData("let let = 3\n", false)]
    public void The_grammar_and_the_parser_agree_on_small_files(string text, bool valid)
    {
        var tree = SyntaxTree.Parse(text);
        Assert.Equal(valid, tree.Diagnostics.Count == 0);
        Assert.Equal(valid, Grammar.Accepts(tree.Tokens));
    }

    [Theory]
    [InlineData("5")]
    [InlineData("0.5")]
    [InlineData(".5")]
    [InlineData("5.")]
    [InlineData("1e3")]
    [InlineData("1e-3")]
    [InlineData(".5e+2")]
    [InlineData("1.5E+2")]
    [InlineData("1e")]
    [InlineData("1.2.3")]
    [InlineData("e5")]
    [InlineData("..5")]
    public void The_grammar_and_the_lexer_read_the_same_numbers(string literal)
    {
        bool grammar = Regex.IsMatch(literal, Grammar.LexicalRegex("number"));
        var (tokens, _) = Lexer.Lex(literal);
        bool lexer = tokens.Length == 2 && tokens[0].Kind == TokenKind.Number && tokens[0].Text == literal;
        Assert.Equal(grammar, lexer);
    }
}
