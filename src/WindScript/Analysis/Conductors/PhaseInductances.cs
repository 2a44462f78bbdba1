using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// The per-phase inductances for balanced currents (positive sequence), each from its source:
/// magnetising L_m = 2·m·μ0·r·l·(k_w1·N)²/(π·p²·δ_e) (the working wave alone; Fitzgerald et al.,
/// Electric Machinery: F1 = (m/2)(4/π)(k_w1·N/2p)·Î; Pyrhonen et al., ch. 3/4), with r the mean gap
/// radius and δ_e = k_C·δ; slot and tooth-tip leakage from the layer contents of every slot (exact
/// for any winding: L = (μ0·l/m)·Σ_slots Σ_ab λ_ab·Re(A_a·conj A_b), A_a the phasor sum of the
/// layer's conductors at balanced unit currents; it reduces to Pyrhonen's (4m/Q)·μ0·l·N²·λ with the
/// short-pitch factors k1, k2 for regular windings); end-winding leakage by Pyrhonen's empirical form
/// L_w = (4m/Q)·q·N²·μ0·l_w·λ_w with l_w one coil end's length and λ_w = 0.3 (assumed; from memory, of
/// the order of the published values for common end windings); skew leakage σ_sq·L_m with
/// σ_sq = 1/k_sq² − 1 (Pyrhonen ch. 4); differential leakage σ_δ·L_m (the exact coefficient).
/// </summary>
internal static class PhaseInductances
{
    public const double EndWindingPermeance = 0.3;

    public static double Magnetising(int phases, double meanRadius, double stack, double windingFactor, double seriesTurns, int polePairs, double effectiveGap) =>
        2 * phases * AirGapField.Mu0 * meanRadius * stack * Math.Pow(windingFactor * seriesTurns, 2) / (Math.PI * polePairs * polePairs * effectiveGap);

    /// <summary>Σ_slots Σ_ab λ_ab·Re(A_a conj A_b) + (λ_above + λ_tip)·|Σ_a A_a|², per phase (÷ m), in turns² (multiply by μ0·l).</summary>
    public static (double Slot, double Tip) SlotSums(WindingDesign design, SlotPermeance permeance)
    {
        var matrix = design.Conductors;
        int m = design.Phases.Length, layers = matrix.Layers, q = design.Slots;
        double shift = design.PhaseShiftDegrees * Math.PI / 180, paths = design.Winding.Paths;
        int lambdaLayers = permeance.Layers.GetLength(0);
        double slot = 0, tip = 0;
        var a = new Complex[layers];
        for (int s = 0; s < q; s++)
        {
            Complex total = 0;
            for (int layer = 0; layer < layers; layer++)
            {
                a[layer] = 0;
                for (int k = 0; k < m; k++) a[layer] += matrix[k, s, layer] / paths * Complex.FromPolarCoordinates(1, k * shift);
                total += a[layer];
            }
            if (lambdaLayers == layers)
                for (int i = 0; i < layers; i++)
                    for (int j = 0; j < layers; j++)
                        slot += permeance.Layers[i, j] * (a[i] * Complex.Conjugate(a[j])).Real;
            else
                slot += permeance.Layers[0, 0] * total.Magnitude * total.Magnitude; // one region for every side
            double square = total.Magnitude * total.Magnitude;
            slot += permeance.Above * square;
            tip += permeance.ToothTip * square;
        }
        return (m == 0 ? 0 : slot / m, m == 0 ? 0 : tip / m);
    }

    public static double EndWinding(int phases, int slots, double slotsPerPolePerPhase, double seriesTurns, double endLength) =>
        4.0 * phases / slots * slotsPerPolePerPhase * seriesTurns * seriesTurns * AirGapField.Mu0 * endLength * EndWindingPermeance;

    /// <summary>σ_sq = 1/k_sq² − 1 (Pyrhonen ch. 4); 0 without skew.</summary>
    public static double SkewCoefficient(double skewFactor) => skewFactor > 0 ? 1 / (skewFactor * skewFactor) - 1 : 0;
}
