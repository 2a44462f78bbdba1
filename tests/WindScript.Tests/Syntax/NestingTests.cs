using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Syntax;

/// <summary>Absurd nesting is refused with one diagnostic instead of overflowing the stack (which .NET cannot catch).</summary>
public class NestingTests
{
    [Theory]
    [InlineData(SyntaxTree.MaxNesting + 1)]
    [InlineData(100_000)]
    public void Nesting_past_the_bound_is_one_diagnostic(int depth)
    {
        var text = "let a = " + new string('(', depth) + "1" + new string(')', depth) + "\n";
        var c = Compilation.Compile(text);
        var d = Assert.Single(c.Diagnostics);
        Assert.Equal("WS1003", d.Code);
        Assert.Equal(8 + SyntaxTree.MaxNesting, d.Span.Start); // the first bracket past the bound
        Assert.Null(c.Design);
    }

    [Fact]
    public void Nesting_within_the_bound_is_read()
    {
        int depth = SyntaxTree.MaxNesting;
        var c = Compilation.Compile("let a = " + new string('(', depth) + "1" + new string(')', depth) + "\n");
        Assert.DoesNotContain(c.Diagnostics, d => d.Code.StartsWith("WS1", StringComparison.Ordinal));
    }

    [Fact]
    public void The_command_line_refuses_deep_nesting_with_exit_1_not_a_crash()
    {
        var r = CliRunner.RunWithInput("machine m {\n  slots " + new string('(', 50_000) + "1" + new string(')', 50_000) + "\n}\n", "check", "-");
        Assert.Equal(1, r.Exit);
        Assert.Contains("WS1003", r.Out);
    }
}
