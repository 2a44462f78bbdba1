using System.Text.Json;
using WindScript.Tests.Support;

namespace WindScript.Tests.Semantics;

/// <summary>
/// Issue 13, findings 1, 4, 5 and 6, each shrunk to the least input that showed it: the limits
/// (InputLimits) are enforced with one diagnostic at the place that exceeds them, and nothing
/// overflows, recurses without bound or reaches an output as infinity or NaN.
/// </summary>
public sealed class LimitTests
{
    private const string Machine = "machine m {\n  slots 24\n  poles 2\n  phases A\n  bore 100 mm\n  stack 60 mm\n  gap 1 mm\n}\n";

    private static string Winding(string turns) => Machine + $"winding w {{\n  layers 1\n  coil A: 1 -> 13 turns {turns}\n}}\n";

    private static IEnumerable<string> Codes(string text) => Compilation.Compile(text).Diagnostics.Select(d => d.Code);

    /// <summary>Runs on a thread with a small stack (1 MiB, like a thread-pool thread), where per-operand recursion would overflow.</summary>
    private static Compilation CompileOnSmallStack(string text)
    {
        Compilation? result = null;
        var thread = new Thread(() => result = Compilation.Compile(text), 1 << 20);
        thread.Start();
        thread.Join();
        return result!;
    }

    [Fact]
    public void A_chain_of_16400_additions_is_refused_with_one_diagnostic_instead_of_a_stack_overflow()
    {
        var c = CompileOnSmallStack(Winding(string.Join(" + ", Enumerable.Repeat("1", 16_400))));
        var d = Assert.Single(c.Diagnostics);
        Assert.Equal("WS1021", d.Code);
        Assert.Null(c.Design);
    }

    [Fact]
    public void A_chain_at_the_limit_evaluates_on_a_small_stack()
    {
        // 1,000 operators: 1 + 1 + ... (1,001 ones), the longest chain read.
        var c = CompileOnSmallStack(Winding(string.Join(" + ", Enumerable.Repeat("1", InputLimits.MaxOperatorsPerLine + 1))));
        Assert.DoesNotContain(c.Diagnostics, d => d.Severity == WindScript.Diagnostics.Severity.Error);
        Assert.Equal(InputLimits.MaxOperatorsPerLine + 1, c.Design!.Winding.Coils[0].Turns);
    }

    [Fact]
    public void A_file_larger_than_the_limit_is_refused_unread()
    {
        var text = Machine + new string('#', InputLimits.MaxFileBytes) + "\n";
        var d = Assert.Single(Compilation.Compile(text).Diagnostics);
        Assert.Equal("WS1020", d.Code);
    }

    [Theory]
    [InlineData("2000000000")]   // passed check, crashed eval (overflow)
    [InlineData("100000000")]    // crashed check in a 48-coil example
    public void Turns_beyond_the_limit_are_WS2040(string turns)
    {
        var d = Assert.Single(Compilation.Compile(Winding(turns)).Diagnostics, x => x.Severity == WindScript.Diagnostics.Severity.Error);
        Assert.Equal("WS2040", d.Code);
        Assert.Contains("10,000", d.Message);
    }

    [Fact]
    public void Turns_beyond_the_limit_exit_1_not_3_in_eval()
    {
        var dir = Directory.CreateTempSubdirectory("windscript-limits-").FullName;
        try
        {
            var path = Path.Combine(dir, "t.wind");
            File.WriteAllText(path, Winding("2000000000"));
            var r = CliRunner.Run("eval", path);
            Assert.Equal(1, r.Exit);
            Assert.Contains("WS2040", r.Err);
        }
        finally
        {
            Directory.Delete(dir, true);
        }
    }

    [Fact]
    public void Poles_beyond_the_limit_are_WS2040_at_the_pole_count()
    {
        var text = Machine.Replace("poles 2", "poles 100000") + "winding w {\n  layers 1\n  coil A: 1 -> 13 turns 1\n}\n";
        var d = Assert.Single(Compilation.Compile(text).Diagnostics, x => x.Code == "WS2040");
        Assert.Equal("100000", text.Substring(d.Span.Start, d.Span.Length));
    }

