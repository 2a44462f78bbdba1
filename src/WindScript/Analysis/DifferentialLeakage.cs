using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The differential (harmonic) leakage coefficient σ_δ: the sum, over every air-gap MMF wave
/// that balanced m-phase currents produce except the working wave (order p), of the squared
/// ratio of its amplitude to the working wave's (Pyrhonen et al., ch. 4). Computed exactly,
/// over all orders, with no truncation.
/// </summary>
/// <remarks>
/// Parseval in space and time: for balanced unit currents I_k = e^(−jkφ) the waves satisfy
/// Σ_ν (|F⁺_ν|² + |F⁻_ν|²) = Σ_kl M_kl·cos((k − l)φ), M_kl = (1/2π)∫ N_k N_l dθ. The turns
/// functions are staircases, so M_kl is a finite sum over the Q slot intervals, and
/// Σ_kl M_kl cos((k − l)φ) = (1/Q)·Σ_i |Σ_k N_k[i]·e^(jkφ)|² — the mean square of the MMF space
/// vector, which is the radius of gyration of the Görges polygon. Hence
/// σ_δ = (1/Q)·Σ_i |Σ_k N_k[i] e^(jkφ)|² / F_p² − 1, with F_p the working wave.
/// </remarks>
public static class DifferentialLeakage
{
    /// <summary>|Σ S_k(p)| below this fraction of all conductors means the winding has no working wave.</summary>
    public const double NoWorkingWave = 1e-9;

    /// <summary>
    /// σ_δ of a winding given as phase-major layer-summed conductors (phases × Q). No allocation
    /// for Q ≤ 1024. Returns NaN when the winding has no working wave of order p.
    /// </summary>
    public static double Compute(ReadOnlySpan<int> conductors, int phases, int polePairs, double phaseShiftRadians)
    {
        if (phases <= 0 || conductors.Length == 0 || conductors.Length % phases != 0 || polePairs <= 0) return double.NaN;
        int q = conductors.Length / phases;
        Span<double> levels = q <= 1024 ? stackalloc double[q] : new double[q];
        Span<double> spaceRe = q <= 1024 ? stackalloc double[q] : new double[q];
        Span<double> spaceIm = q <= 1024 ? stackalloc double[q] : new double[q];
        spaceRe.Clear();
        spaceIm.Clear();
        Complex plus = Complex.Zero, minus = Complex.Zero;
        double conductorSum = 0;
        for (int k = 0; k < phases; k++)
        {
            var phase = conductors.Slice(k * q, q);
            foreach (int c in phase) conductorSum += Math.Abs(c);
            var (sin, cos) = Math.SinCos(k * phaseShiftRadians);
            TurnsFunction.Levels(phase, 1, levels);
            for (int i = 0; i < q; i++)
            {
                spaceRe[i] += levels[i] * cos;
                spaceIm[i] += levels[i] * sin;
            }
            var s = SlotFourier.Direct(phase, polePairs);
            var turn = new Complex(cos, sin);
            plus += s * turn;                       // Σ S_k e^(+jkφ): forward working wave
            minus += s * Complex.Conjugate(turn);   // backward
        }
        double meanSquare = 0;
        for (int i = 0; i < q; i++) meanSquare += spaceRe[i] * spaceRe[i] + spaceIm[i] * spaceIm[i];
        meanSquare /= q;
        // |F±_p| = |Σ_k S_k(p) e^(±jkφ)| / (2πp); a working wave at rounding level counts as none.
        double slotSum = Math.Max(plus.Magnitude, minus.Magnitude);
        if (slotSum <= NoWorkingWave * conductorSum) return double.NaN;
        double working = slotSum / (2 * Math.PI * polePairs);
        return meanSquare / (working * working) - 1;
    }

    /// <summary>σ_δ of a design, for balanced currents at the design's phase shift. NaN without a working wave.</summary>
    public static double Compute(WindingDesign design)
    {
        int m = design.Phases.Length, q = design.Slots;
        var conductors = new int[m * q];
        for (int k = 0; k < m; k++) WindingFactors.SumLayers(design.Conductors, k, conductors.AsSpan(k * q, q));
        return Compute(conductors, m, design.PolePairs, design.PhaseShiftDegrees * Math.PI / 180);
    }
}
