using System.Text.Json;

namespace WindScript.Tests.Cluster;

/// <summary>
/// <c>--phases 3,5,6</c> and <c>--layers 1,2</c> in one run: the records are exactly those of the
/// separate single runs (the reference), merged in the documented order — slots, poles, phases,
/// layers, pitch — and shards of the combined run still concatenate to it.
/// </summary>
public class SweepListsTests
{
    private static readonly string[] Range = ["--slots", "6..48", "--poles", "2..24", "--orders", "7"];

    private static (int Slots, int Poles, int Phases, int Layers, int Pitch) Key(string line)
    {
        using var doc = JsonDocument.Parse(line);
        var r = doc.RootElement;
        int Get(string name) => r.GetProperty(name).GetInt32();
        return (Get("slots"), Get("poles"), Get("phases"), Get("layers"), Get("pitch"));
    }

    private static List<string> Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries).ToList();

    [Theory]
    [InlineData("pole")]
    [InlineData("all")]
    public void Several_phase_and_layer_counts_give_the_single_runs_merged_in_order(string pitch)
    {
        var combined = ClusterSweep.Single([.. Range, "--pitch", pitch, "--phases", "5,3,6", "--layers", "1,2"]);
        Assert.True(combined.Exit == 0, combined.Err);
        var singles = new List<string>();
        foreach (var m in new[] { "3", "5", "6" })
            foreach (var l in new[] { "1", "2" })
            {
                var one = ClusterSweep.Single([.. Range, "--pitch", pitch, "--phases", m, "--layers", l]);
                Assert.Equal(0, one.Exit);
                singles.AddRange(Lines(one.Out));
            }
        var expected = singles.OrderBy(Key).ToList();   // OrderBy is stable; keys are unique anyway
        Assert.Equal(expected.Count, expected.Select(Key).Distinct().Count());
        Assert.Equal(expected, Lines(combined.Out));
        Assert.Contains(Lines(combined.Out), l => Key(l) is { Phases: 5, Layers: 1 });
    }

    [Fact]
    public void Shards_of_a_combined_sweep_concatenate_to_it_and_threads_do_not_change_it()
    {
        string[] args = [.. Range, "--phases", "3,5", "--layers", "1,2", "--format", "csv"];
        var whole = ClusterSweep.Single(args).Out;
        var parts = Enumerable.Range(1, 4).Select(k => ClusterSweep.Single([.. args, "--shard", $"{k}/4", "--threads", "1"]).Out);
        Assert.Equal(whole, ClusterSweep.Merge(parts, csv: true));
        Assert.Equal(whole, ClusterSweep.Single([.. args, "--threads", "3"]).Out);
    }

    [Theory]
    [InlineData("--phases", "3,x")]
    [InlineData("--phases", "1,3")]
    [InlineData("--layers", "1,3")]
    [InlineData("--layers", "")]
    public void Malformed_lists_are_usage_errors(string option, string value)
    {
        var run = ClusterSweep.Single([.. Range, option, value]);
        Assert.Equal(2, run.Exit);
        Assert.Equal("", run.Out);
        Assert.StartsWith($"windscript sweep: {option}", run.Err);
    }
}