    [Theory]
    [InlineData("1e309")]
    [InlineData("1e300 * 1e300")]
    [InlineData("gcd(5, 0 - 1e300)")]   // was exit 3 (negating long.MinValue)
    [InlineData("gcd(5, 1e300)")]       // was silently 1
    [InlineData("lcm(3000000000, 5000000001)")]
    public void Numbers_beyond_range_are_WS2042(string expression)
    {
        Assert.Contains("WS2042", Codes(Winding(expression)));
    }

    [Fact]
    public void Gcd_and_lcm_within_range_are_exact()
    {
        var c = Compilation.Compile(Winding("gcd(9007199254740992, 12) + lcm(4, 6) - 15"));
        Assert.Equal(4 + 12 - 15, c.Design!.Winding.Coils[0].Turns);
    }

    [Fact]
    public void A_loop_of_more_coils_than_the_limit_is_one_WS2041()
    {
        var text = Machine + "winding w {\n  layers 1\n  for k in 1 .. 100001 {\n    coil A: 1 -> 13 turns 1\n  }\n}\n";
        var c = Compilation.Compile(text);
        Assert.Single(c.Diagnostics, d => d.Code == "WS2041");
    }

    [Fact]
    public void Eval_refuses_more_mechanical_orders_than_the_limit_with_a_usage_error()
    {
        var synth = CliRunner.Run("synth", "--slots", "999", "--poles", "1000");
        Assert.Equal(0, synth.Exit);
        var r = CliRunner.RunWithInput(synth.Out, "eval", "-", "--orders", "1000");
        Assert.Equal(2, r.Exit);
        Assert.Contains("--orders", r.Err);
    }

    [Fact]
    public void Synth_never_suggests_counts_beyond_the_limits()
    {
        var r = CliRunner.Run("synth", "--slots", "1000", "--poles", "1000");
        Assert.Equal(1, r.Exit);
        Assert.DoesNotContain("1002 slots", r.Err);
    }

    /// <summary>Finding 6: no case file or example gives a non-finite number in eval's JSON.</summary>
    [Fact]
    public void Eval_json_of_every_case_and_example_has_only_finite_numbers()
    {
        foreach (var file in Repo.CaseFiles().Concat(Repo.ExampleFiles()))
        {
            var r = CliRunner.Run("eval", file, "--format", "json");
            if (r.Out.Length == 0) continue;
            Assert.DoesNotContain("NaN", r.Out);
            Assert.DoesNotContain("Infinity", r.Out);
            using var doc = JsonDocument.Parse(r.Out);
        }
    }

    [Theory]
    [InlineData("winding w {\n  layers 2\n  turns 2000000000\n  top: A -A\n  pitch 1 slots\n}\n")]
    [InlineData("winding w {\n  layers 2\n  group g {\n    turns 2000000000\n    top: A -A\n    pitch 1 slots\n  }\n}\n")]
    [InlineData("winding w {\n  layers 1\n  turns 2000000000\n  coil A: 1 -> 2\n}\n")]
    public void A_refused_turns_value_is_one_error_without_a_missing_turns_cascade(string winding)
    {
        // The limits_beyond case reported WS2013 ("no turns") under the WS2040 of the refused value.
        var text = "machine m {\n  slots 2\n  poles 2\n  phases A\n  bore 100 mm\n  stack 60 mm\n  gap 1 mm\n}\n" + winding;
        var errors = Compilation.Compile(text).Diagnostics.Where(d => d.Severity == WindScript.Diagnostics.Severity.Error).ToList();
        Assert.Equal(["WS2040"], errors.Select(d => d.Code));
    }

    [Fact]
    public void A_pattern_without_any_turns_statement_still_reports_WS2013()
    {
        var text = "machine m {\n  slots 2\n  poles 2\n  phases A\n  bore 100 mm\n  stack 60 mm\n  gap 1 mm\n}\nwinding w {\n  layers 2\n  top: A -A\n  pitch 1 slots\n}\n";
        Assert.Contains("WS2013", Codes(text));
    }

    [Theory]
    [InlineData("2147483648.5", "from 1 to 10,000, not 2147483648.5")]   // read "not 2147483648", and "at least 1" where 10,000 applies
    [InlineData("10000.5", "from 1 to 10,000, not 10000.5")]
    [InlineData("0.5", "from 1 to 10,000, not 0.5")]
    public void A_turns_value_that_is_not_whole_names_the_limit_and_shows_its_digits(string turns, string expected)
    {
        var d = Assert.Single(Compilation.Compile(Winding(turns)).Diagnostics, x => x.Code == "WS2012");
        Assert.Contains(expected, d.Message);
    }

