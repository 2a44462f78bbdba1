using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

public class DifferentialLeakageTests
{
    // q = 1 full pitch, 3 phases: all odd non-triplen orders with factor 1, so
    // σ = Σ_(ν = 6k ± 1, k ≥ 1) 1/ν² = π²/9 − 1 (closed form).
    [Theory]
    [InlineData(6, 2)]
    [InlineData(12, 4)]
    [InlineData(30, 10)]
    public void Q1_full_pitch_equals_pi_squared_over_nine_minus_one(int slots, int poles)
    {
        var d = Designs.IntegralSlot(slots, poles, slots / poles);
        Assert.Equal(Math.PI * Math.PI / 9 - 1, DifferentialLeakage.Compute(d), 12);
    }

    // Full-pitch 60° belts, 3 phases: σ = π²(5q² + 1)/(54 q² k_w1²) − 1 (closed form; from memory,
    // it gives the tabulated 0.0966, 0.0284, 0.0141, 0.0089 for q = 1..4 of Pyrhonen et al. ch. 4).
    [Theory]
    [InlineData(1, 0.0966)]
    [InlineData(2, 0.0284)]
    [InlineData(3, 0.0141)]
    [InlineData(4, 0.0089)]
    [InlineData(5, null)]
    [InlineData(6, null)]
    public void Full_pitch_integral_slot_matches_the_closed_form(int q, double? published)
    {
        var d = Designs.IntegralSlot(12 * q, 4, 3 * q);
        double kw1 = ClosedFormFactors.Distribution(2, q, 12 * q);
        double closed = Math.PI * Math.PI * (5 * q * q + 1) / (54.0 * q * q * kw1 * kw1) - 1;
        double sigma = DifferentialLeakage.Compute(d);
        Assert.Equal(closed, sigma, 12);
        if (published is { } value) Assert.Equal(value, sigma, 4);
    }

    // The harmonic series of Pyrhonen et al. ch. 4, σ = Σ_(n ≠ 1) (k_wn / (n·k_w1))² over the orders
    // n = 6k ± 1 present in a balanced 3-phase integral-slot winding, with the closed-form factors,
    // summed to 2·10⁶ orders and Richardson-extrapolated (tail ∝ 1/N): an independent computation.
    [Theory]
    [InlineData(24, 4, 5)]
    [InlineData(36, 4, 7)]
    [InlineData(48, 4, 10)]
    [InlineData(36, 4, 8)]
    public void Short_pitch_integral_slot_matches_the_harmonic_series(int slots, int poles, int pitch)
    {
        var d = Designs.IntegralSlot(slots, poles, pitch);
        int q = slots / (3 * poles), p = poles / 2;
        double K(int n) => ClosedFormFactors.Distribution(n * p, q, slots) * ClosedFormFactors.Pitch(n * p, pitch, slots);
        double Partial(int limit)
        {
            double sum = 0, k1 = K(1);
            for (int n = 5; n <= limit; n += 2)
                if (n % 3 != 0) sum += Math.Pow(K(n) / (n * k1), 2);
            return sum;
        }
        int big = 6 * q * 100_000;    // whole periods of the slot spectrum
        double series = 2 * Partial(2 * big) - Partial(big);
        Assert.Equal(series, DifferentialLeakage.Compute(d), 9);
    }

    // Any winding (here fractional-slot tooth-coil windings with sub-harmonics): the exact value
    // equals the sum of the travelling-wave amplitudes of the spectrum, truncated at whole periods
    // of the slot spectrum and Richardson-extrapolated.
    [Theory]
    [InlineData(12, 10, 2)]
    [InlineData(12, 10, 1)]
    [InlineData(9, 8, 2)]
    [InlineData(12, 8, 2)]
    [InlineData(24, 22, 2)]
    public void Fractional_slot_matches_the_truncated_wave_sum(int slots, int poles, int layers)
    {
        var d = Designs.ToothCoils(slots, poles, layers);
        var w = WindingSpectrum.Of(d);
        var unit = CurrentPhasors.Balanced(3, 2 * Math.PI / 3);
        int p = d.PolePairs;
        var (f1, _) = TravellingWaves.At(w, unit.Phasors.AsSpan(), p);
        double Partial(int limit)
        {
            double sum = 0;
            for (int order = 1; order <= limit; order++)
            {
                var (f, b) = TravellingWaves.At(w, unit.Phasors.AsSpan(), order);
                sum += b.Magnitude * b.Magnitude + (order == p ? 0 : f.Magnitude * f.Magnitude);
            }
            return sum / (f1.Magnitude * f1.Magnitude);
        }
        int big = 2 * slots * 2000;
        double series = 2 * Partial(2 * big) - Partial(big);
        Assert.Equal(series, DifferentialLeakage.Compute(d), 7);
    }

    [Fact]
    public void Span_entry_point_agrees_with_the_design_entry_point_and_has_no_working_wave_nan()
    {
        var d = Designs.ToothCoils(12, 10);
        var flat = Enumerable.Range(0, 3).SelectMany(k => d.Conductors.SlotConductors(k)).ToArray();
        Assert.Equal(DifferentialLeakage.Compute(d), DifferentialLeakage.Compute(flat, 3, 5, 2 * Math.PI / 3), 14);
        Assert.True(double.IsNaN(DifferentialLeakage.Compute(new int[36], 3, 2, 2 * Math.PI / 3)));
    }
}
