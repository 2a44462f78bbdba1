namespace WindScript.Analysis.Conductors;

/// <summary>
/// Slot leakage permeance factors (per unit length, divided by μ0) of a slot's layers, from the
/// 1-D slot field of ideal iron (Pyrhonen et al., Design of Rotating Electrical Machines, ch. 4):
/// the field crosses the slot, H(d)·b(d) = Θ(d), the current enclosed below depth d, so the energy
/// gives λ_ab = ∫ F_a(d)·F_b(d)/b(d) dd, F_a the fraction of layer a's current deeper than d. Above
/// the conductors (F = 1) the wedge, taper and tip add h3/b4 + 2·h2/(b4 + b1) + h1/b1 (the book's
/// forms). Layers: 0 = top (towards the gap), 1 = bottom; a single layer fills the region. The
/// current is uniform over the conductor region inside the liner, the separator carries none.
/// </summary>
internal sealed record SlotPermeance(double[,] Layers, double Above, double ToothTip)
{
    private const int Steps = 4000;

    /// <summary>The permeance factors of a drawable section at an effective gap δ_e (tooth tip: Pyrhonen eq. for λ_d).</summary>
    public static SlotPermeance? Of(SlotSection s, double? effectiveGap)
    {
        if (!s.Drawable || s.Opening is not { } b1 || !(b1 > 0)) return null;
        double top = s.ConductorTop, depth = s.Depth!.Value, t = s.Liner;
        double lo = top + t, hi = depth - t; // current-carrying band (depths)
        if (!(hi > lo)) return null;
        int layers = s.Layers;
        // Net width carrying current at each depth, and the split of the two layers at equal area.
        double h = (depth - top) / Steps;
        var net = new double[Steps];
        double total = 0;
        for (int i = 0; i < Steps; i++)
        {
            double d = top + (i + 0.5) * h;
            net[i] = d > lo && d < hi ? Math.Max(0, s.Width(d) - 2 * t) : 0;
            total += net[i] * h;
        }
        if (!(total > 0)) return null;
        // Separator: a band of its thickness at the depth where half the area lies above.
        double half = 0, split = depth;
        for (int i = 0; i < Steps && layers == 2; i++)
        {
            half += net[i] * h;
            if (half >= total / 2) { split = top + (i + 1) * h; break; }
        }
        double sepLo = split - s.Separator / 2, sepHi = split + s.Separator / 2;
        var top0 = new double[Steps];
        var bottom1 = new double[Steps];
        double a0 = 0, a1 = 0;
        for (int i = 0; i < Steps; i++)
        {
            double d = top + (i + 0.5) * h;
            if (layers == 2 && d > sepLo && d < sepHi) continue;
            if (layers == 1 || d <= sepLo) { top0[i] = net[i] * h; a0 += top0[i]; }
            else { bottom1[i] = net[i] * h; a1 += bottom1[i]; }
        }
        // Fractions of each layer's current deeper than d, integrated from the bottom up.
        var lambda = new double[layers, layers];
        double deeper0 = 0, deeper1 = 0;
        for (int i = Steps - 1; i >= 0; i--)
        {
            double d = top + (i + 0.5) * h, b = s.Width(d);
            double f0 = (deeper0 + top0[i] / 2) / a0, f1 = layers == 2 ? (deeper1 + bottom1[i] / 2) / a1 : 0;
            deeper0 += top0[i];
            deeper1 += bottom1[i];
            if (!(b > 0)) continue;
            lambda[0, 0] += f0 * f0 / b * h;
            if (layers == 2)
            {
                lambda[1, 1] += f1 * f1 / b * h;
                lambda[0, 1] += f0 * f1 / b * h;
            }
        }
        if (layers == 2) lambda[1, 0] = lambda[0, 1];
        double b4 = s.TopWidth!.Value;
        double above = s.Wedge / b4 + 2 * s.TipTaper / (b4 + b1) + s.TipHeight / b1;
        double tip = effectiveGap is { } g && g > 0 ? ToothTipFactor(g, b1) : 0;
        return new SlotPermeance(lambda, above, tip);
    }

    /// <summary>Tooth-tip leakage factor λ_d = 5·(δ/b1)/(5 + 4·δ/b1) (Pyrhonen et al., ch. 4).</summary>
    public static double ToothTipFactor(double gap, double opening) => 5 * (gap / opening) / (5 + 4 * gap / opening);

    /// <summary>
    /// Pyrhonen's short-pitch factors for a three-phase double-layer winding of relative pitch W/τp:
    /// k2 = 1 − 3ε/4 (ε = 1 − W/τp, for 2/3 ≤ W/τp ≤ 1), k2 = (1 + 3·W/τp)/4 (1/3 ≤ W/τp ≤ 2/3), k1 = (1 + 3·k2)/4.
    /// </summary>
    public static (double K1, double K2) ShortPitchFactors(double relativePitch)
    {
        double k2 = relativePitch >= 2.0 / 3 ? 1 - 3 * (1 - relativePitch) / 4 : (1 + 3 * relativePitch) / 4;
        return ((1 + 3 * k2) / 4, k2);
    }
}
