using WindScript.Checking;
using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Syntax;

/// <summary>
/// The syntax tree keeps what the user wrote (keywords, the coil's '-', every option, a
/// missing name), so diagnostics and quick fixes come from tokens, not from guessed offsets.
/// </summary>
public class FaithfulTreeTests
{
    private const string Machine = "machine m {\n  slots 12\n  poles 2\n  phases U V W\n}\n";

    [Fact]
    public void A_repeated_coil_option_is_reported_at_the_second_one()
    {
        var c = Wind.Compile(Machine + "winding w {\n  layers 2\n  coil A: 1 -> 7 turns 5 turns 60\n}\n");
        var d = Assert.Single(c.Diagnostics, x => x.Code == "WS2020");
        Assert.Equal("turns", c.Source.Slice(d.Span));
        Assert.Equal(c.Source.Text.LastIndexOf("turns", StringComparison.Ordinal), d.Span.Start);
        Assert.Equal("turns 5", c.Source.Slice(Assert.Single(d.Related).Span));
    }

    [Fact]
    public void A_coil_keeps_every_option_in_order()
    {
        var tree = SyntaxTree.Parse("winding w {\n  coil U: 1 -> 7 layer bottom turns 5 turns 60\n}\n");
        var coil = Assert.IsType<CoilSyntax>(((BlockSyntax)tree.Root.Statements[0]).Body[0]);
        Assert.Equal(["layer", "turns", "turns"], coil.Options.Select(o => o.Keyword.Text));
        Assert.Equal("5", tree.Source.Slice(coil.Turns!.Span));
        Assert.Equal("coil", tree.Source.Slice(coil.Keyword.Span));
    }

    [Theory]
    [InlineData("coil - U: 1 -> 7", "coil U: 1 -> 7")]
    [InlineData("coil -U: 1 -> 7", "coil U: 1 -> 7")]
    [InlineData("coil  -U: 1 -> 7", "coil  U: 1 -> 7")]
    [InlineData("coil -  U: 1 -> 7", "coil U: 1 -> 7")]
    [InlineData("coil U: 1 -> 7", "coil -U: 1 -> 7")]
    [InlineData("coil  U: 1 -> 7", "coil  -U: 1 -> 7")]
    public void Reversing_a_coil_edits_its_sign_token_whatever_the_spacing(string coilLine, string expected)
    {
        var text = $"winding w {{\n  {coilLine} turns 3\n}}\n";
        var tree = SyntaxTree.Parse(text);
        Assert.Empty(tree.Diagnostics);
        var coil = (CoilSyntax)((BlockSyntax)tree.Root.Statements[0]).Body[0];
        var fix = SourceEdits.FlipPolarity(tree, coil.Span)!;
        Assert.Equal($"winding w {{\n  {expected} turns 3\n}}\n", Apply(text, fix));
        // ...and reversing twice gives a coil of the original polarity back.
        var again = SyntaxTree.Parse(Apply(text, fix));
        var back = (CoilSyntax)((BlockSyntax)again.Root.Statements[0]).Body[0];
        Assert.Equal(coil.Reversed, !back.Reversed);
    }

    [Theory]
    [InlineData("-W", "W")]
    [InlineData("- W", "W")]
    [InlineData("+W", "-W")]
    [InlineData("W", "-W")]
    public void Reversing_a_pattern_entry_edits_its_sign_token(string entry, string expected)
    {
        var text = $"winding w {{\n  top: U {entry} V\n}}\n";
        var tree = SyntaxTree.Parse(text);
        var pattern = (PatternSyntax)((BlockSyntax)tree.Root.Statements[0]).Body[0];
        var fix = SourceEdits.FlipPolarity(tree, pattern.Entries[1].Span)!;
        Assert.Equal($"winding w {{\n  top: U {expected} V\n}}\n", Apply(text, fix));
    }

    [Fact]
    public void The_reverse_fix_of_the_opposing_coil_check_works_for_every_spacing_of_the_sign()
    {
        // Three coils per phase, the third reversed by mistake, its '-' spaced three ways.
        var text = Machine + """
            winding w {
              layers 2
              turns 3
              coil U: 1 -> 7
              coil U: 2 -> 8
              coil - U: 3 -> 9
              coil V: 5 -> 11
              coil V: 6 -> 12
              coil -V: 7 -> 1
              coil W: 9 -> 3
              coil W: 10 -> 4
              coil  -W: 11 -> 5
            }

            """;
        var c = Wind.Compile(text);
        var opposing = c.Diagnostics.Where(d => d.Code == "WS3015").ToList();
        Assert.Equal(3, opposing.Count);
        // The same mistake in every phase: reversing one alone would unbalance the winding, so
        // each warning offers the one fix that reverses all three.
        var all = opposing[0].Fix!.Edits;
        Assert.All(opposing, d => Assert.Equal(all, d.Fix!.Edits));
        var fixedText = Apply(text, new WindScript.Diagnostics.CodeFix("all", all));
        Assert.Contains("coil U: 3 -> 9", fixedText, StringComparison.Ordinal);
        Assert.Contains("coil V: 7 -> 1", fixedText, StringComparison.Ordinal);
        Assert.Contains("coil  W: 11 -> 5", fixedText, StringComparison.Ordinal);
        Assert.DoesNotContain(Wind.Compile(fixedText).Diagnostics, d => d.Code == "WS3015");
    }

