using BenchmarkDotNet.Attributes;
using WindScript.Emit;
using WindScript.Sweep;
using WindScript.Synthesis;

namespace WindScript.Benchmarks;

/// <summary>
/// Synthesis and sweep in process: every feasible 3-phase double-layer layout with 6..120 slots
/// and 2..60 poles laid out and evaluated on one thread (winding factors to electrical order 49,
/// exact leakage, order flags), one synthesis of a 120-slot winding and its canonical text.
/// The whole-process figure (start-up and output included, both cores) is bench/sweep/run.sh.
/// </summary>
[MemoryDiagnoser]
public class SweepBenchmarks
{
    private static readonly SweepSpec Spec = new() { SlotsFrom = 6, SlotsTo = 120, PolesFrom = 2, PolesTo = 60 };
    private SweepCandidate[] _candidates = null!;
    private SweepEvaluator _evaluator = null!;
    private readonly SweepRecord _record = new();
    private readonly SynthesisRequest _request = new() { Slots = 120, Poles = 58 };

    [GlobalSetup]
    public void Setup()
    {
        _candidates = SweepPlan.All(Spec).ToArray();
        _evaluator = new SweepEvaluator(Spec);
    }

    [Benchmark(Description = "sweep 6..120 slots x 2..60 poles, one thread (880 layouts)")]
    public double WholeSweep()
    {
        double sum = 0;
        foreach (var c in _candidates)
            if (_evaluator.TryEvaluate(c, _record)) sum += _record.FundamentalWindingFactor;
        return sum;
    }

    [Benchmark(Description = "enumerate the sweep plan")]
    public int Plan() => SweepPlan.All(Spec).Count();

    [Benchmark(Description = "synthesise 120 slots / 58 poles and write canonical text")]
    public int SynthesiseAndEmit() => WindEmitter.Emit(WindingSynthesizer.Synthesize(_request).Design!).Length;
}
