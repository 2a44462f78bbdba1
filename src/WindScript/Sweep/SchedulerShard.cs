using System.Globalization;

namespace WindScript.Sweep;

/// <summary>
/// <c>--shard auto</c>: the shard K/N of a task of a batch scheduler, read from the variables the
/// scheduler sets in each task's environment. The environment is passed in as a lookup, so the
/// core reads no process state and tests can simulate any scheduler.
/// </summary>
/// <remarks>
/// Kubernetes Indexed Jobs: JOB_COMPLETION_INDEX = 0..N−1 (K = index + 1); the pod cannot see the
/// Job's <c>completions</c>, so N is given (<c>--shards N</c>). AWS Batch array jobs:
/// AWS_BATCH_JOB_ARRAY_INDEX = 0..N−1, N given. Slurm job arrays: with N given, the array is
/// numbered 1..N and K = SLURM_ARRAY_TASK_ID (so a rerun of some tasks, <c>--array=3,7</c>, keeps
/// their numbers); without it, K = ID − MIN + 1 and N = MAX − MIN + 1 or COUNT, which must agree
/// (a stepped or sparse array does not give a contiguous 1..N). Anything else (a CI matrix): the
/// job sets WINDSCRIPT_SHARD = K/N, so the command is the same on every scheduler.
/// </remarks>
internal static class SchedulerShard
{
    public const string Kubernetes = "JOB_COMPLETION_INDEX";
    public const string SlurmId = "SLURM_ARRAY_TASK_ID", SlurmMin = "SLURM_ARRAY_TASK_MIN", SlurmMax = "SLURM_ARRAY_TASK_MAX", SlurmCount = "SLURM_ARRAY_TASK_COUNT";
    public const string AwsBatch = "AWS_BATCH_JOB_ARRAY_INDEX";
    public const string Generic = "WINDSCRIPT_SHARD";

    /// <summary>The variables <c>--shard auto</c> reads, for help text and messages.</summary>
    public static readonly string Variables = $"{Kubernetes} (Kubernetes Indexed Job), {SlurmId} with {SlurmMin}/{SlurmMax} or {SlurmCount} (Slurm job array), {AwsBatch} (AWS Batch array job), {Generic}=K/N (a CI matrix or any other)";

    /// <summary>The shard and where it came from, or null with a usage message.</summary>
    /// <param name="environment">Looks a variable up; null when it is not set.</param>
    /// <param name="shards">N from <c>--shards</c>, when given.</param>
    /// <param name="error">Why no shard could be taken from the environment (null on success).</param>
    public static (SweepShard Shard, string Source)? Resolve(Func<string, string?> environment, int? shards, out string? error)
    {
        error = null;
        if (shards is < 1) { error = $"--shards must be at least 1, not {shards}"; return null; }
        var found = new List<(SweepShard Shard, string Source)>();
        foreach (var read in new Func<Func<string, string?>, int?, (SweepShard, string)?>[] { FromKubernetes, FromSlurm, FromAwsBatch, FromGeneric })
        {
            string? problem = null;
            var one = Try(read, environment, shards, ref problem);
            if (problem is not null) { error = problem; return null; }
            if (one is { } r) found.Add(r);
        }
        if (found.Count == 0)
        {
            error = $"--shard auto found no scheduler index in the environment; it reads {Variables}. Outside a scheduler write --shard K/N";
            return null;
        }
        if (found.Any(f => f.Shard != found[0].Shard))
        {
            error = "--shard auto: the scheduler variables disagree: " + string.Join("; ", found.Select(f => $"{f.Source} gives shard {f.Shard}"));
            return null;
        }
        return found[0];
    }

    private static (SweepShard, string)? Try(Func<Func<string, string?>, int?, (SweepShard, string)?> read, Func<string, string?> env, int? shards, ref string? problem)
    {
        try { return read(env, shards); }
        catch (FormatException e) { problem = "--shard auto: " + e.Message; return null; }
    }

    private static (SweepShard, string)? FromKubernetes(Func<string, string?> env, int? shards) => ZeroBased(env, Kubernetes, shards, "a Kubernetes Indexed Job: set it to the Job's completions");

    private static (SweepShard, string)? FromAwsBatch(Func<string, string?> env, int? shards) => ZeroBased(env, AwsBatch, shards, "an AWS Batch array job: set it to the array size");

    private static (SweepShard, string)? FromGeneric(Func<string, string?> env, int? shards)
    {
        var text = env(Generic);
        if (string.IsNullOrWhiteSpace(text)) return null;
        if (SweepShard.Parse(text.Trim(), out _) is not { } shard) throw new FormatException($"{Generic}='{text}' is not K/N with 1 <= K <= N");
        if (shards is { } n && n != shard.Count) throw new FormatException($"{Generic}={text} and --shards {n} disagree");
        return (shard, $"{Generic}={text.Trim()}");
    }

    private static (SweepShard, string)? ZeroBased(Func<string, string?> env, string name, int? shards, string hint)
    {
        if (Read(env, name) is not { } index) return null;
        if (shards is not { } n) throw new FormatException($"{name}={index} is set, but the number of shards is not: add --shards N for {hint}");
        if (index >= n) throw new FormatException($"{name}={index} is outside 0..{n - 1} for --shards {n}");
        return (new SweepShard(index + 1, n), $"{name}={index} with --shards {n}");
    }

    private static (SweepShard, string)? FromSlurm(Func<string, string?> env, int? shards)
    {
        if (Read(env, SlurmId) is not { } id) return null;
        int? min = Read(env, SlurmMin), max = Read(env, SlurmMax), count = Read(env, SlurmCount);
        string seen = $"{SlurmId}={id}" + Shown(SlurmMin, min) + Shown(SlurmMax, max) + Shown(SlurmCount, count);
        if (shards is { } n)
        {
            // The array is numbered 1..N; a rerun of some tasks (--array=3,7) keeps their numbers.
            if (id < 1 || id > n) throw new FormatException($"{seen}: with --shards {n} the array must be numbered 1..{n} (#SBATCH --array=1-{n}), and {id} is outside it");
            if (max is { } top && top > n) throw new FormatException($"{seen}: the array runs to {top}, beyond --shards {n}");
            return (new SweepShard(id, n), $"{SlurmId}={id} with --shards {n}");
        }
        if (min is not { } first) throw new FormatException($"{seen}: {SlurmMin} is not set; add --shards N and number the array 1..N");
        int? fromRange = max is { } last ? last - first + 1 : null;
        if (fromRange is { } r && count is { } c && r != c)
            throw new FormatException($"{seen}: the array is stepped or sparse ({c} tasks over {first}..{max}); number it 1..N and add --shards N");
        if ((fromRange ?? count) is not { } total) throw new FormatException($"{seen}: neither {SlurmMax} nor {SlurmCount} is set; add --shards N");
        int k = id - first + 1;
        if (k < 1 || k > total) throw new FormatException($"{seen}: the task is outside the array {first}..{first + total - 1}");
        return (new SweepShard(k, total), seen);
    }

    private static string Shown(string name, int? value) => value is { } v ? $", {name}={v}" : "";

    private static int? Read(Func<string, string?> env, string name)
    {
        var text = env(name);
        if (string.IsNullOrWhiteSpace(text)) return null;
        if (int.TryParse(text.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int value)) return value;
        throw new FormatException($"{name}='{text}' is not a whole number of 0 or more");
    }
}