    [Fact]
    public void A_pitch_beyond_the_slot_limit_is_refused_when_the_slot_count_is_not_known()
    {
        // With the slot count refused, a pitch of 2^31 slots reached an integer cast.
        var text = Machine.Replace("slots 24", "slots 1e300") + "winding w {\n  layers 2\n  turns 1\n  pitch 2147483648 slots\n}\n";
        var d = Assert.Single(Compilation.Compile(text).Diagnostics, x => x.Code == "WS2012");
        Assert.Contains("not 2147483648", d.Message);
    }

    [Fact]
    public void Eval_text_shows_a_small_q_with_its_digits_not_as_zero()
    {
        // q = Q/(2p·m) = 1/(1000·25) = 0.00004 (closed form); it printed as "1/25000 = 0".
        var phases = string.Join(" ", Enumerable.Range(1, 25).Select(k => $"P{k}"));
        var text = $"machine m {{\n  slots 1\n  poles 1000\n  phases {phases}\n  bore 100 mm\n  stack 60 mm\n  gap 1 mm\n}}\nwinding w {{\n  layers 1\n  coil P1: 1 -> 1 turns 1\n}}\n";
        var r = CliRunner.RunWithInput(text, "eval", "-");
        Assert.Contains("1/25000 = 0.00004", r.Out + r.Err);
    }

    [Fact]
    public void Hover_numbers_keep_the_digits_of_a_small_value()
    {
        Assert.Equal("0.00004", WindScript.LanguageServer.Features.Numbers.Show(1.0 / 25000));
        Assert.Equal("0.3333", WindScript.LanguageServer.Features.Numbers.Show(1.0 / 3));
        Assert.Equal("0", WindScript.LanguageServer.Features.Numbers.Show(0));
    }

    [Theory]
    [InlineData("report", "--output", "x.html")]
    [InlineData("plot", "--kind", "field", "-o", "x.svg")]
    public void Report_and_plot_of_a_number_beyond_range_write_nothing_instead_of_NaN(params string[] command)
    {
        // Finding 6: report exited 3 at 1e308 and plot wrote SVGs full of NaN.
        var dir = Directory.CreateTempSubdirectory("windscript-limits-").FullName;
        try
        {
            var input = Path.Combine(dir, "big.wind");
            File.WriteAllText(input, File.ReadAllText(Path.Combine(Repo.Examples, "coil_fixture_ac.wind")).Replace("bore 100 mm", "bore 1e308 m"));
            Assert.Contains("1e308", File.ReadAllText(input));
            string[] args = [command[0], input, .. command[1..^1], Path.Combine(dir, command[^1])];
            var r = CliRunner.Run(args);
            Assert.Equal(1, r.Exit);
            Assert.Contains("WS2042", r.Err + r.Out);
            Assert.False(File.Exists(Path.Combine(dir, command[^1])));
        }
        finally
        {
            Directory.Delete(dir, true);
        }
    }
}

/// <summary>Issue 13, findings 5 and 9: floods of identical diagnostics, and eval's JSON for a file it cannot evaluate.</summary>
public sealed class FloodTests
{
    [Fact]
    public void The_same_mistake_in_nested_loops_is_reported_once_with_its_count()
    {
        var text = File.ReadAllText(Path.Combine(Repo.Cases, "flood_in_nested_loops.wind"));
        var c = Compilation.Compile(text);
        var d = Assert.Single(c.Diagnostics, x => x.Severity == WindScript.Diagnostics.Severity.Error);
        Assert.EndsWith("(999,000 times here)", d.Message);
    }

    [Fact]
    public void Check_of_the_flood_prints_one_line_per_place()
    {
        var r = CliRunner.Run("check", Path.Combine(Repo.Cases, "flood_in_nested_loops.wind"));
        Assert.Equal(1, r.Exit);
        Assert.True(r.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length < 10, r.Out);
    }

    [Fact]
    public void Eval_json_of_an_incomplete_file_is_a_document_with_its_diagnostics()
    {
        var r = CliRunner.RunWithInput("machine m {\n  slots 12\n}\n", "eval", "-", "--format", "json");
        Assert.Equal(1, r.Exit);
        using var doc = JsonDocument.Parse(r.Out);
        Assert.NotEmpty(doc.RootElement.GetProperty("diagnostics").EnumerateArray());
    }
}
