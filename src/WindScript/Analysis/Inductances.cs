using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// Air-gap self and mutual inductances by the winding-function method (Schmitz &amp; Novotny 1965;
/// Lipo, Analysis of Synchronous Machines): L_kl = μ0·r·l/g_e · ∫₀^2π N_k(θ) N_l(θ) dθ, with the
/// zero-mean turns functions N (series turns: conductors divided by parallel paths), the mean
/// gap radius r, the stack length l and the effective gap g_e = k_C·δ. The integral of two
/// staircases is an exact finite sum over the slot intervals, so every harmonic is included.
/// </summary>
internal static class Inductances
{
    /// <summary>∫ N_k N_l dθ for every pair (H·m/μ0 units: turns²·rad), exact.</summary>
    public static double[,] TurnsProducts(WindingSpectrum winding)
    {
        int m = winding.Phases, q = winding.Slots;
        var levels = new double[m][];
        for (int k = 0; k < m; k++)
        {
            levels[k] = new double[q];
            TurnsFunction.Levels(winding.SlotConductors[k], 1 / winding.Paths, levels[k]);
        }
        var products = new double[m, m];
        double width = 2 * Math.PI / q;
        for (int k = 0; k < m; k++)
            for (int l = 0; l <= k; l++)
            {
                double sum = 0;
                for (int i = 0; i < q; i++) sum += levels[k][i] * levels[l][i];
                products[k, l] = products[l, k] = sum * width;
            }
        return products;
    }

    /// <summary>
    /// The inductance matrix (H) for the thin gap with Carter's coefficient; null when bore,
    /// stack or gap is missing. Also returns the positive-sequence (synchronous) air-gap inductance
    /// for balanced currents at the design's phase shift: L_s = (1/m)·Σ_kl L_kl cos((k − l)φ).
    /// </summary>
    public static InductanceMatrix? Of(WindingDesign design, WindingSpectrum winding, double carter)
    {
        var g = design.Geometry;
        if (g.BoreRadius is not { } bore || g.StackLength is not { } length || g.EffectiveMechanicalGap is not { } gap || !(gap > 0) || !(bore > gap))
            return null;
        double meanRadius = bore - gap / 2;
        double factor = AirGapField.Mu0 * meanRadius * length / (carter * gap);
        var products = TurnsProducts(winding);
        int m = winding.Phases;
        var matrix = new double[m][];
        double shift = design.PhaseShiftDegrees * Math.PI / 180, synchronous = 0;
        for (int k = 0; k < m; k++)
        {
            matrix[k] = new double[m];
            for (int l = 0; l < m; l++)
            {
                matrix[k][l] = factor * products[k, l];
                synchronous += matrix[k][l] * Math.Cos((k - l) * shift);
            }
        }
        return new InductanceMatrix(matrix, m == 0 ? 0 : synchronous / m, meanRadius, carter * gap);
    }
}

/// <summary>
/// Air-gap inductances (H): Matrix[k][l] (self on the diagonal), the positive-sequence air-gap
/// inductance for balanced currents, and the mean radius and effective gap (m) used.
/// </summary>
public sealed record InductanceMatrix(double[][] Matrix, double Synchronous, double MeanRadius, double EffectiveGap);
