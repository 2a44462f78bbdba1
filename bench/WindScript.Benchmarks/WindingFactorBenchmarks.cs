using BenchmarkDotNet.Attributes;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Benchmarks;

/// <summary>
/// A fictional 48-slot, 4-pole, 3-phase double-layer winding (q = 4, pitch 10/12): winding
/// factors of all phases to electrical order 200 (mechanical 400), exact differential leakage,
/// one sweep step (factors to order 49 + leakage) and the whole facade.
/// </summary>
[MemoryDiagnoser]
public class WindingFactorBenchmarks
{
    private const int Slots = 48, Poles = 4, Phases = 3;
    private WindingDesign _design = null!;
    private int[] _conductors = null!;      // phase-major, layers summed
    private int[] _sideTurns = null!;
    private double[] _factors = null!;
    private double[] _sweepFactors = null!;

    [GlobalSetup]
    public void Setup()
    {
        _design = FortyEightSlotWinding();
        _conductors = new int[Phases * Slots];
        _sideTurns = new int[Phases];
        for (int k = 0; k < Phases; k++)
            _sideTurns[k] = WindingFactors.SumLayers(_design.Conductors, k, _conductors.AsSpan(k * Slots, Slots));
        _factors = new double[200 * Poles / 2];
        _sweepFactors = new double[49 * Poles / 2];
    }

    [Benchmark(Description = "winding factors, 3 phases, electrical order 200 (spans)")]
    public double FactorsToOrder200() => AllPhases(_factors, skewSlots: 0.5);

    [Benchmark(Description = "winding factors, 3 phases, electrical order 200 (from the conductor matrix)")]
    public double FactorsToOrder200FromMatrix()
    {
        double sum = 0;
        for (int k = 0; k < Phases; k++)
        {
            WindingFactors.Compute(_design.Conductors, k, 0.5, _factors);
            sum += _factors[1];
        }
        return sum;
    }

    [Benchmark(Description = "exact differential leakage")]
    public double Leakage() => DifferentialLeakage.Compute(_conductors, Phases, Poles / 2, 2 * Math.PI / 3);

    [Benchmark(Description = "sweep step: factors to order 49 + exact leakage")]
    public double SweepStep() => AllPhases(_sweepFactors, skewSlots: 0) + Leakage();

    [Benchmark(Description = "full analysis facade, orders to 25")]
    public object Facade() => MachineAnalysis.Evaluate(_design);

    // Factors of every phase into one reused buffer; returns the fundamentals' sum so nothing is optimised away.
    private double AllPhases(double[] factors, double skewSlots)
    {
        double sum = 0;
        for (int k = 0; k < Phases; k++)
        {
            WindingFactors.Compute(_conductors.AsSpan(k * Slots, Slots), _sideTurns[k], skewSlots, factors);
            sum += factors[Poles / 2 - 1];
        }
        return sum;
    }

    /// <summary>Belts of four slots in the order A, −C, B, −A, C, −B; top layer go, bottom layer return ten slots on.</summary>
    private static WindingDesign FortyEightSlotWinding()
    {
        (int Phase, int Sign)[] belts = [(0, 1), (2, -1), (1, 1), (0, -1), (2, 1), (1, -1)];
        var coils = Enumerable.Range(0, Slots).Select(s =>
        {
            var (phase, sign) = belts[s / 4 % 6];
            return new Coil { Phase = phase, GoSlot = s + 1, ReturnSlot = (s + 10) % Slots + 1, GoLayer = 0, ReturnLayer = 1, Turns = 8, Polarity = sign };
        });
        return new WindingDesign
        {
            Name = "bench_48s4p",
            Slots = Slots,
            Poles = Poles,
            Phases = [new Phase("U", 0), new Phase("V", 1), new Phase("W", 2)],
            PhaseShiftDegrees = 120,
            Geometry = new Geometry { BoreDiameter = 0.2, StackLength = 0.15, Gap = 0.0007, SlotOpening = 0.003, GapFluxDensity = 0.85 },
            Winding = new Winding { Name = "main", Layers = 2, Coils = [.. coils] },
        };
    }
}
