using System.Text.RegularExpressions;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cluster;

/// <summary>
/// The ready-to-run job files under docs/cluster: each is read as its scheduler would read it
/// (YAML for Kubernetes and GitHub Actions, bash for Slurm), checked for the fields that scheduler
/// requires (from the Kubernetes batch/v1 Job API, the GitHub Actions workflow syntax and sbatch
/// documentation; common practice), and run for every task in a simulated environment; the merged
/// parts must equal the single-machine run byte for byte.
/// </summary>
public sealed class JobFilesTests : IDisposable
{
    private static readonly string Folder = Path.Combine(Repo.Root, "docs", "cluster");
    private static readonly string[] SweepRange = ["--slots", "6..360", "--poles", "2..180"];
    private static readonly Lazy<string> SingleRun = new(() => ClusterSweep.Single(SweepRange).Out);

    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-jobs-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Fact]
    public void Kubernetes_indexed_job_has_the_fields_it_needs_and_its_pods_write_parts_that_merge_into_the_single_run()
    {
        var docs = Yaml.Documents(Path.Combine(Folder, "sweep-job.yaml"));
        var claim = Assert.Single(docs, d => d.At("kind").Text() == "PersistentVolumeClaim");
        var job = Assert.Single(docs, d => d.At("kind").Text() == "Job");
        Assert.Equal("v1", claim.At("apiVersion").Text());
        Assert.Equal("batch/v1", job.At("apiVersion").Text());
        Assert.NotEmpty(job.At("metadata", "name").Text());
        var spec = job.At("spec");
        Assert.Equal("Indexed", spec.At("completionMode").Text());
        int completions = spec.At("completions").Int();
        Assert.True(spec.At("parallelism").Int() is >= 1);
        var pod = spec.At("template", "spec");
        Assert.Contains(pod.At("restartPolicy").Text(), new[] { "Never", "OnFailure" });   // a Job refuses Always
        var container = Assert.Single(pod.At("containers").Items());
        Assert.NotEmpty(container.At("name").Text());
        Assert.NotEmpty(container.At("image").Text());
        var args = container.At("args").Items().Select(a => a.Text()).ToArray();
        Assert.Equal("sweep", args[0]);
        Assert.Equal(SweepRange, args[1..5]);
        Assert.Equal(["--shard", "auto", "--shards", $"{completions}"], args[5..9]);   // N is the Job's completions
        string output = args[Array.IndexOf(args, "--output") + 1];

        // The part goes to a mounted volume backed by the claim in the same file.
        var mount = Assert.Single(container.At("volumeMounts").Items());
        string mountPath = mount.At("mountPath").Text();
        Assert.StartsWith(mountPath + "/", output);
        var volume = Assert.Single(pod.At("volumes").Items(), v => v.At("name").Text() == mount.At("name").Text());
        Assert.Equal(claim.At("metadata", "name").Text(), volume.At("persistentVolumeClaim", "claimName").Text());

        // Every index, as the Job controller starts it: JOB_COMPLETION_INDEX = 0..completions-1.
        string[] local = args.Select(a => a.Replace(mountPath, _dir)).ToArray();
        for (int index = 0; index < completions; index++)
        {
            var task = ClusterSweep.Task(new Dictionary<string, string> { ["JOB_COMPLETION_INDEX"] = $"{index}" }, local[1..]);
            Assert.True(task.Exit == 0, task.Err);
        }

        // The merge Job's command, run by a POSIX shell as busybox's would.
        var merge = Yaml.Documents(Path.Combine(Folder, "merge-job.yaml")).Single();
        Assert.Equal("batch/v1", merge.At("apiVersion").Text());
        var mergePod = merge.At("spec", "template", "spec");
        Assert.Equal("Never", mergePod.At("restartPolicy").Text());
        var mergeContainer = Assert.Single(mergePod.At("containers").Items());
        Assert.Equal(claim.At("metadata", "name").Text(), Assert.Single(mergePod.At("volumes").Items()).At("persistentVolumeClaim", "claimName").Text());
        var command = mergeContainer.At("command").Items().Select(a => a.Text().Replace(mountPath, _dir)).ToArray();
        Assert.Equal("sh", command[0]);
        var run = JobFileRun.Shell("sh", command[1..], _dir, new Dictionary<string, string>());
        Assert.True(run.Exit == 0, run.Err);
        Assert.Equal(SingleRun.Value, File.ReadAllText(Path.Combine(_dir, "all.jsonl")));
    }

    [Fact]
    public void Slurm_array_script_run_for_every_task_id_and_its_merge_script_give_the_single_run()
    {
        string script = Path.Combine(Folder, "sweep.sbatch");
        string text = File.ReadAllText(script);
        var array = Regex.Match(text, @"^#SBATCH --array=1-(\d+)$", RegexOptions.Multiline);
        Assert.True(array.Success, "the script declares an array numbered 1..N");
        int n = int.Parse(array.Groups[1].Value);
        Assert.Contains($"--shard auto --shards {n}", text);
        Assert.Contains(string.Join(' ', SweepRange), text);
        Assert.Contains($"n={n}", File.ReadAllText(Path.Combine(Folder, "merge.sbatch")));
        string wrapper = Path.Combine(_dir, "bin", "windscript");
        JobFileRun.WriteWrapper(wrapper);
        var common = new Dictionary<string, string> { ["WINDSCRIPT"] = wrapper, ["PARTS"] = Path.Combine(_dir, "parts") };

        // The merge refuses to run while a part is missing, and says which task to rerun.
        for (int k = 1; k <= n; k++)
        {
            if (k == 3) continue;   // task 3 was killed
            var task = JobFileRun.Shell("bash", [script], _dir, new Dictionary<string, string>(common) { ["SLURM_ARRAY_TASK_ID"] = $"{k}", ["SLURM_ARRAY_TASK_MIN"] = "1", ["SLURM_ARRAY_TASK_MAX"] = $"{n}", ["SLURM_ARRAY_TASK_COUNT"] = $"{n}", ["SLURM_CPUS_PER_TASK"] = "1" });
            Assert.True(task.Exit == 0, task.Err);
        }
        var early = JobFileRun.Shell("bash", [Path.Combine(Folder, "merge.sbatch")], _dir, common);
        Assert.NotEqual(0, early.Exit);
        Assert.Contains("sbatch --array=3 ", early.Err);

        // Rerun of the missing task alone, as `sbatch --array=3` numbers it.
        var rerun = JobFileRun.Shell("bash", [script], _dir, new Dictionary<string, string>(common) { ["SLURM_ARRAY_TASK_ID"] = "3", ["SLURM_ARRAY_TASK_MIN"] = "3", ["SLURM_ARRAY_TASK_MAX"] = "3", ["SLURM_ARRAY_TASK_COUNT"] = "1" });
        Assert.True(rerun.Exit == 0, rerun.Err);
        var merge = JobFileRun.Shell("bash", [Path.Combine(Folder, "merge.sbatch")], _dir, common);
        Assert.True(merge.Exit == 0, merge.Err);
        Assert.Equal(SingleRun.Value, File.ReadAllText(Path.Combine(_dir, "parts", "all.jsonl")));
    }

    [Fact]
    public void GitHub_Actions_workflow_has_the_fields_it_needs_and_its_matrix_jobs_and_merge_give_the_single_run()
    {
        var workflow = Assert.Single(Yaml.Documents(Path.Combine(Folder, "sweep-workflow.yml")));
        Assert.True(workflow.At("on").Has("workflow_dispatch"));
        int shards = workflow.At("env", "SHARDS").Int();
        var jobs = workflow.At("jobs");
        foreach (var name in new[] { "build", "sweep", "merge" })
        {
            var job = jobs.At(name);
            Assert.NotEmpty(job.At("runs-on").Text());
            Assert.All(job.At("steps").Items(), step => Assert.True(step.Has("uses") || step.Has("run"), $"a step of {name} neither uses an action nor runs a command"));
        }
        Assert.Equal("build", jobs.At("sweep", "needs").Text());
        Assert.Equal("sweep", jobs.At("merge", "needs").Text());
        Assert.Contains("build/native.sh", string.Join('\n', jobs.At("build", "steps").Items().Where(s => s.Has("run")).Select(s => s.At("run").Text())));
        Assert.True(File.Exists(Path.Combine(Repo.Root, "build", "native.sh")));
        var matrix = jobs.At("sweep", "strategy", "matrix", "shard").Items().Select(i => i.Int());
        Assert.Equal(Enumerable.Range(1, shards), matrix);

        // Each matrix job's sweep step, with the expressions GitHub substitutes.
        var step = Assert.Single(jobs.At("sweep", "steps").Items(), s => s.Has("run"));
        string Expand(string s, int k) => s.Replace("${{ matrix.shard }}", $"{k}").Replace("${{ env.SHARDS }}", $"{shards}");
        JobFileRun.WriteWrapper(Path.Combine(_dir, "native", "windscript"));
        for (int k = 1; k <= shards; k++)
        {
            var env = step.At("env").Entries().ToDictionary(e => e.Key, e => Expand(e.Value, k));
            Assert.Equal($"{k}/{shards}", env["WINDSCRIPT_SHARD"]);
            string run = Expand(step.At("run").Text(), k);
            Assert.Contains(string.Join(' ', SweepRange), run);
            var task = JobFileRun.Shell("bash", ["-euo", "pipefail", "-c", run], _dir, env);
            Assert.True(task.Exit == 0, task.Err);
        }
        var mergeStep = Assert.Single(jobs.At("merge", "steps").Items(), s => s.Has("run"));
        var merge = JobFileRun.Shell("bash", ["-euo", "pipefail", "-c", mergeStep.At("run").Text()], _dir, new Dictionary<string, string> { ["SHARDS"] = $"{shards}" });
        Assert.True(merge.Exit == 0, merge.Err);
        Assert.Equal(SingleRun.Value, File.ReadAllText(Path.Combine(_dir, "all.jsonl")));
    }

    [Fact]
    public void Dockerfile_builds_with_the_repository_native_script_and_ships_the_skia_library()
    {
        var text = File.ReadAllText(Path.Combine(Folder, "Dockerfile"));
        Assert.Contains("RUN build/native.sh /out linux-x64", text);
        Assert.Matches(@"COPY --from=build /out/windscript /out/libSkiaSharp.so", text);
        Assert.Contains("ENTRYPOINT [\"/usr/local/bin/windscript\"]", text);
        Assert.Contains("no container runtime", text);
    }
}
