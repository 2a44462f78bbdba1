using System.CommandLine;
using System.Globalization;
using WindScript.Cli.Files;
using WindScript.Cli.Output;
using WindScript.Sweep;
using WindScript.Synthesis;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript sweep --slots A..B --poles C..D ...</c>: synthesise every feasible combination in
/// the ranges and stream one record per layout (JSON Lines or CSV) in a fixed order, on every
/// core, with bounded memory; <c>--shard K/N</c> (or <c>auto</c>, from a batch scheduler's
/// environment) writes the K-th of N contiguous parts, to standard output or atomically to a file.
/// </summary>
public static class SweepCommand
{
    /// <summary>More workers than this only costs memory and start-up on any machine we know.</summary>
    public const int MaxThreads = 256;

    /// <summary>The command line as given, before it is checked.</summary>
    public sealed record Arguments(string Slots, string Poles, string Phases, string Layers, string Pitch, int Orders, OutputFormat Format,
        string? Shard, int? Shards, string? Output, bool SkipExisting, int Threads);

    public static Command Create(CliIO io)
    {
        var slots = new Option<string>("--slots", "-Q") { Description = "Slot counts: A..B or one number", Required = true };
        var poles = new Option<string>("--poles", "-P") { Description = "Pole counts: C..D or one number (even counts only)", Required = true };
        var phases = new Option<string>("--phases", "-m") { Description = "Number of phases, or several: 3,5,6", DefaultValueFactory = _ => "3" };
        var layers = new Option<string>("--layers", "-l") { Description = "1 (single layer), 2 (double layer), or both: 1,2", DefaultValueFactory = _ => "2" };
        var pitch = new Option<string>("--pitch", "-y")
        {
            Description = "Pitch rule: pole (longest not exceeding the pole pitch), pole-K (shortened by K), all (1 to the pole pitch), or N slots",
            DefaultValueFactory = _ => "pole",
        };
        var orders = new Option<int>("--orders") { Description = "Winding factors at electrical orders 1..N (as eval --orders; no short form, so it cannot be mistaken for synth -n, turns)", DefaultValueFactory = _ => 49 };
        var format = CommonOptions.Format(OutputFormat.JsonLines, OutputFormat.JsonLines, OutputFormat.Csv, OutputFormat.Parquet);
        format.Description += " (parquet needs --output)";
        var shard = new Option<string?>("--shard")
        {
            Description = "Write only part K of N (K/N); the parts concatenated in order are the whole output. "
                + "'auto' reads K and N from the batch scheduler: " + SchedulerShard.Variables,
        };
        var shards = new Option<int?>("--shards")
        {
            Description = "N for --shard auto where the scheduler does not give it (Kubernetes: the Job's completions; AWS Batch: the array size; Slurm: the array is numbered 1..N)",
        };
        var output = new Option<string?>("--output", "-o")
        {
            Description = "Write to this file instead of standard output, atomically (temporary file, then rename); {K} and {N} in the name stand for the shard",
        };
        var skipExisting = new Option<bool>("--skip-existing") { Description = "With --output: do nothing if the part's file exists (parts are written whole), so rerunning every task fills in only the missing parts" };
        var threads = new Option<int>("--threads") { Description = "Worker threads (default: one per core)", DefaultValueFactory = _ => Environment.ProcessorCount };
        UsageMessages.InRange(orders, 1, InputLimits.MaxOrders);
        UsageMessages.InRange(threads, 1, MaxThreads);
        UsageMessages.InRange(shards, 1, 1_000_000);
        var command = new Command("sweep", "Synthesise and evaluate every feasible slot/pole combination in the ranges, one record per layout")
        {
            slots, poles, phases, layers, pitch, orders, format, shard, shards, output, skipExisting, threads,
        };
        command.SetAction(parse => Run(io, new Arguments(parse.GetValue(slots)!, parse.GetValue(poles)!, parse.GetValue(phases)!, parse.GetValue(layers)!,
            parse.GetValue(pitch)!, parse.GetValue(orders), OutputFormats.Parse(parse.GetValue(format)!), parse.GetValue(shard), parse.GetValue(shards),
            parse.GetValue(output), parse.GetValue(skipExisting), parse.GetValue(threads))));
        return command;
    }