    [Fact]
    public void A_block_without_a_name_is_one_diagnostic_and_its_body_is_still_checked()
    {
        var c = Wind.Compile(Machine + "winding {\n  layers 2\n  turns 3\n  coil U: 1 -> 40\n}\n");
        var missing = Assert.Single(c.Diagnostics, d => d.Code == "WS1004");
        Assert.Equal(0, missing.Span.Length);
        Assert.Equal('{', c.Source.Text[missing.Span.Start]);
        Assert.Contains(c.Diagnostics, d => d.Code == "WS3001" || d.Message.Contains("out of range", StringComparison.Ordinal));
        Assert.DoesNotContain(c.Diagnostics, d => d.Message.Contains("no winding block", StringComparison.Ordinal));
        Assert.Single(c.Diagnostics, d => d.Severity == WindScript.Diagnostics.Severity.Error && d.Code.StartsWith("WS1", StringComparison.Ordinal));
    }

    [Fact]
    public void A_named_block_keeps_its_name_and_an_unnamed_one_a_missing_name_at_the_brace()
    {
        var tree = SyntaxTree.Parse("drive d {\n}\ndrive {\n}\n");
        var named = (BlockSyntax)tree.Root.Statements[0];
        var unnamed = (BlockSyntax)tree.Root.Statements[1];
        Assert.False(named.Name.IsMissing);
        Assert.Equal("d", named.Name.Text);
        Assert.True(unnamed.Name.IsMissing);
        Assert.Equal(tree.Source.Text.LastIndexOf('{'), unnamed.Name.Span.Start);
    }

    [Fact]
    public void A_broken_line_keeps_its_tokens_and_the_message_comes_from_them()
    {
        var tree = SyntaxTree.Parse("machine m {\n  poles 4 5\n}\n");
        var error = Assert.IsType<ErrorStatementSyntax>(((BlockSyntax)tree.Root.Statements[0]).Body[0]);
        Assert.Equal(["poles", "4", "5"], error.Tokens.Where(t => t.Kind != TokenKind.NewLine).Select(t => t.Text));
        Assert.Equal("5", error.Found.Text);
        Assert.Equal("expected end of line after '4', but found '5'", SyntaxErrorMessages.Describe(error));
        Assert.Equal(SyntaxErrorMessages.Describe(error), Assert.Single(tree.Diagnostics).Message);
    }

    [Fact]
    public void Parsing_on_many_threads_at_once_gives_each_file_its_own_messages()
    {
        // Error messages are composed from each tree, not from state shared by the parser.
        var texts = Enumerable.Range(0, 64).Select(i => $"machine m{i} {{\n  poles {i} {i + 1}\n}}\n").ToArray();
        var messages = new string[texts.Length];
        Parallel.For(0, texts.Length, i => messages[i] = Assert.Single(SyntaxTree.Parse(texts[i]).Diagnostics).Message);
        for (int i = 0; i < texts.Length; i++)
            Assert.Equal($"expected end of line after '{i}', but found '{i + 1}'", messages[i]);
    }

    [Fact]
    public void No_source_file_guesses_a_span_length_from_a_number()
    {
        // Spans come from tokens: "span with { Length = 7 }" guessed a keyword's length.
        var guess = new System.Text.RegularExpressions.Regex(@"with\s*\{\s*Length\s*=\s*(Math\.Min\()?\d");
        var offenders = Directory.EnumerateFiles(Path.Combine(Repo.Root, "src"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .Where(f => guess.IsMatch(File.ReadAllText(f)))
            .Select(f => Path.GetRelativePath(Repo.Root, f))
            .ToList();
        Assert.Empty(offenders);
    }

    private static string Apply(string text, WindScript.Diagnostics.CodeFix fix) =>
        fix.Edits.OrderByDescending(e => e.Span.Start).Aggregate(text, (t, e) => t.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText));
}
