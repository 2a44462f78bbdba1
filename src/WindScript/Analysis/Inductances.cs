using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// Air-gap self and mutual inductances by the winding-function method (Schmitz &amp; Novotny 1965;
/// Lipo, Analysis of Synchronous Machines): thin gap L_kl = μ0·r·l/g_e · ∫₀^2π N_k(θ) N_l(θ) dθ, with the
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
    /// The inductance matrix (H); null when bore, stack or gap is missing. Every order of the
    /// staircase counts with the flux-tube permeance μ0·r_m·l/(k_C·δ); for a thick gap
    /// (<see cref="AnnularGapField.IsThick"/>) the orders of the base band
    /// ν ≤ Q/2 (the working wave, sub-harmonics and the low belt harmonics) are corrected to the exact
    /// 2-D permeance of the smooth annulus, μ0·l·ν·coth(νλ)/k_C with λ = |ln(r_s/r_r)|, i.e.
    /// L_kl = μ0·l/k_C·[ (r_m/δ)·∫N_k N_l dθ + π·Σ_(ν≤Q/2) (ν·coth(νλ) − r_m/δ)·Re(C_k(ν)·conj C_l(ν)) ].
    /// The flux is counted where it enters the stator surface, which links the coils. Orders above
    /// Q/2 keep the flux-tube permeance: their 2-D field hugs the slotted surface, where the slot
    /// geometry (not modelled) decides it. In the thin-gap limit ν·coth(νλ) → r_m/δ and the
    /// correction vanishes. Also returns the positive-sequence (synchronous) air-gap inductance for
    /// balanced currents at the design's phase shift: L_s = (1/m)·Σ_kl L_kl cos((k − l)φ).
    /// </summary>
    public static InductanceMatrix? Of(WindingDesign design, WindingSpectrum winding, double carter)
    {
        var g = design.Geometry;
        if (g.BoreRadius is not { } bore || g.StackLength is not { } length || g.EffectiveMechanicalGap is not { } gap
            || g.RotorOuterRadius is not { } rotor || !(gap > 0) || !(rotor > 0) || rotor == bore)
            return null;
        double meanRadius = (bore + rotor) / 2;
        double factor = AirGapField.Mu0 * meanRadius * length / (carter * gap);
        var products = TurnsProducts(winding);
        int m = winding.Phases;
        bool thick = design.PolePairs > 0 && AnnularGapField.IsThick(design.PolePairs, bore, rotor);
        for (int order = 1; thick && order <= winding.Slots / 2; order++)
        {
            double excess = AnnularGapField.PermeanceRatio(order, bore, rotor) - 1;
            for (int k = 0; k < m; k++)
                for (int l = 0; l < m; l++)
                {
                    var ck = winding.TurnsCoefficient(k, order);
                    var cl = winding.TurnsCoefficient(l, order);
                    products[k, l] += excess * Math.PI * (ck * System.Numerics.Complex.Conjugate(cl)).Real;
                }
        }
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
        return new InductanceMatrix(matrix, m == 0 ? 0 : synchronous / m, meanRadius, carter * gap, thick);
    }
}

/// <summary>
/// Air-gap inductances (H): Matrix[k][l] (self on the diagonal), the positive-sequence air-gap
/// inductance for balanced currents (it includes the differential leakage), the mean radius and
/// effective gap (m) used, and whether the gap counted as thick (2-D permeance for ν ≤ Q/2).
/// </summary>
public sealed record InductanceMatrix(double[][] Matrix, double Synchronous, double MeanRadius, double EffectiveGap, bool ThickGap);
