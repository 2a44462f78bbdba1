using System.Numerics;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Checking;

/// <summary>
/// What phase balance depends on, summed coil by coil: each phase's turns and the phasor of its
/// conductors at the working order, S_k = Σ_coils polarity·turns·(e^(−jpθ_go) − e^(−jpθ_return)).
/// A change to a few coils changes these sums by a few terms, which is what lets the repair
/// search try every single-coil change of a large winding cheaply.
/// </summary>
internal sealed class PhaseTotals
{
    private readonly Complex[] _unit;

    public PhaseTotals(WindingDesign design)
    {
        Phases = design.Phases.Length;
        PhaseShiftDegrees = design.PhaseShiftDegrees;
        _unit = new Complex[design.Slots];
        for (int s = 0; s < design.Slots; s++) _unit[s] = Complex.FromPolarCoordinates(1, -design.PolePairs * SlotFourier.SlotAngle(s, design.Slots));
        Turns = new long[Phases];
        Phasors = new Complex[Phases];
        foreach (var coil in design.Winding.Coils)
        {
            if (coil.Phase < 0 || coil.Phase >= Phases) continue;
            Turns[coil.Phase] += coil.Turns;
            Phasors[coil.Phase] += Contribution(coil, coil.Polarity);
        }
    }

    public int Phases { get; }
    public double PhaseShiftDegrees { get; }
    public long[] Turns { get; }
    public Complex[] Phasors { get; }

    /// <summary>The coil's phasor with the given polarity (its geometry and turns as built).</summary>
    public Complex Contribution(Coil coil, int polarity) => Contribution(coil, polarity, coil.Turns);

    public Complex Contribution(Coil coil, int polarity, int turns) =>
        polarity * turns * (_unit[coil.GoSlot - 1] - _unit[coil.ReturnSlot - 1]);
}

/// <summary>The first way in which per-phase totals fail to be balanced, if any.</summary>
internal enum BalanceFault { None, Unwound, UnequalTurns, UnequalFactors, NoFundamental, AxesUneven }

internal static class BalanceRule
{
    public const double FactorTolerance = 1e-6;

    /// <summary>
    /// Balanced means: every phase wound, equal turns, equal fundamental winding factors
    /// |S_k| / (2·turns), and axes spaced by the phase shift in one direction (Pyrhonen et al.,
    /// ch. 2: a symmetric m-phase winding).
    /// </summary>
    public static BalanceFault Judge(ReadOnlySpan<long> turns, ReadOnlySpan<Complex> phasors, double shiftDegrees)
    {
        int m = turns.Length;
        for (int k = 0; k < m; k++) if (turns[k] <= 0) return BalanceFault.Unwound;
        for (int k = 1; k < m; k++) if (turns[k] != turns[0]) return BalanceFault.UnequalTurns;
        double f0 = Factor(turns[0], phasors[0]);
        for (int k = 1; k < m; k++) if (Math.Abs(Factor(turns[k], phasors[k]) - f0) > FactorTolerance) return BalanceFault.UnequalFactors;
        if (f0 < FactorTolerance) return BalanceFault.NoFundamental;
        if (m < 2) return BalanceFault.None;
        Span<double> axes = stackalloc double[m];
        for (int k = 0; k < m; k++) axes[k] = 90 - phasors[k].Phase * 180 / Math.PI;
        return PhaseBalanceChecks.WindingDirection(axes, shiftDegrees) is null ? BalanceFault.AxesUneven : BalanceFault.None;
    }

    public static double Factor(long turns, Complex phasor) => turns <= 0 ? 0 : phasor.Magnitude / (2.0 * turns);
}
