using System.Text.Json;
using WindScript.Cli;

namespace WindScript.Tests.Synthesis;

/// <summary>The synth and sweep commands end to end, in process.</summary>
public class SynthSweepCliTests
{
    private static (int Exit, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int exit = CliApp.Run(args, new CliIO(new StringReader(""), o, e));
        return (exit, o.ToString(), e.ToString());
    }

    [Fact]
    public void Synth_prints_a_file_that_checks_clean()
    {
        var (exit, text, err) = Run("synth", "--slots", "36", "--poles", "4", "--pitch", "7", "--turns", "11", "--paths", "2");
        Assert.Equal(0, exit);
        Assert.Equal("", err);
        Assert.StartsWith("# 36 slots, 4 poles, 3 phases, double layer", text);
        var compilation = Compilation.Compile(text);
        Assert.DoesNotContain(compilation.Diagnostics, d => d.Severity != WindScript.Diagnostics.Severity.Info);
        Assert.Equal(2, compilation.Design!.Winding.Paths);
        Assert.Equal(11 * 12 / 2.0, compilation.Design.SeriesTurns(0));
    }

    [Fact]
    public void Synth_of_an_infeasible_combination_exits_1_with_the_condition_and_nearest_counts()
    {
        var (exit, text, err) = Run("synth", "--slots", "10", "--poles", "8");
        Assert.Equal(ExitCodes.Findings, exit);
        Assert.Equal("", text);
        Assert.Contains("error WS6001", err);
        Assert.Contains("Q/(m·t) = 10/(3·2) = 5/3 must be a whole number", err);
        Assert.Contains("nearest feasible: 9 or 12 slots with 8 poles", err);
    }

    [Theory]
    [InlineData("--slots", "12", "--poles", "9")]
    [InlineData("--slots", "12", "--poles", "10", "--layers", "3")]
    [InlineData("--slots", "12", "--poles", "10", "--pitch", "12")]
    [InlineData("--slots", "12")]
    public void Synth_rejects_malformed_requests_as_usage_errors(params string[] args)
    {
        var (exit, text, _) = Run(["synth", .. args]);
        Assert.Equal(ExitCodes.Usage, exit);
        Assert.Equal("", text);
    }

    [Fact]
    public void Sweep_writes_one_json_object_per_feasible_layout_in_order()
    {
        var (exit, text, err) = Run("sweep", "--slots", "6..30", "--poles", "2..20", "--orders", "5");
        Assert.Equal(0, exit);
        Assert.Equal("", err);
        var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var keys = lines.Select(l =>
        {
            using var doc = JsonDocument.Parse(l);
            var r = doc.RootElement;
            Assert.Equal(5, r.GetProperty("windingFactors").GetArrayLength());
            return (r.GetProperty("slots").GetInt32(), r.GetProperty("poles").GetInt32());
        }).ToList();
        Assert.Equal(keys.OrderBy(k => k.Item1).ThenBy(k => k.Item2), keys);
        Assert.Contains((12, 10), keys);
        Assert.DoesNotContain((10, 8), keys);
    }

    [Fact]
    public void Sweep_shards_concatenate_to_the_single_machine_output()
    {
        string[] args = ["sweep", "--slots", "6..72", "--poles", "2..40", "--format", "csv"];
        var whole = Run(args).Out;
        var parts = Enumerable.Range(1, 5).Select(k => Run([.. args, "--shard", $"{k}/5"]).Out).ToList();
        string header = whole[..(whole.IndexOf('\n') + 1)];
        Assert.All(parts, p => Assert.StartsWith(header, p));
        Assert.Equal(whole, header + string.Concat(parts.Select(p => p[header.Length..])));
        Assert.All(parts, p => Assert.True(p.Length > header.Length, "every shard gets some work"));
    }

    [Fact]
    public void Sweep_output_does_not_depend_on_the_number_of_threads()
    {
        string[] args = ["sweep", "--slots", "6..60", "--poles", "2..30", "--pitch", "all"];
        Assert.Equal(Run([.. args, "--threads", "1"]).Out, Run([.. args, "--threads", "3"]).Out);
    }

    [Fact]
    public void Sweep_draws_progress_on_standard_error_only_when_it_is_a_terminal()
    {
        string[] args = ["sweep", "--slots", "6..60", "--poles", "2..30"];
        var plain = Run(args);
        var o = new StringWriter();
        var e = new StringWriter();
        Assert.Equal(0, CliApp.Run(args, new CliIO(new StringReader(""), o, e, ErrIsTerminal: true)));
        Assert.Equal(plain.Out, o.ToString());
        Assert.Equal("", plain.Err);
        Assert.Contains("sweep [", e.ToString());
        Assert.Contains("100%", e.ToString());
    }

    [Theory]
    [InlineData("--slots", "30..6", "--poles", "2..10")]
    [InlineData("--slots", "6..30", "--poles", "2..10", "--shard", "3/2")]
    [InlineData("--slots", "6..30", "--poles", "2..10", "--pitch", "half")]
    [InlineData("--slots", "x", "--poles", "2..10")]
    public void Sweep_rejects_malformed_arguments_as_usage_errors(params string[] args)
    {
        var (exit, text, err) = Run(["sweep", .. args]);
        Assert.Equal(ExitCodes.Usage, exit);
        Assert.Equal("", text);
        Assert.StartsWith("windscript sweep:", err);
    }
}
