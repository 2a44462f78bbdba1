using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Syntax;

public class ParserTests
{
    private static SyntaxTree Parse(string text) => SyntaxTree.Parse(text);

    private static ExpressionSyntax ParseExpression(string expression)
    {
        var tree = Parse($"let x = {expression}\n");
        Assert.Empty(tree.Diagnostics);
        return Assert.IsType<LetSyntax>(Assert.Single(tree.Root.Statements)).Value;
    }

    [Fact]
    public void Multiplication_binds_tighter_than_addition()
    {
        var e = Assert.IsType<BinaryExpressionSyntax>(ParseExpression("3 * k + 8"));
        Assert.Equal(TokenKind.Plus, e.Operator);
        Assert.Equal(TokenKind.Star, Assert.IsType<BinaryExpressionSyntax>(e.Left).Operator);
    }

    [Fact]
    public void Subtraction_is_left_associative()
    {
        var e = Assert.IsType<BinaryExpressionSyntax>(ParseExpression("10 - 3 - 2"));
        Assert.IsType<BinaryExpressionSyntax>(e.Left);
        Assert.IsType<NumberSyntax>(e.Right);
    }

    [Fact]
    public void A_number_carries_its_unit_and_the_span_covers_both()
    {
        var tree = Parse("let b = 150 mm\n");
        var number = Assert.IsType<NumberSyntax>(((LetSyntax)tree.Root.Statements[0]).Value);
        Assert.Equal("mm", number.Unit!.Text);
        Assert.Equal("150 mm", tree.Source.Slice(number.Span));
    }

    [Fact]
    public void A_coil_statement_reads_phase_sign_slots_turns_and_layer()
    {
        var tree = Parse("winding w {\n  coil -U: 1 -> 10 turns n - 2 layer bottom\n}\n");
        Assert.Empty(tree.Diagnostics);
        var block = Assert.IsType<BlockSyntax>(tree.Root.Statements[0]);
        var coil = Assert.IsType<CoilSyntax>(block.Body[0]);
        Assert.True(coil.Reversed);
        Assert.Equal("U", coil.Phase.Text);
        Assert.Equal("bottom", coil.Layer!.Text);
        Assert.Equal("coil -U: 1 -> 10 turns n - 2 layer bottom", tree.Source.Slice(coil.Span));
    }

    [Fact]
    public void A_slot_pattern_reads_signed_entries_and_repeat()
    {
        var tree = Parse("winding w {\n  top: U -W _ +V repeat 3\n}\n");
        Assert.Empty(tree.Diagnostics);
        var pattern = Assert.IsType<PatternSyntax>(((BlockSyntax)tree.Root.Statements[0]).Body[0]);
        Assert.Equal([false, true, false, false], pattern.Entries.Select(e => e.Reversed));
        Assert.Null(pattern.Entries[2].Phase);
        Assert.NotNull(pattern.Repeat);
    }

    [Fact]
    public void A_phase_current_is_a_sum_of_terms()
    {
        var tree = Parse("drive d {\n  U = sine 70 A peak at 50 Hz phase 0 deg - sine 4 A peak at 250 Hz + dc 1 A\n}\n");
        Assert.Empty(tree.Diagnostics);
        var current = Assert.IsType<PhaseCurrentSyntax>(((BlockSyntax)tree.Root.Statements[0]).Body[0]);
        Assert.Equal([false, true, false], current.Terms.Select(t => t.Negated));
    }

    [Fact]
    public void One_line_blocks_are_accepted()
    {
        Assert.Empty(Parse("drive d { U = dc 1 A }\n").Diagnostics);
    }

    [Fact]
    public void Five_independent_mistakes_on_five_lines_give_five_diagnostics_on_those_lines()
    {
        const string text = """
            machine m {
              slots 36 36
              poles
              phases U V W
            }
            winding w {
              layers 2
              coil U 1 -> 10
              top: U V W repeat
              coil V: 2 -> turns 3
              frobnicate 3
            }
            """;
        var tree = Parse(text);
        var lines = tree.Diagnostics.Select(d => tree.Source.GetPosition(d.Span.Start).Line + 1).ToArray();
        Assert.Equal([2, 3, 8, 9, 10, 11], lines);
        Assert.All(tree.Diagnostics, d => Assert.Equal("WS1001", d.Code));
        // ...and the statements between them still parse.
        var machine = (BlockSyntax)tree.Root.Statements[0];
        Assert.Contains(machine.Body, s => s is PhasesSyntax);
    }

    [Fact]
    public void Missing_value_is_reported_where_it_is_missing()
    {
        var tree = Parse("machine m {\n  poles\n}\n");
        var d = Assert.Single(tree.Diagnostics);
        Assert.Equal("expected a value after 'poles'", d.Message);
        Assert.Equal(new WindScript.Text.LinePosition(1, 7), tree.Source.GetPosition(d.Span.Start));
    }

    [Fact]
    public void A_broken_loop_header_skips_the_whole_body_instead_of_misreading_it()
    {
        var tree = Parse("winding w {\n  for k in 0 .. {\n    coil U: 1 -> 2\n  }\n  layers 2\n}\n");
        Assert.Single(tree.Diagnostics);
        var block = (BlockSyntax)tree.Root.Statements[0];
        Assert.True(block.Closed);
        Assert.Contains(block.Body, s => s is PropertySyntax { Keyword.Text: "layers" });
    }

    [Fact]
    public void An_unclosed_block_is_one_diagnostic()
    {
        var tree = Parse("drive d {\n  U = dc 1 A\n");
        var d = Assert.Single(tree.Diagnostics);
        Assert.Equal("WS1002", d.Code);
    }

    [Fact]
    public void A_stray_closing_brace_is_reported_and_skipped()
    {
        var tree = Parse("}\nmachine m {\n  slots 3\n}\n");
        Assert.Single(tree.Diagnostics);
        Assert.Contains(tree.Root.Statements, s => s is BlockSyntax);
    }

    [Fact]
    public void Every_example_parses_without_diagnostics()
    {
        foreach (var file in Repo.ExampleFiles())
            Assert.Empty(SyntaxTree.Parse(File.ReadAllText(file)).Diagnostics);
    }
}
