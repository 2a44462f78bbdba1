using System.Numerics;
using FsCheck.Xunit;
using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

[Properties(Arbitrary = [typeof(WindingGenerators)])]
public class AnalysisProperties
{
    private static double[] Factors(WindScript.Model.WindingDesign d, int phase, int orders)
    {
        var f = new double[orders];
        WindingFactors.Compute(d.Conductors, phase, d.Geometry.SkewSlots, f);
        return f;
    }

    // |Σ n e^(−jνθ)| ≤ Σ |n| (triangle inequality) and |sin x / x| ≤ 1.
    [Property(MaxTest = 1000)]
    public bool Winding_factors_never_exceed_one(AnyWinding w)
    {
        for (int k = 0; k < w.Design.Phases.Length; k++)
            if (Factors(w.Design, k, 3 * w.Design.Slots + 5).Any(x => x < 0 || x > 1 + 1e-12)) return false;
        return true;
    }

    // The base-band look-up for orders past Q/2 equals a plain complex sum at every order.
    [Property(MaxTest = 1000)]
    public bool Fast_path_equals_the_direct_sum(AnyWinding w)
    {
        var d = w.Design;
        var c = d.Conductors.SlotConductors(0);
        int sides = 0;
        for (int s = 0; s < d.Slots; s++) for (int l = 0; l < d.Conductors.Layers; l++) sides += Math.Abs(d.Conductors[0, s, l]);
        var f = new double[4 * d.Slots + 3];
        WindingFactors.Compute(c, sides, 0, f);
        for (int order = 1; order <= f.Length; order++)
        {
            Complex sum = 0;
            for (int s = 0; s < d.Slots; s++) sum += c[s] * Complex.Exp(new Complex(0, -order * SlotFourier.SlotAngle(s, d.Slots)));
            double expected = sides == 0 ? 0 : sum.Magnitude / sides;
            if (Math.Abs(expected - f[order - 1]) > 1e-10) return false;
        }
        return true;
    }

    // Rotating a winding by whole slots changes no magnitude: factors, wave amplitudes, leakage.
    [Property(MaxTest = 1000)]
    public bool Rotation_by_whole_slots_changes_no_magnitude(AnyWinding w)
    {
        var a = w.Design;
        var b = Designs.Rotated(a, w.Shift);
        int orders = 2 * a.Slots + 3;
        for (int k = 0; k < a.Phases.Length; k++)
            if (!Close(Factors(a, k, orders), Factors(b, k, orders))) return false;
        var wa = WindingSpectrum.Of(a);
        var wb = WindingSpectrum.Of(b);
        var unit = CurrentPhasors.Balanced(a.Phases.Length, a.PhaseShiftDegrees * Math.PI / 180);
        for (int order = 1; order <= orders; order++)
        {
            var (fa, ba) = TravellingWaves.At(wa, unit.Phasors.AsSpan(), order);
            var (fb, bb) = TravellingWaves.At(wb, unit.Phasors.AsSpan(), order);
            if (Math.Abs(fa.Magnitude - fb.Magnitude) > 1e-9 * (1 + fa.Magnitude) || Math.Abs(ba.Magnitude - bb.Magnitude) > 1e-9 * (1 + ba.Magnitude)) return false;
        }
        double la = DifferentialLeakage.Compute(a), lb = DifferentialLeakage.Compute(b);
        return double.IsNaN(la) ? double.IsNaN(lb) : Math.Abs(la - lb) <= 1e-9 * (1 + Math.Abs(la));
    }

    // A balanced m-phase winding under balanced currents has no zero-sequence MMF: at the orders
    // where all phases are in step (electrical orders that are multiples of m) the currents sum to
    // zero at every instant, so those waves vanish — in the travelling-wave split and in the staircase.
    [Property(MaxTest = 1000)]
    public bool Balanced_winding_under_balanced_currents_has_no_zero_sequence_mmf(BalancedWinding w)
    {
        var d = w.Design;
        int m = d.Phases.Length, p = d.PolePairs;
        var spectrum = WindingSpectrum.Of(d);
        var drive = Designs.Balanced(m, 10, 50, 360.0 / m, angle0: w.Angle);
        var phasors = CurrentPhasors.Of(drive, m)[0].Phasors;
        var currents = drive.CurrentsAt(w.Time);
        double scale = 1e-9 * (1 + Enumerable.Range(1, 2 * d.Slots).Max(o => spectrum.MmfPerAmpere(0, o)) * 10);
        for (int j = 1; j <= 4; j++)
        {
            int order = m * p * j;
            var (f, b) = TravellingWaves.At(spectrum, phasors.AsSpan(), order);
            if (f.Magnitude > scale || b.Magnitude > scale) return false;
            if (MmfStaircase.HarmonicAmplitude(spectrum, currents, order) > scale) return false;
        }
        return true;
    }

