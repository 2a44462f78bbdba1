using WindScript.Cli;

namespace WindScript.Tests.Cluster;

/// <summary>Runs <c>windscript sweep</c> in process as one task of a simulated scheduler.</summary>
internal static class ClusterSweep
{
    public sealed record Result(int Exit, string Out, string Err);

    /// <summary>One task: the CLI sees only <paramref name="environment"/> as its environment.</summary>
    public static Result Task(IReadOnlyDictionary<string, string> environment, params string[] args) => Task(environment, terminal: false, args);

    public static Result Task(IReadOnlyDictionary<string, string> environment, bool terminal, params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        var io = new CliIO(new StringReader(""), o, e, terminal) { Environment = name => environment.GetValueOrDefault(name) };
        int exit = CliApp.Run(["sweep", .. args], io);
        return new Result(exit, o.ToString(), e.ToString());
    }

    public static Result Single(params string[] args) => Task(new Dictionary<string, string>(), args);

    /// <summary>The environment each scheduler gives task <paramref name="k"/> (1-based) of <paramref name="n"/>, as the job files under docs/cluster set them up.</summary>
    public static Dictionary<string, string> Environment(string scheduler, int k, int n) => scheduler switch
    {
        "kubernetes" => new() { ["JOB_COMPLETION_INDEX"] = $"{k - 1}", ["JOB_NAME"] = "windscript-sweep" },
        "slurm" => new()
        {
            ["SLURM_ARRAY_TASK_ID"] = $"{k}", ["SLURM_ARRAY_TASK_MIN"] = "1", ["SLURM_ARRAY_TASK_MAX"] = $"{n}",
            ["SLURM_ARRAY_TASK_COUNT"] = $"{n}", ["SLURM_ARRAY_JOB_ID"] = "4242",
        },
        "aws" => new() { ["AWS_BATCH_JOB_ARRAY_INDEX"] = $"{k - 1}", ["AWS_BATCH_JOB_ID"] = "job:1" },
        "matrix" => new() { ["WINDSCRIPT_SHARD"] = $"{k}/{n}", ["GITHUB_ACTIONS"] = "true" },
        _ => throw new ArgumentException(scheduler),
    };

    /// <summary>The arguments each scheduler's job file passes besides the sweep itself.</summary>
    public static string[] AutoArguments(string scheduler, int n) => scheduler is "slurm" or "matrix" ? ["--shard", "auto"] : ["--shard", "auto", "--shards", $"{n}"];

    /// <summary>Concatenates parts as the merge step does: everything of part 1, and for CSV every later part without its header line.</summary>
    public static string Merge(IEnumerable<string> parts, bool csv) =>
        string.Concat(parts.Select((p, i) => csv && i > 0 ? p[(p.IndexOf('\n') + 1)..] : p));
}
