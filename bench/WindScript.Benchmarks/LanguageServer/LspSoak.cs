using System.Diagnostics;

namespace WindScript.Benchmarks.LanguageServer;

/// <summary>
/// The long run BenchmarkDotNet is not made for: latency percentiles over many keystrokes, and
/// memory over 10,000 successive edits (managed heap after a full collection, and working set),
/// which must stay flat. Usage: <c>lsp-soak [lines=2000] [keystrokes=500] [edits=10000]</c>.
/// </summary>
public static class LspSoak
{
    private const int WarmUp = 200;

    public static int Run(string[] args)
    {
        int lines = args.Length > 0 ? int.Parse(args[0]) : 2000;
        int measured = args.Length > 1 ? int.Parse(args[1]) : 500;
        int edits = args.Length > 2 ? int.Parse(args[2]) : 10_000;

        var text = LargeWinding.Generate(lines);
        using var session = new LspSession(text);
        Console.WriteLine($"document: {text.Count(c => c == '\n')} lines, {text.Length / 1024} KiB, {session.OpenDiagnostics} diagnostics on open");

        for (int i = 0; i < WarmUp; i++) session.Keystroke();
        var times = new double[measured];
        for (int i = 0; i < measured; i++) times[i] = session.Keystroke();
        Array.Sort(times);
        double P(double q) => times[Math.Min(times.Length - 1, (int)(q * times.Length))];
        Console.WriteLine($"didChange -> publishDiagnostics, {measured} keystrokes after {WarmUp} warm-up: " +
                          $"median {P(0.5):0.00} ms, p90 {P(0.9):0.00} ms, p99 {P(0.99):0.00} ms, max {times[^1]:0.00} ms");

        Console.WriteLine($"memory over {edits:N0} further edits (managed heap after full GC / working set):");
        var heaps = new List<long>();
        int step = Math.Max(1, edits / 10);
        for (int i = 0; i <= edits; i++)
        {
            if (i % step == 0)
            {
                GC.Collect();
                GC.WaitForPendingFinalizers();
                long heap = GC.GetTotalMemory(forceFullCollection: true);
                heaps.Add(heap);
                Console.WriteLine($"  after {i,6:N0} edits: heap {heap / 1024.0 / 1024.0,6:0.0} MiB, working set {Process.GetCurrentProcess().WorkingSet64 / 1024 / 1024,4} MiB");
            }
            if (i < edits) session.Keystroke();
        }
        Console.WriteLine($"heap change after the first {step:N0} edits: {(heaps[^1] - heaps[1]) / 1024.0 / 1024.0:+0.0;-0.0;0.0} MiB");
        int exit = session.Shutdown();
        Console.WriteLine($"server exit code: {exit}");
        return exit;
    }
}