    public static int Run(CliIO io, Arguments a)
    {
        string? error = null;
        var slotRange = ParseRange(a.Slots, "--slots", 2, InputLimits.MaxSlots, ref error);
        var poleRange = ParseRange(a.Poles, "--poles", 2, InputLimits.MaxPoles, ref error);
        if (error is null && poleRange.From == poleRange.To && poleRange.From % 2 != 0) error = $"--poles: the pole count must be even, not {poleRange.From}";
        var phaseCounts = ParseList(a.Phases, "--phases", 2, InputLimits.MaxPhases, ref error);
        var layerCounts = ParseList(a.Layers, "--layers", 1, 2, ref error);
        var rule = error is null ? PitchRule.Parse(a.Pitch, out error) : null;
        if (error is not null && rule is null && !error.StartsWith("--", StringComparison.Ordinal)) error = "--pitch: " + error;
        var (shard, shardSource) = error is null ? ResolveShard(io, a, ref error) : (SweepShard.Whole, null);
        if (error is not null && !error.StartsWith("--", StringComparison.Ordinal)) error = "--shard: " + error;
        if (error is null && a.Threads is < 1 or > MaxThreads) error = $"--threads must be from 1 to {MaxThreads}, not {a.Threads}";
        if (error is null && a.SkipExisting && a.Output is null) error = "--skip-existing needs --output FILE";
        if (error is null && a.Format == OutputFormat.Parquet && a.Output is null) error = "--format parquet writes a file: add --output FILE (e.g. -o sweep.parquet)";
        SweepSpec? spec = null;
        if (error is null)
        {
            spec = new SweepSpec
            {
                SlotsFrom = slotRange.From, SlotsTo = slotRange.To, PolesFrom = poleRange.From, PolesTo = poleRange.To,
                Phases = phaseCounts[0], Layers = layerCounts[0], PhaseCounts = phaseCounts, LayerCounts = layerCounts, Pitch = rule!, Orders = a.Orders,
            };
            error = spec.Problem();
        }
        if (error is not null || spec is null)
        {
            io.Err.WriteLine($"windscript sweep: {error}");
            return ExitCodes.Usage;
        }

        if (shardSource is not null && io.ErrIsTerminal) io.Err.WriteLine($"windscript sweep: shard {shard} from {shardSource}");
        string? path = a.Output is null ? null : PartFile.Expand(a.Output, shard.Index, shard.Count);
        if (path is not null && a.SkipExisting && File.Exists(path))
        {
            if (io.ErrIsTerminal) io.Err.WriteLine($"windscript sweep: {path} exists; skipped");
            return ExitCodes.Ok;
        }

        PartFile? part;
        try { part = path is null ? null : new PartFile(path); }
        catch (OutputRefusedException e)
        {
            io.Err.WriteLine($"windscript sweep --output: {e.Message}");
            return ExitCodes.Usage;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            io.Err.WriteLine($"windscript sweep: cannot write --output '{path}': {IoFailure.Describe(e)}");
            return ExitCodes.Usage;
        }
        using (part)
        {
            if (a.Format == OutputFormat.Parquet && !part!.Stream.CanSeek)
            {
                io.Err.WriteLine($"windscript sweep --output: '{path}' is a stream, and Parquet needs a file (it writes its footer last)");
                return ExitCodes.Usage;
            }
            if (a.Format == OutputFormat.Parquet) WriteParquet(io, spec, shard, a, part!.Stream);
            else WriteRecords(io, spec, shard, a, part?.Stream);
            part?.Commit();
        }
        return ExitCodes.Ok;
    }

