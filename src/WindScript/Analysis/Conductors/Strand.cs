using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// One strand's cross-section (m, m²): round wire π·d²/4 bare and π·d_o²/4 over the enamel; strip
/// w·h − (4 − π)·r² bare (rounded corners) and (w + 2t)·(h + 2t) insulated (the rectangle it takes
/// in the slot). The narrowest insulated dimension is what must pass the slot opening.
/// </summary>
internal sealed record Strand(bool IsStrip, double BareArea, double InsulatedArea, double NarrowestWidth, double OverallWidth, double OverallHeight)
{
    /// <summary>True when only the overall diameter was given and the bare diameter is taken as overall/1.06.</summary>
    public bool BareEstimated { get; init; }

    /// <summary>Densest packing of equal strands: π/(2√3) for circles (hexagonal, geometry), 1 for rectangles.</summary>
    public double PackingLimit => IsStrip ? 1.0 : HexagonalPacking;

    /// <summary>π/(2√3) ≈ 0.9069: the densest packing of equal circles in the plane (Lagrange; Thue).</summary>
    public static readonly double HexagonalPacking = Math.PI / (2 * Math.Sqrt(3));

    /// <summary>Default net fill limit (common practice): 0.75 random-wound round wire, 0.9 formed strip.</summary>
    public double DefaultFillLimit => IsStrip ? 0.9 : 0.75;

    /// <summary>The strand of a conductor block, or null when its description is incomplete (reported by the binder).</summary>
    public static Strand? Of(ConductorSpec c)
    {
        if (c.IsStrip)
        {
            if (c.StripWidth is not { } w || c.StripHeight is not { } h) return null;
            double r = Math.Min(c.CornerRadius, Math.Min(w, h) / 2), t = c.Insulation;
            return new Strand(true, w * h - (4 - Math.PI) * r * r, (w + 2 * t) * (h + 2 * t), Math.Min(w, h) + 2 * t, w + 2 * t, h + 2 * t);
        }
        double? overall = c.OverallDiameter ?? (c.BareDiameter is { } b && c.Grade is { } g ? EnamelledWire.OverallDiameter(b, g) : null);
        double? bare = c.BareDiameter ?? (overall is { } o0 ? o0 / 1.06 : null); // overall only: a typical grade-2 build (common practice) for the copper
        if (overall is not { } o || bare is not { } d) return null;
        return new Strand(false, Math.PI * d * d / 4, Math.PI * o * o / 4, o, o, o) { BareEstimated = c.BareDiameter is null };
    }
}
