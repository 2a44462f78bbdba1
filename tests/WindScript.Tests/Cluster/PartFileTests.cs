using WindScript.Cli;

namespace WindScript.Tests.Cluster;

/// <summary>Parts are written whole or not at all, reruns reproduce them, and a rerun can fill in only the missing ones.</summary>
public sealed class PartFileTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-parts-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static readonly string[] Sweep = ["--slots", "6..48", "--poles", "2..24", "--orders", "5"];

    [Fact]
    public void Output_files_named_by_shard_merge_into_the_single_run_and_sort_in_shard_order()
    {
        int n = 12;
        for (int k = 1; k <= n; k++)
        {
            var task = ClusterSweep.Task(ClusterSweep.Environment("kubernetes", k, n), [.. Sweep, "--format", "csv", "--shard", "auto", "--shards", $"{n}", "-o", Path.Combine(_dir, "part-{K}-of-{N}.csv")]);
            Assert.True(task.Exit == 0, task.Err);
            Assert.Equal("", task.Out);
        }
        var files = Directory.GetFiles(_dir).Order(StringComparer.Ordinal).ToList();   // what `cat part-*` sees
        Assert.Equal(Enumerable.Range(1, n).Select(k => Path.Combine(_dir, $"part-{k:00}-of-12.csv")), files);
        Assert.Equal(ClusterSweep.Single([.. Sweep, "--format", "csv"]).Out, ClusterSweep.Merge(files.Select(File.ReadAllText), csv: true));
    }

    [Fact]
    public void A_rerun_reproduces_its_part_byte_for_byte_and_leaves_no_temporary_file()
    {
        string path = Path.Combine(_dir, "part.jsonl");
        Assert.Equal(0, ClusterSweep.Single([.. Sweep, "--shard", "2/3", "-o", path]).Exit);
        var first = File.ReadAllBytes(path);
        Assert.Equal(0, ClusterSweep.Single([.. Sweep, "--shard", "2/3", "-o", path, "--threads", "1"]).Exit);
        Assert.Equal(first, File.ReadAllBytes(path));
        Assert.Equal([path], Directory.GetFiles(_dir));
    }

    [Fact]
    public void Skip_existing_computes_only_the_missing_parts()
    {
        string pattern = Path.Combine(_dir, "part-{K}.jsonl");
        for (int k = 1; k <= 4; k++) Assert.Equal(0, ClusterSweep.Single([.. Sweep, "--shard", $"{k}/4", "-o", pattern]).Exit);
        var whole = string.Concat(Enumerable.Range(1, 4).Select(k => File.ReadAllText(Path.Combine(_dir, $"part-{k}.jsonl"))));
        File.Delete(Path.Combine(_dir, "part-3.jsonl"));
        File.WriteAllText(Path.Combine(_dir, "part-1.jsonl"), "kept\n");   // stands for a complete part: it must not be recomputed
        for (int k = 1; k <= 4; k++) Assert.Equal(0, ClusterSweep.Single([.. Sweep, "--shard", $"{k}/4", "-o", pattern, "--skip-existing"]).Exit);
        Assert.Equal("kept\n", File.ReadAllText(Path.Combine(_dir, "part-1.jsonl")));
        File.Delete(Path.Combine(_dir, "part-1.jsonl"));
        for (int k = 1; k <= 4; k++) Assert.Equal(0, ClusterSweep.Single([.. Sweep, "--shard", $"{k}/4", "-o", pattern, "--skip-existing"]).Exit);
        Assert.Equal(whole, string.Concat(Enumerable.Range(1, 4).Select(k => File.ReadAllText(Path.Combine(_dir, $"part-{k}.jsonl")))));
    }

    [Fact]
    public void A_part_abandoned_before_commit_leaves_the_earlier_file_untouched_and_no_temporary()
    {
        string path = Path.Combine(_dir, "part.csv");
        File.WriteAllText(path, "earlier\n");
        using (var part = new PartFile(path))
        {
            part.Stream.Write("half a part"u8);
            Assert.Equal("earlier\n", File.ReadAllText(path));   // nothing visible while writing
        }
        Assert.Equal("earlier\n", File.ReadAllText(path));
        Assert.Equal([path], Directory.GetFiles(_dir));
    }

    [Fact]
    public void An_output_in_a_missing_folder_is_a_usage_error()
    {
        var task = ClusterSweep.Single([.. Sweep, "-o", Path.Combine(_dir, "no", "such", "part.jsonl")]);
        Assert.Equal(2, task.Exit);
        Assert.StartsWith("windscript sweep --output: cannot write", task.Err);
        Assert.Contains("no such directory", task.Err);
    }

    [Theory]
    [InlineData("part-{K}.csv", 3, 8, "part-3.csv")]
    [InlineData("part-{K}-of-{N}.csv", 3, 12, "part-03-of-12.csv")]
    [InlineData("out/{K}/{K}.parquet", 7, 100, "out/007/007.parquet")]
    [InlineData("all.jsonl", 1, 1, "all.jsonl")]
    public void Placeholders_stand_for_the_shard(string pattern, int k, int n, string expected) =>
        Assert.Equal(expected, PartFile.Expand(pattern, k, n));
}
