namespace WindScript.Analysis;

/// <summary>
/// Carter's coefficient k_C ≥ 1: how much the slot openings lengthen the air gap
/// (F. W. Carter 1901, as given in Pyrhonen et al., Design of Rotating Electrical Machines, ch. 3):
/// k_C = τ_s / (τ_s − κ·b), κ = (2/π)·[atan(b/2δ) − (2δ/b)·ln √(1 + (b/2δ)²)],
/// with τ_s the slot pitch at the bore, b the slot opening and δ the gap. The effective gap is k_C·δ.
/// </summary>
internal static class CarterCoefficient
{
    public static double Compute(double slotPitch, double slotOpening, double gap)
    {
        if (!(gap > 0)) throw new ArgumentOutOfRangeException(nameof(gap), gap, "The air gap must be positive.");
        if (!(slotOpening >= 0 && slotOpening < slotPitch))
            throw new ArgumentOutOfRangeException(nameof(slotOpening), slotOpening, "The slot opening must be at least 0 and narrower than the slot pitch.");
        if (slotOpening == 0) return 1;
        return slotPitch / (slotPitch - Kappa(slotOpening, gap) * slotOpening);
    }

    /// <summary>κ(b/δ) ∈ (0, 1): the fraction of the slot opening that is lost to the flux.</summary>
    public static double Kappa(double slotOpening, double gap)
    {
        double x = slotOpening / (2 * gap);
        return 2 / Math.PI * (Math.Atan(x) - Math.Log(1 + x * x) / (2 * x));
    }
}
