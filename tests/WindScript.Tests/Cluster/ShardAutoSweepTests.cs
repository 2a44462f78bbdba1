namespace WindScript.Tests.Cluster;

/// <summary>
/// Every task of a simulated scheduler runs the same command with <c>--shard auto</c>; the parts
/// merged as docs/cluster says are byte for byte the single-machine run (an independent
/// reference: the unsharded sweep itself).
/// </summary>
public class ShardAutoSweepTests
{
    private static readonly string[] Sweep = ["--slots", "6..60", "--poles", "2..30", "--orders", "7"];

    [Theory]
    [InlineData("kubernetes", "jsonl", 4)]
    [InlineData("kubernetes", "csv", 3)]
    [InlineData("slurm", "jsonl", 5)]
    [InlineData("slurm", "csv", 4)]
    [InlineData("aws", "jsonl", 3)]
    [InlineData("aws", "csv", 6)]
    [InlineData("matrix", "jsonl", 4)]
    [InlineData("matrix", "csv", 2)]
    public void Parts_from_every_task_of_a_scheduler_merge_into_the_single_run(string scheduler, string format, int n)
    {
        string[] args = [.. Sweep, "--format", format];
        var single = ClusterSweep.Single(args);
        Assert.Equal(0, single.Exit);
        var parts = Enumerable.Range(1, n).Select(k =>
        {
            var task = ClusterSweep.Task(ClusterSweep.Environment(scheduler, k, n), [.. args, .. ClusterSweep.AutoArguments(scheduler, n)]);
            Assert.True(task.Exit == 0, task.Err);
            Assert.Equal("", task.Err);   // not a terminal: nothing on standard error
            return task.Out;
        }).ToList();
        Assert.All(parts, p => Assert.True(p.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length > (format == "csv" ? 1 : 0), "every task gets work"));
        Assert.Equal(single.Out, ClusterSweep.Merge(parts, format == "csv"));
    }

    [Fact]
    public void Auto_gives_the_same_part_as_the_explicit_shard()
    {
        var auto = ClusterSweep.Task(ClusterSweep.Environment("kubernetes", 2, 3), [.. Sweep, "--shard", "auto", "--shards", "3"]);
        Assert.Equal(ClusterSweep.Single([.. Sweep, "--shard", "2/3"]).Out, auto.Out);
    }

    [Fact]
    public void On_a_terminal_the_variables_read_are_printed_on_standard_error()
    {
        var task = ClusterSweep.Task(ClusterSweep.Environment("slurm", 2, 4), terminal: true, [.. Sweep, "--shard", "auto"]);
        Assert.Equal(0, task.Exit);
        Assert.Contains("shard 2/4 from SLURM_ARRAY_TASK_ID=2, SLURM_ARRAY_TASK_MIN=1, SLURM_ARRAY_TASK_MAX=4, SLURM_ARRAY_TASK_COUNT=4", task.Err);
    }

    [Fact]
    public void Auto_outside_a_scheduler_is_a_usage_error_naming_the_variables()
    {
        var task = ClusterSweep.Single([.. Sweep, "--shard", "auto"]);
        Assert.Equal(2, task.Exit);
        Assert.Equal("", task.Out);
        Assert.StartsWith("windscript sweep: --shard auto found no scheduler index", task.Err);
        Assert.Contains("JOB_COMPLETION_INDEX", task.Err);
    }

    [Theory]
    [InlineData("--shards", "4")]                        // --shards without auto
    [InlineData("--shard", "2/3", "--shards", "4")]      // explicit shard and --shards disagree
    [InlineData("--skip-existing")]                      // nothing to skip without --output
    public void Inconsistent_shard_options_are_usage_errors(params string[] extra)
    {
        var task = ClusterSweep.Single([.. Sweep, .. extra]);
        Assert.Equal(2, task.Exit);
        Assert.Equal("", task.Out);
        Assert.StartsWith("windscript sweep:", task.Err);
    }

    [Fact]
    public void Disagreeing_scheduler_variables_are_a_usage_error()
    {
        var env = new Dictionary<string, string> { ["JOB_COMPLETION_INDEX"] = "0", ["SLURM_ARRAY_TASK_ID"] = "3" };
        var task = ClusterSweep.Task(env, [.. Sweep, "--shard", "auto", "--shards", "4"]);
        Assert.Equal(2, task.Exit);
        Assert.Contains("disagree", task.Err);
    }

    [Fact]
    public void Help_names_the_variables_auto_reads()
    {
        var help = ClusterSweep.Single("--help");
        Assert.Contains("auto", help.Out);
        Assert.Contains("JOB_COMPLETION_INDEX", help.Out);
        Assert.Contains("SLURM_ARRAY_TASK_ID", help.Out);
        Assert.Contains("AWS_BATCH_JOB_ARRAY_INDEX", help.Out);
    }
}
