using System.CommandLine;
using System.Globalization;
using WindScript.Cli.Output;
using WindScript.Sweep;
using WindScript.Synthesis;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript sweep --slots A..B --poles C..D ...</c>: synthesise every feasible combination in
/// the ranges and stream one record per layout (JSON Lines or CSV) in a fixed order, on every
/// core, with bounded memory; <c>--shard K/N</c> writes the K-th of N contiguous parts.
/// </summary>
public static class SweepCommand
{
    /// <summary>More workers than this only costs memory and start-up on any machine we know.</summary>
    public const int MaxThreads = 256;

    public static Command Create(CliIO io)
    {
        var slots = new Option<string>("--slots", "-Q") { Description = "Slot counts: A..B or one number", Required = true };
        var poles = new Option<string>("--poles", "-P") { Description = "Pole counts: C..D or one number (even counts only)", Required = true };
        var phases = new Option<int>("--phases", "-m") { Description = "Number of phases", DefaultValueFactory = _ => 3 };
        var layers = new Option<int>("--layers", "-l") { Description = "1 (single layer) or 2 (double layer)", DefaultValueFactory = _ => 2 };
        var pitch = new Option<string>("--pitch", "-y")
        {
            Description = "Pitch rule: pole (longest not exceeding the pole pitch), pole-K (shortened by K), all (1 to the pole pitch), or N slots",
            DefaultValueFactory = _ => "pole",
        };
        var orders = new Option<int>("--orders", "-N") { Description = "Winding factors at electrical orders 1..N", DefaultValueFactory = _ => 49 };
        var format = CommonOptions.Format("jsonl", "jsonl", "csv");
        var shard = new Option<string?>("--shard") { Description = "Write only part K of N (K/N); the parts concatenated in order are the whole output" };
        var threads = new Option<int>("--threads") { Description = "Worker threads (default: one per core)", DefaultValueFactory = _ => Environment.ProcessorCount };
        UsageMessages.InRange(phases, 2, InputLimits.MaxPhases);
        UsageMessages.InRange(layers, 1, 2);
        UsageMessages.InRange(orders, 1, InputLimits.MaxOrders);
        UsageMessages.InRange(threads, 1, MaxThreads);
        var command = new Command("sweep", "Synthesise and evaluate every feasible slot/pole combination in the ranges, one record per layout")
        {
            slots, poles, phases, layers, pitch, orders, format, shard, threads,
        };
        command.SetAction(parse => Run(io, parse.GetValue(slots)!, parse.GetValue(poles)!, parse.GetValue(phases), parse.GetValue(layers),
            parse.GetValue(pitch)!, parse.GetValue(orders), parse.GetValue(format)!, parse.GetValue(shard), parse.GetValue(threads)));
        return command;
    }

    public static int Run(CliIO io, string slots, string poles, int phases, int layers, string pitch, int orders, string format, string? shardText, int threads)
    {
        string? error = null;
        var slotRange = ParseRange(slots, "--slots", 2, InputLimits.MaxSlots, ref error);
        var poleRange = ParseRange(poles, "--poles", 2, InputLimits.MaxPoles, ref error);
        if (error is null && poleRange.From == poleRange.To && poleRange.From % 2 != 0) error = $"--poles: the pole count must be even, not {poleRange.From}";
        var rule = error is null ? PitchRule.Parse(pitch, out error) : null;
        if (error is not null && rule is null && !error.StartsWith("--", StringComparison.Ordinal)) error = "--pitch: " + error;
        var shard = SweepShard.Whole;
        if (error is null && shardText is not null)
        {
            shard = SweepShard.Parse(shardText, out error) ?? shard;
            if (error is not null) error = "--shard: " + error;
        }
        if (error is null && threads is < 1 or > MaxThreads) error = $"--threads must be from 1 to {MaxThreads}, not {threads}";
        SweepSpec? spec = null;
        if (error is null)
        {
            spec = new SweepSpec
            {
                SlotsFrom = slotRange.From, SlotsTo = slotRange.To, PolesFrom = poleRange.From, PolesTo = poleRange.To,
                Phases = phases, Layers = layers, Pitch = rule!, Orders = orders,
            };
            error = spec.Problem();
        }
        if (error is not null || spec is null)
        {
            io.Err.WriteLine($"windscript sweep: {error}");
            return ExitCodes.Usage;
        }

        var progress = io.ErrIsTerminal ? new ProgressBar(io.Err, SweepPlan.Count(spec, shard), "sweep") : null;
        var output = new RecordOutput(io);
        output.Write(SweepFormat.Create(format, orders).Header);
        long done = 0;
        OrderedBatches.Run(
            SweepPlan.Shard(spec, shard), threads, batchSize: 16, window: 8 * threads,
            () => (Evaluator: new SweepEvaluator(spec), Record: new SweepRecord(), Format: SweepFormat.Create(format, orders)),
            (state, candidate, buffer) =>
            {
                if (state.Evaluator.TryEvaluate(candidate, state.Record)) state.Format.Write(state.Record, buffer);
            },
            (bytes, count) =>
            {
                output.Write(bytes.Span);
                done += count;
                progress?.Report(done);
            });
        output.Flush();
        progress?.Finish();
        return ExitCodes.Ok;
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
