using BenchmarkDotNet.Attributes;

namespace WindScript.Benchmarks.LanguageServer;

/// <summary>
/// Keystroke-to-diagnostics latency of the language server (didChange → publishDiagnostics) on a
/// 2,000-line winding file: the figure an editor user feels while typing. Goal: under 10 ms median.
/// </summary>
[MemoryDiagnoser]
public class KeystrokeBenchmarks
{
    private LspSession _session = null!;

    [GlobalSetup]
    public void Setup()
    {
        _session = new LspSession(LargeWinding.Generate(2000));
        for (int i = 0; i < 50; i++) _session.Keystroke();
    }

    [Benchmark]
    public double Keystroke() => _session.Keystroke();

    [GlobalCleanup]
    public void Cleanup()
    {
        _session.Shutdown();
        _session.Dispose();
    }
}