    // Reversing the drive sequence swaps the forward and backward waves of every order (any winding).
    [Property(MaxTest = 1000)]
    public bool Reversing_the_sequence_swaps_forward_and_backward(AnyWinding w)
    {
        var d = w.Design;
        int m = d.Phases.Length;
        var spectrum = WindingSpectrum.Of(d);
        var forward = CurrentPhasors.Of(Designs.Balanced(m, 7, 60, 360.0 / m, angle0: w.Angle), m)[0];
        var reverse = CurrentPhasors.Of(Designs.Balanced(m, 7, 60, 360.0 / m, reversed: true, angle0: w.Angle), m)[0];
        for (int order = 1; order <= 2 * d.Slots + 3; order++)
        {
            var a = TravellingWaves.Describe(spectrum, forward, order);
            var b = TravellingWaves.Describe(spectrum, reverse, order);
            if (Math.Abs(a.Forward - b.Backward) > 1e-9 * (1 + a.Forward) || Math.Abs(a.Backward - b.Forward) > 1e-9 * (1 + a.Backward)) return false;
        }
        return true;
    }

    // The exact leakage equals the truncated wave sum (Richardson-extrapolated) for any balanced
    // winding. Each case sums thousands of orders, so fewer cases than the cheap properties.
    [Property(MaxTest = 100)]
    public bool Exact_leakage_equals_the_extrapolated_wave_sum(BalancedWinding w)
    {
        var d = w.Design;
        double exact = DifferentialLeakage.Compute(d);
        if (double.IsNaN(exact)) return true;   // no working wave: nothing to compare
        var spectrum = WindingSpectrum.Of(d);
        var unit = CurrentPhasors.Balanced(d.Phases.Length, d.PhaseShiftDegrees * Math.PI / 180);
        var (f1, b1) = TravellingWaves.At(spectrum, unit.Phasors.AsSpan(), d.PolePairs);
        double working = Math.Max(f1.Magnitude, b1.Magnitude);
        double Partial(int limit)
        {
            double sum = 0;
            for (int order = 1; order <= limit; order++)
            {
                var (f, b) = TravellingWaves.At(spectrum, unit.Phasors.AsSpan(), order);
                sum += f.Magnitude * f.Magnitude + b.Magnitude * b.Magnitude;
            }
            return sum / (working * working) - 1;
        }
        int big = 2 * d.Slots * 40;
        double series = 2 * Partial(2 * big) - Partial(big);
        return exact >= -1e-12 && Math.Abs(series - exact) <= 1e-5 * (1 + exact);
    }

    // Whenever a winding is recognised as regular, the closed forms k_d·k_p equal the numeric
    // factors at every odd electrical order (Pyrhonen et al. ch. 2), whatever the rotation.
    [Property(MaxTest = 1000)]
    public bool Recognised_regular_windings_agree_with_the_closed_forms(RegularCandidate c)
    {
        var d = c.Design;
        if (RegularWinding.TryRecognise(d) is not { } regular) return true;
        int p = d.PolePairs;
        for (int k = 0; k < d.Phases.Length; k++)
        {
            var f = Factors(d, k, 40 * p);
            for (int n = 1; n <= 40; n += 2)
            {
                double closed = ClosedFormFactors.Distribution(n * p, regular.SlotsPerPolePerPhase, d.Slots) * ClosedFormFactors.Pitch(n * p, regular.CoilPitch, d.Slots);
                if (Math.Abs(closed - f[n * p - 1]) > 1e-10) return false;
            }
        }
        return true;
    }

    private static bool Close(double[] a, double[] b) => a.Zip(b).All(x => Math.Abs(x.First - x.Second) <= 1e-10);
}
