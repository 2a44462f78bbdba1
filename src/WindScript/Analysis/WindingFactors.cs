using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// Winding factors computed from the coil sides themselves, for any winding:
/// k(ν) = |Σ_sides n_side·e^(−jνθ_side)| / Σ_sides |n_side| × k_skew(ν), where n_side are the
/// signed conductors of the phase in each slot and layer and ν is the mechanical order.
/// For a regular winding this equals k_d·k_p·k_sk (see <see cref="ClosedFormFactors"/>).
/// </summary>
/// <remarks>
/// Sides in the same slot sit at the same angle, so the numerator needs only the layer-summed
/// conductors; the denominator counts every side, so a slot whose layers cancel lowers the factor.
/// The spectrum repeats with period Q in the order, so orders beyond ⌊Q/2⌋ are look-ups.
/// </remarks>
public static class WindingFactors
{
    /// <summary>
    /// Fills <paramref name="factors"/>[ν − 1] with the winding factor at mechanical order ν = 1..factors.Length.
    /// No allocation. <paramref name="sideTurns"/> = Σ |conductors| over all sides (slots and layers) of the phase.
    /// </summary>
    public static void Compute(ReadOnlySpan<int> slotConductors, int sideTurns, double skewSlots, Span<double> factors)
    {
        int q = slotConductors.Length;
        if (sideTurns <= 0 || q == 0) { factors.Clear(); return; }
        double inverse = 1.0 / sideTurns;
        int half = q / 2;
        int direct = Math.Min(factors.Length, half);
        for (int order = 1; order <= direct; order++)
            factors[order - 1] = SlotFourier.Direct(slotConductors, order).Magnitude * inverse;
        if (factors.Length > half)
        {
            int net = 0;
            foreach (int c in slotConductors) net += c;
            double atMultiplesOfQ = Math.Abs(net) * inverse;
            int r = half;                                 // order mod Q, kept without dividing
            for (int order = half + 1; order <= factors.Length; order++)
            {
                if (++r == q) r = 0;
                factors[order - 1] = r == 0 ? atMultiplesOfQ : r <= half ? factors[r - 1] : factors[q - r - 1];
            }
        }
        ApplySkew(factors, q, skewSlots);
    }

    /// <summary>Winding factors of one phase of a conductor matrix, orders 1..factors.Length (allocation-free for Q ≤ 1024).</summary>
    public static void Compute(ConductorMatrix conductors, int phase, double skewSlots, Span<double> factors)
    {
        int q = conductors.Slots;
        Span<int> summed = q <= 1024 ? stackalloc int[q] : new int[q];
        int sideTurns = SumLayers(conductors, phase, summed);
        Compute(summed, sideTurns, skewSlots, factors);
    }

    /// <summary>Multiplies factors[ν − 1] by the skew factor of order ν (the one formula, <see cref="ClosedFormFactors.Skew"/>).</summary>
    public static void ApplySkew(Span<double> factors, int slots, double skewSlots)
    {
        if (skewSlots == 0) return;
        for (int order = 1; order <= factors.Length; order++)
            factors[order - 1] *= ClosedFormFactors.Skew(order, skewSlots, slots);
    }

    /// <summary>
    /// The complex factor S(ν)/Σ|n| of a phase (without skew). Its magnitude is the winding factor;
    /// its angle places the phase axis (see <see cref="AxisElectricalDegrees"/>).
    /// </summary>
    public static Complex Phasor(ReadOnlySpan<int> slotConductors, int sideTurns, int order) =>
        sideTurns <= 0 ? Complex.Zero : SlotFourier.Direct(slotConductors, order) / sideTurns;

    /// <summary>
    /// Electrical angle (degrees, −180..180] of the axis of a phase: where its turns function
    /// has the positive crest of the p-pole-pair fundamental, measured from θ = 0 in the slot
    /// numbering direction. From N ∝ Re(S/(j) e^(jpθ)): axis angle pθ = π/2 − arg S(p).
    /// </summary>
    public static double AxisElectricalDegrees(ReadOnlySpan<int> slotConductors, int polePairs)
    {
        var s = SlotFourier.Direct(slotConductors, polePairs);
        double degrees = (90 - s.Phase * 180 / Math.PI) % 360;
        if (degrees <= -180) degrees += 360;
        if (degrees > 180) degrees -= 360;
        return degrees;
    }

    /// <summary>Layer-summed conductors of a phase into <paramref name="summed"/>; returns Σ|n| over every side.</summary>
    public static int SumLayers(ConductorMatrix conductors, int phase, Span<int> summed)
    {
        int sideTurns = 0;
        for (int s = 0; s < conductors.Slots; s++)
        {
            int total = 0;
            for (int l = 0; l < conductors.Layers; l++)
            {
                int n = conductors[phase, s, l];
                total += n;
                sideTurns += Math.Abs(n);
            }
            summed[s] = total;
        }
        return sideTurns;
    }
}
