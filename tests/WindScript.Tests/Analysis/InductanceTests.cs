using MathNet.Numerics;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

public class InductanceTests
{
    private static readonly Geometry Core = new() { BoreDiameter = 0.15, StackLength = 0.12, Gap = 0.0005, GapFluxDensity = 0.8 };

    // One full-pitch coil of N turns, 2 poles: N(θ) = ±N/2, so L = μ0·r·l/g·∫N² dθ = μ0·r·l·π·N²/(2g)
    // (winding-function method, Lipo); its fundamental alone is 4μ0N²rl/(πg) (Fitzgerald, Kingsley
    // & Umans), a ratio of π²/8 (closed form).
    [Fact]
    public void Single_full_pitch_coil()
    {
        var d = Designs.Create(12, 2, 1, [new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 7, GoLayer = 0, ReturnLayer = 0, Turns = 20, Polarity = 1 }], layers: 1, geometry: Core);
        var l = Inductances.Of(d, WindingSpectrum.Of(d), carter: 1)!;
        double r = 0.075 - 0.0005 / 2, mu = AirGapField.Mu0;
        double expected = mu * r * 0.12 * Math.PI * 400 / (2 * 0.0005);
        Assert.Equal(expected, l.Matrix[0][0], 12);
        double fundamental = 4 * mu * 400 * r * 0.12 / (Math.PI * 0.0005);
        Assert.Equal(Math.PI * Math.PI / 8, l.Matrix[0][0] / fundamental, 12);
    }

    // Balanced m-phase currents see L_s = (m/2)·L1·(1 + σ_δ), with the fundamental magnetising
    // inductance L1 = (4μ0 r l/(π g_e))(k_w1 N_s/p)² (Fitzgerald, Kingsley & Umans) and σ_δ the
    // differential leakage (Pyrhonen et al. ch. 4): the harmonics add their share to the air-gap inductance.
    [Theory]
    [InlineData(36, 4, 7, 0)]
    [InlineData(24, 2, 10, 0)]
    [InlineData(12, 10, 0, 2)]
    [InlineData(9, 8, 0, 2)]
    public void Synchronous_inductance_is_fundamental_times_one_plus_leakage(int slots, int poles, int pitch, int layers)
    {
        var d = (pitch > 0 ? Designs.IntegralSlot(slots, poles, pitch, geometry: Core) : Designs.ToothCoils(slots, poles, layers, geometry: Core));
        var w = WindingSpectrum.Of(d);
        var l = Inductances.Of(d, w, carter: 1.05)!;
        double kw1 = w.WindingFactor(0, d.PolePairs), n = d.SeriesTurns(0), p = d.PolePairs;
        double l1 = 4 * AirGapField.Mu0 * l.MeanRadius * 0.12 / (Math.PI * 1.05 * 0.0005) * Math.Pow(kw1 * n / p, 2);
        Assert.Equal(1.5 * l1 * (1 + DifferentialLeakage.Compute(d)), l.Synchronous, 9);
        for (int a = 0; a < 3; a++)
            for (int b = 0; b < 3; b++) Assert.Equal(l.Matrix[a][b], l.Matrix[b][a], 15);
    }

    // Back-EMF: E = (2π/√2) f k_w1 N Φ (common practice) against the flux linkage of the rotating
    // field λ(α) = r·l·∫ N(θ) B̂ cos(pθ − α) dθ integrated numerically (MathNet.Numerics) and its
    // peak: E_rms = ω·λ̂/√2.
    [Fact]
    public void Back_emf_matches_the_numerically_integrated_flux_linkage()
    {
        var d = Designs.IntegralSlot(36, 4, 7, geometry: Core);
        var result = MachineAnalysis.Evaluate(d);
        var emf = result.BackEmf!;
        var turns = TurnsFunction.FromConductors(d.Conductors.SlotConductors(0));
        double r = 0.075, length = 0.12, b = 0.8;
        double Linkage(double alpha)
        {
            double total = 0;
            for (int i = 0; i < 36; i++)   // integrate interval by interval: the staircase is smooth inside each
            {
                double from = SlotFourier.SlotAngle(i, 36), to = from + 2 * Math.PI / 36;
                total += Integrate.OnClosedInterval(t => turns.ValueAt(from + 1e-12 + (t - from) * (1 - 1e-11)) * b * Math.Cos(2 * t - alpha), from, to);
            }
            return total * r * length;
        }
        // λ(α) = A cos α + B sin α, so its peak is the length of (λ(0), λ(π/2)).
        double peak = Math.Sqrt(Math.Pow(Linkage(0), 2) + Math.Pow(Linkage(Math.PI / 2), 2));
        double f = 50, expected = 2 * Math.PI * f * peak / Math.Sqrt(2);
        Assert.Equal(1, emf.Phases[0].VoltsPerHertz * f / expected, 7);
    }
}
