using System.Numerics;
using System.Runtime.CompilerServices;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The slot spectra of every phase of a design (base band only, see <see cref="SlotFourier"/>),
/// read at any mechanical order. Computed once per design instance and shared by the checker,
/// the analysis, the plots and the report: <see cref="Of"/> remembers it beside the design
/// without making the design mutable. Conductors are divided by the parallel paths, so a phase
/// current times the turns function is the phase's MMF.
/// </summary>
internal sealed class WindingSpectrum
{
    private readonly Complex[] _baseBands;   // phase-major, BaseBandLength(Q) per phase
    private readonly int _band;
    private readonly int[] _sideTurns;

    private WindingSpectrum(int slots, int phases, int polePairs, double paths, Complex[] baseBands, int[] sideTurns, int[][] conductors)
    {
        Slots = slots;
        Phases = phases;
        PolePairs = polePairs;
        Paths = paths;
        _baseBands = baseBands;
        _band = SlotFourier.BaseBandLength(slots);
        _sideTurns = sideTurns;
        SlotConductors = conductors;
    }

    public int Slots { get; }
    public int Phases { get; }
    public int PolePairs { get; }
    public double Paths { get; }

    /// <summary>Layer-summed signed conductors per phase and slot (not divided by paths).</summary>
    public IReadOnlyList<int[]> SlotConductors { get; }

    // Keyed by the design instance: a `with` copy is another design and gets its own spectrum.
    private static readonly ConditionalWeakTable<WindingDesign, WindingSpectrum> Computed = new();

    /// <summary>Spectra computed on this thread (a counting hook for tests: one per design).</summary>
    [ThreadStatic] internal static int ComputationsOnThisThread;

    /// <summary>The spectrum of a design, computed on first use and then shared.</summary>
    public static WindingSpectrum Of(WindingDesign design) => Computed.GetValue(design, Compute);

    private static WindingSpectrum Compute(WindingDesign design)
    {
        ComputationsOnThisThread++;
        int q = design.Slots, m = design.Phases.Length;
        double paths = Math.Max(1, design.Winding.Paths);
        int band = SlotFourier.BaseBandLength(q);
        var baseBands = new Complex[m * band];
        var sideTurns = new int[m];
        var conductors = new int[m][];
        var scaled = new double[m][];
        for (int k = 0; k < m; k++)
        {
            conductors[k] = new int[q];
            sideTurns[k] = WindingFactors.SumLayers(design.Conductors, k, conductors[k]);
            scaled[k] = new double[q];
            for (int s = 0; s < q; s++) scaled[k][s] = conductors[k][s] / paths;
        }
        // Phases in pairs: one transform serves two real distributions.
        for (int k = 0; k + 1 < m; k += 2)
            SlotFourier.ComputeBaseBands(scaled[k], scaled[k + 1], baseBands.AsSpan(k * band, band), baseBands.AsSpan((k + 1) * band, band));
        if (m % 2 == 1) SlotFourier.ComputeBaseBand(scaled[m - 1], baseBands.AsSpan((m - 1) * band, band));
        return new WindingSpectrum(q, m, design.PolePairs, paths, baseBands, sideTurns, conductors);
    }

    /// <summary>Σ over every side of the phase of |conductors| (the winding-factor denominator).</summary>
    public int SideTurns(int phase) => _sideTurns[phase];

    /// <summary>S_k(ν) of the phase's conductors per path.</summary>
    public Complex SlotSum(int phase, int order) =>
        SlotFourier.FromBaseBand(_baseBands.AsSpan(phase * _band, _band), Slots, order);

    /// <summary>C_k(ν) = S_k(ν)/(jπν): the phase's turns function is Σ_ν Re(C_k(ν) e^(jνθ)).</summary>
    public Complex TurnsCoefficient(int phase, int order) =>
        order == 0 ? Complex.Zero : SlotSum(phase, order) / new Complex(0, Math.PI * order);

    /// <summary>
    /// Series turns of the phase from its conductors: Σ|n| over every side / 2 (each turn has a go
    /// and a return side) / parallel paths. The same conductor model gives the winding factors.
    /// </summary>
    public double SeriesTurns(int phase) => _sideTurns[phase] / 2.0 / Paths;

    /// <summary>Unskewed winding factor of the phase at mechanical order ν.</summary>
    public double WindingFactor(int phase, int order) =>
        _sideTurns[phase] == 0 ? 0 : SlotSum(phase, order).Magnitude * Paths / _sideTurns[phase];

    /// <summary>Amplitude of the phase's MMF wave of order ν per ampere of phase current (A-turns per A).</summary>
    public double MmfPerAmpere(int phase, int order) => TurnsCoefficient(phase, order).Magnitude;
}
