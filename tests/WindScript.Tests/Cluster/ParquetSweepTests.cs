using System.Globalization;
using System.Text.Json;
using ParquetSharp;
using WindScript.Cli.Output;

namespace WindScript.Tests.Cluster;

/// <summary>
/// <c>sweep --format parquet</c> (written with Parquet.Net) read back with an independent reader,
/// ParquetSharp (Apache Arrow's C++ Parquet implementation behind a .NET wrapper), and compared
/// value by value with the JSON Lines output of the same sweep.
/// </summary>
public sealed class ParquetSweepTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-parquet-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static readonly string[] Columns =
        ["slots", "poles", "phases", "layers", "pitch", "q", "periodicity", "coggingOrder", "maxParallelPaths", "differentialLeakage",
         "subharmonics", "lowestOrder", "evenHarmonics", "adjacentOrders", "windingFactors"];

    /// <summary>Every row of a Parquet file as the JSON text the JSON Lines format gives it (numbers through the same formatter), and the row counts of its row groups.</summary>
    private static (List<string> Rows, List<long> Groups) Read(string path)
    {
        using var file = new ParquetFileReader(path);
        var schema = file.FileMetaData.Schema;
        Assert.Equal(Columns.Length, schema.NumColumns);
        for (int c = 0; c < Columns.Length; c++) Assert.Equal(Columns[c], schema.Column(c).Path.ToDotVector()[0]);
        Assert.Equal(1, schema.Column(14).MaxRepetitionLevel);   // a list column
        var rows = new List<string>();
        var groups = new List<long>();
        for (int g = 0; g < file.FileMetaData.NumRowGroups; g++)
        {
            using var group = file.RowGroup(g);
            int n = checked((int)group.MetaData.NumRows);
            groups.Add(n);
            object[] columns = new object[Columns.Length];
            for (int c = 0; c < Columns.Length; c++)
            {
                using var column = group.Column(c);
                columns[c] = schema.Column(c).PhysicalType switch
                {
                    PhysicalType.Int32 => column.LogicalReader<int>().ReadAll(n),
                    PhysicalType.Boolean => column.LogicalReader<bool>().ReadAll(n),
                    PhysicalType.Double when c == 14 => column.LogicalReader<double[]>().ReadAll(n),
                    PhysicalType.Double => column.LogicalReader<double>().ReadAll(n),
                    var t => throw new InvalidOperationException($"unexpected column type {t}"),
                };
            }
            for (int r = 0; r < n; r++)
            {
                var fields = Columns.Select((name, c) => $"\"{name}\":" + columns[c] switch
                {
                    int[] ints => ints[r].ToString(CultureInfo.InvariantCulture),
                    bool[] flags => flags[r] ? "true" : "false",
                    double[][] lists => "[" + string.Join(",", lists[r].Select(v => Number(v))) + "]",
                    double[] values => Number(values[r], significant: name == "differentialLeakage"),
                    _ => throw new InvalidOperationException(),
                });
                rows.Add("{" + string.Join(",", fields) + "}");
            }
        }
        return (rows, groups);
    }

    private static string Number(double value, bool significant = false)
    {
        Span<byte> buffer = stackalloc byte[64];
        return System.Text.Encoding.ASCII.GetString(buffer[..SweepFormat.Number(value, buffer, significant)]);
    }

    private static List<string> JsonLines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries).ToList();

    [Fact]
    public void Every_value_read_back_by_an_independent_reader_equals_the_json_lines_output()
    {
        string[] sweep = ["--slots", "6..72", "--poles", "2..36", "--pitch", "all", "--orders", "13"];
        string path = Path.Combine(_dir, "all.parquet");
        var written = ClusterSweep.Single([.. sweep, "--format", "parquet", "-o", path]);
        Assert.True(written.Exit == 0, written.Err);
        Assert.Equal("", written.Out);
        var json = JsonLines(ClusterSweep.Single(sweep).Out);
        var (rows, _) = Read(path);
        Assert.True(json.Count > 500);
        Assert.Equal(json, rows);
        // The typed columns carry more than the text's six decimals: q is exactly Q/(2p m).
        using var file = new ParquetFileReader(path);
        using var group = file.RowGroup(0);
        int n = (int)group.MetaData.NumRows;
        var slots = group.Column(0).LogicalReader<int>().ReadAll(n);
        var poles = group.Column(1).LogicalReader<int>().ReadAll(n);
        var q = group.Column(5).LogicalReader<double>().ReadAll(n);
        for (int r = 0; r < n; r++) Assert.Equal((double)slots[r] / (poles[r] * 3), q[r]);
    }

    [Fact]
    public void Rows_are_written_in_row_groups_as_the_sweep_streams()
    {
        string path = Path.Combine(_dir, "big.parquet");
        Assert.Equal(0, ClusterSweep.Single("--slots", "6..120", "--poles", "2..60", "--orders", "1000", "-f", "parquet", "-o", path).Exit);
        var (rows, groups) = Read(path);
        Assert.True(groups.Count >= 2, $"{groups.Count} row groups");
        Assert.All(groups, g => Assert.True(g * 1000 <= 1 << 19, $"a row group of {g} rows holds more than half a million factors"));
        Assert.Equal(rows.Count, groups.Sum());
    }

    [Fact]
    public void Shard_files_have_one_schema_and_their_rows_in_order_are_the_single_file_and_reruns_are_identical()
    {
        string[] sweep = ["--slots", "6..60", "--poles", "2..30", "--orders", "9", "-f", "parquet"];
        Assert.Equal(0, ClusterSweep.Single([.. sweep, "-o", Path.Combine(_dir, "all.parquet")]).Exit);
        Directory.CreateDirectory(Path.Combine(_dir, "parts"));
        for (int k = 1; k <= 3; k++)
        {
            var task = ClusterSweep.Task(ClusterSweep.Environment("slurm", k, 3), [.. sweep, "--shard", "auto", "-o", Path.Combine(_dir, "parts", "part-{K}.parquet")]);
            Assert.True(task.Exit == 0, task.Err);
        }
        var parts = Directory.GetFiles(Path.Combine(_dir, "parts")).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(3, parts.Count);
        Assert.Equal(Read(Path.Combine(_dir, "all.parquet")).Rows, parts.SelectMany(p => Read(p).Rows));

        var first = File.ReadAllBytes(parts[1]);
        Assert.Equal(0, ClusterSweep.Single([.. sweep, "--shard", "2/3", "--threads", "1", "-o", parts[1]]).Exit);
        Assert.Equal(first, File.ReadAllBytes(parts[1]));
    }

    [Fact]
    public void Parquet_without_an_output_file_is_a_usage_error()
    {
        var task = ClusterSweep.Single("--slots", "6..30", "--poles", "2..10", "-f", "parquet");
        Assert.Equal(2, task.Exit);
        Assert.Equal("", task.Out);
        Assert.Contains("--output", task.Err);
    }

    [Fact]
    public void The_json_lines_rows_agree_with_the_record_schema_field_order()
    {
        // The Parquet columns are the JSON Lines fields in the same order (docs/sweep.md documents one list of fields).
        var line = JsonLines(ClusterSweep.Single("--slots", "12", "--poles", "10").Out).Single();
        using var doc = JsonDocument.Parse(line);
        Assert.Equal(Columns, doc.RootElement.EnumerateObject().Select(p => p.Name));
    }
}
