using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The slot spectra of every phase of a design, computed once (base band only, see
/// <see cref="SlotSpectrum"/>) and read at any mechanical order. Conductors are divided by
/// the parallel paths, so a phase current times the turns function is the phase's MMF.
/// </summary>
public sealed class WindingSpectrum
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
        _band = SlotSpectrum.BaseBandLength(slots);
        _sideTurns = sideTurns;
        SlotConductors = conductors;
    }

    public int Slots { get; }
    public int Phases { get; }
    public int PolePairs { get; }
    public double Paths { get; }

    /// <summary>Layer-summed signed conductors per phase and slot (not divided by paths).</summary>
    public IReadOnlyList<int[]> SlotConductors { get; }

    public static WindingSpectrum Of(WindingDesign design)
    {
        int q = design.Slots, m = design.Phases.Length;
        double paths = Math.Max(1, design.Winding.Paths);
        int band = SlotSpectrum.BaseBandLength(q);
        var baseBands = new Complex[m * band];
        var sideTurns = new int[m];
        var conductors = new int[m][];
        var scaled = new double[q];
        for (int k = 0; k < m; k++)
        {
            conductors[k] = new int[q];
            sideTurns[k] = WindingFactors.SumLayers(design.Conductors, k, conductors[k]);
            for (int s = 0; s < q; s++) scaled[s] = conductors[k][s] / paths;
            SlotSpectrum.ComputeBaseBand(scaled, baseBands.AsSpan(k * band, band));
        }
        return new WindingSpectrum(q, m, design.PolePairs, paths, baseBands, sideTurns, conductors);
    }

    /// <summary>Σ over every side of the phase of |conductors| (the winding-factor denominator).</summary>
    public int SideTurns(int phase) => _sideTurns[phase];

    /// <summary>S_k(ν) of the phase's conductors per path.</summary>
    public Complex SlotSum(int phase, int order) =>
        SlotSpectrum.FromBaseBand(_baseBands.AsSpan(phase * _band, _band), Slots, order);

    /// <summary>C_k(ν) = S_k(ν)/(jπν): the phase's turns function is Σ_ν Re(C_k(ν) e^(jνθ)).</summary>
    public Complex TurnsCoefficient(int phase, int order) =>
        order == 0 ? Complex.Zero : SlotSum(phase, order) / new Complex(0, Math.PI * order);

    /// <summary>Unskewed winding factor of the phase at mechanical order ν.</summary>
    public double WindingFactor(int phase, int order) =>
        _sideTurns[phase] == 0 ? 0 : SlotSum(phase, order).Magnitude * Paths / _sideTurns[phase];

    /// <summary>Amplitude of the phase's MMF wave of order ν per ampere of phase current (A-turns per A).</summary>
    public double MmfPerAmpere(int phase, int order) => TurnsCoefficient(phase, order).Magnitude;
}
