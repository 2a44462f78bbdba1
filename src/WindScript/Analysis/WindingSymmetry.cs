using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// Symmetries that decide which MMF orders can exist: the machine periodicity t = gcd(Q, p),
/// the winding's own periodicity t_w (the largest number of identical repeats of the conductor
/// pattern around the bore: only mechanical orders that are multiples of t_w exist), whether the
/// pattern also reverses over half its period (then only odd multiples exist, so no even
/// electrical harmonics for an integral-slot winding), and the cogging order lcm(Q, 2p).
/// </summary>
/// <remarks>
/// When t_w = 1 and there is no half-period reversal, MMF orders ν and ν + 1 can coexist; their
/// fields pull the rotor sideways (unbalanced magnetic pull).
/// </remarks>
internal sealed record WindingSymmetry(int MachinePeriodicity, int WindingPeriodicity, bool HalfPeriodReversal, int CoggingOrder)
{
    /// <summary>True when adjacent orders ν, ν + 1 can both appear: a risk of unbalanced magnetic pull.</summary>
    public bool AdjacentOrders => WindingPeriodicity == 1 && !HalfPeriodReversal;

    public static WindingSymmetry Of(WindingDesign design)
    {
        int q = design.Slots, m = design.Phases.Length;
        var phases = new int[m][];
        for (int k = 0; k < m; k++)
        {
            phases[k] = new int[q];
            WindingFactors.SumLayers(design.Conductors, k, phases[k]);
        }
        int periodicity = 1;
        for (int t = q; t > 1; t--)
            if (q % t == 0 && phases.All(c => ShiftEquals(c, q / t, 1))) { periodicity = t; break; }
        int period = q / periodicity;
        bool reversal = period % 2 == 0 && phases.Any(c => c.Any(x => x != 0)) && phases.All(c => ShiftEquals(c, period / 2, -1));
        return new WindingSymmetry(
            (int)WindScript.Numerics.IntegerMath.Gcd(q, design.PolePairs),
            periodicity,
            reversal,
            (int)WindScript.Numerics.IntegerMath.Lcm(q, design.Poles));
    }

    private static bool ShiftEquals(int[] c, int shift, int sign)
    {
        int q = c.Length;
        for (int s = 0; s < q; s++)
            if (c[(s + shift) % q] != sign * c[s]) return false;
        return true;
    }
}