    private static void WriteRecords(CliIO io, SweepSpec spec, SweepShard shard, Arguments a, Stream? file)
    {
        var output = new RecordOutput(io, file);
        output.Write(SweepFormat.Create(a.Format, a.Orders).Header);
        Evaluate(io, spec, shard, a.Threads, () => SweepFormat.Create(a.Format, a.Orders), bytes => output.Write(bytes.Span));
        output.Flush();
    }

    private static void WriteParquet(CliIO io, SweepSpec spec, SweepShard shard, Arguments a, Stream file)
    {
        var parquet = new SweepParquet(file, a.Orders);
        Evaluate(io, spec, shard, a.Threads, () => new SweepParquet.Encoding(), bytes => parquet.Add(bytes.Span));
        parquet.Finish();
    }

    /// <summary>Evaluates the shard on every thread, each record encoded by its thread's format, and hands the batches to <paramref name="write"/> in sweep order.</summary>
    private static void Evaluate(CliIO io, SweepSpec spec, SweepShard shard, int threads, Func<SweepFormat> format, Action<ReadOnlyMemory<byte>> write)
    {
        var progress = io.ErrIsTerminal ? new ProgressBar(io.Err, SweepPlan.Count(spec, shard), "sweep") : null;
        long done = 0;
        OrderedBatches.Run(
            SweepPlan.Shard(spec, shard), threads, batchSize: 16, window: 8 * threads,
            () => (Evaluator: new SweepEvaluator(spec), Record: new SweepRecord(), Format: format()),
            (state, candidate, buffer) =>
            {
                if (state.Evaluator.TryEvaluate(candidate, state.Record)) state.Format.Write(state.Record, buffer);
            },
            (bytes, count) =>
            {
                write(bytes);
                done += count;
                progress?.Report(done);
            });
        progress?.Finish();
    }

    /// <summary>The shard to write and, for <c>--shard auto</c>, the variables it came from.</summary>
    private static (SweepShard, string?) ResolveShard(CliIO io, Arguments a, ref string? error)
    {
        if (a.Shard is null or "")
        {
            if (a.Shards is not null) error = "--shards goes with --shard auto";
            return (SweepShard.Whole, null);
        }
        if (a.Shard == "auto")
        {
            var found = SchedulerShard.Resolve(io.Environment, a.Shards, out error);
            return found is { } f ? (f.Shard, f.Source) : (SweepShard.Whole, null);
        }
        var shard = SweepShard.Parse(a.Shard, out error) ?? SweepShard.Whole;
        if (error is null && a.Shards is { } n && n != shard.Count) error = $"--shard {a.Shard} and --shards {n} disagree";
        return (shard, null);
    }

    /// <summary>"3" or "3,5,6": whole numbers within min..max.</summary>
    private static int[] ParseList(string text, string option, int min, int max, ref string? error)
    {
        if (error is not null) return [0];
        var values = new List<int>();
        foreach (var part in text.Split(','))
        {
            if (!int.TryParse(part.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int value))
            {
                error = $"{option} takes a whole number or a list of them (e.g. 3,5,6), not '{text}'";
                return [0];
            }
            if (value < min || value > max)
            {
                error = $"{option} values must lie within {min}..{max}, not {value}";
                return [0];
            }
            values.Add(value);
        }
        return [.. values.Distinct().Order()];
    }

    private static (int From, int To) ParseRange(string text, string option, int min, int max, ref string? error)
    {
        if (error is not null) return (0, 0);
        var parts = text.Split("..");
        if (parts.Length is 1 or 2
            && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int from)
            && int.TryParse(parts[^1], NumberStyles.None, CultureInfo.InvariantCulture, out int to))
        {
            if (from < min || to > max) error = $"{option} must lie within {min}..{max}, not {text}";
            else if (to < from) error = $"{option}: the range {text} is empty";
            return (from, to);
        }
        error = $"{option} takes a range A..B or one whole number, not '{text}'";
        return (0, 0);
    }
}
