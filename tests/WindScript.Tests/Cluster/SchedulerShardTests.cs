using WindScript.Sweep;

namespace WindScript.Tests.Cluster;

/// <summary>
/// --shard auto reads the index each scheduler gives a task. The variable names and their
/// numbering are those the schedulers document (common practice): Kubernetes Indexed Jobs set
/// JOB_COMPLETION_INDEX from 0, AWS Batch array jobs AWS_BATCH_JOB_ARRAY_INDEX from 0, Slurm
/// job arrays SLURM_ARRAY_TASK_ID with _MIN, _MAX and _COUNT of the array.
/// </summary>
public class SchedulerShardTests
{
    private static Func<string, string?> Env(params (string Name, string Value)[] vars) =>
        name => vars.FirstOrDefault(v => v.Name == name).Value;

    private static SweepShard Resolve(Func<string, string?> env, int? shards = null)
    {
        var found = SchedulerShard.Resolve(env, shards, out var error);
        Assert.True(found is not null, error);
        Assert.Null(error);
        return found!.Value.Shard;
    }

    private static string Refused(Func<string, string?> env, int? shards = null)
    {
        Assert.Null(SchedulerShard.Resolve(env, shards, out var error));
        Assert.NotNull(error);
        return error!;
    }

    [Fact]
    public void Kubernetes_index_counts_from_zero_and_takes_n_from_shards()
    {
        Assert.Equal(new SweepShard(1, 4), Resolve(Env(("JOB_COMPLETION_INDEX", "0")), 4));
        Assert.Equal(new SweepShard(4, 4), Resolve(Env(("JOB_COMPLETION_INDEX", "3")), 4));
        Assert.Contains("--shards N", Refused(Env(("JOB_COMPLETION_INDEX", "3"))));
        Assert.Contains("outside 0..3", Refused(Env(("JOB_COMPLETION_INDEX", "4")), 4));
    }

    [Fact]
    public void Aws_batch_index_counts_from_zero_and_needs_n()
    {
        Assert.Equal(new SweepShard(3, 5), Resolve(Env(("AWS_BATCH_JOB_ARRAY_INDEX", "2")), 5));
        Assert.Contains("AWS Batch", Refused(Env(("AWS_BATCH_JOB_ARRAY_INDEX", "2"))));
    }

    [Theory]
    [InlineData("3", "1", "8", null, 3, 8)]     // --array=1-8
    [InlineData("0", "0", "7", "8", 1, 8)]      // --array=0-7
    [InlineData("12", "10", null, "5", 3, 5)]   // MIN and COUNT only
    [InlineData("5", "5", "5", "1", 1, 1)]      // a single task
    public void Slurm_task_id_is_placed_within_its_array(string id, string min, string? max, string? count, int k, int n)
    {
        var env = Env(("SLURM_ARRAY_TASK_ID", id), ("SLURM_ARRAY_TASK_MIN", min), ("SLURM_ARRAY_TASK_MAX", max!), ("SLURM_ARRAY_TASK_COUNT", count!));
        Assert.Equal(new SweepShard(k, n), Resolve(env));
    }

    [Fact]
    public void Slurm_with_shards_takes_the_task_id_as_the_shard_so_a_rerun_of_some_tasks_keeps_their_numbers()
    {
        // sbatch --array=3,7 of a job written for --array=1-8: MIN 3, MAX 7, COUNT 2.
        var env = Env(("SLURM_ARRAY_TASK_ID", "7"), ("SLURM_ARRAY_TASK_MIN", "3"), ("SLURM_ARRAY_TASK_MAX", "7"), ("SLURM_ARRAY_TASK_COUNT", "2"));
        Assert.Equal(new SweepShard(7, 8), Resolve(env, 8));
        Assert.Contains("stepped or sparse", Refused(env));
        Assert.Contains("numbered 1..8", Refused(Env(("SLURM_ARRAY_TASK_ID", "0")), 8));
        Assert.Contains("beyond --shards 8", Refused(Env(("SLURM_ARRAY_TASK_ID", "2"), ("SLURM_ARRAY_TASK_MAX", "9")), 8));
    }

    [Fact]
    public void Slurm_without_the_array_bounds_needs_shards()
    {
        Assert.Contains("SLURM_ARRAY_TASK_MIN is not set", Refused(Env(("SLURM_ARRAY_TASK_ID", "2"))));
        Assert.Contains("neither", Refused(Env(("SLURM_ARRAY_TASK_ID", "2"), ("SLURM_ARRAY_TASK_MIN", "1"))));
        Assert.Equal(new SweepShard(2, 6), Resolve(Env(("SLURM_ARRAY_TASK_ID", "2")), 6));
    }

    [Fact]
    public void No_scheduler_variable_is_a_usage_error_that_names_the_variables_read()
    {
        var error = Refused(Env());
        Assert.Contains("JOB_COMPLETION_INDEX", error);
        Assert.Contains("SLURM_ARRAY_TASK_ID", error);
        Assert.Contains("AWS_BATCH_JOB_ARRAY_INDEX", error);
        Assert.Contains("--shard K/N", error);
    }

    [Fact]
    public void Schedulers_that_disagree_are_refused_and_agreeing_ones_accepted()
    {
        var error = Refused(Env(("JOB_COMPLETION_INDEX", "1"), ("AWS_BATCH_JOB_ARRAY_INDEX", "2")), 4);
        Assert.Contains("disagree", error);
        Assert.Contains("JOB_COMPLETION_INDEX=1", error);
        Assert.Equal(new SweepShard(2, 4), Resolve(Env(("JOB_COMPLETION_INDEX", "1"), ("AWS_BATCH_JOB_ARRAY_INDEX", "1")), 4));
    }

    [Theory]
    [InlineData("JOB_COMPLETION_INDEX", "-1")]
    [InlineData("JOB_COMPLETION_INDEX", "two")]
    [InlineData("SLURM_ARRAY_TASK_ID", "3.0")]
    public void A_malformed_index_names_the_variable(string name, string value)
    {
        Assert.Contains($"{name}='{value}'", Refused(Env((name, value)), 4));
    }

    [Fact]
    public void A_ci_matrix_sets_windscript_shard()
    {
        Assert.Equal(new SweepShard(2, 4), Resolve(Env(("WINDSCRIPT_SHARD", "2/4"))));
        Assert.Contains("WINDSCRIPT_SHARD='5/4'", Refused(Env(("WINDSCRIPT_SHARD", "5/4"))));
        Assert.Contains("disagree", Refused(Env(("WINDSCRIPT_SHARD", "2/4")), 8));
        Assert.Contains("disagree", Refused(Env(("WINDSCRIPT_SHARD", "2/4"), ("SLURM_ARRAY_TASK_ID", "3"), ("SLURM_ARRAY_TASK_MIN", "1"), ("SLURM_ARRAY_TASK_MAX", "4"))));
    }

    [Fact]
    public void Shards_must_be_positive() => Assert.Contains("at least 1", Refused(Env(("JOB_COMPLETION_INDEX", "0")), 0));
}
