using System.Numerics;
using MathNet.Numerics.IntegralTransforms;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

public class MmfTests
{
    // A single full-pitch coil of N turns on a 2-pole stator: a square wave of ±N/2 turns,
    // whose fundamental is (4/π)(N/2) (common practice; Fitzgerald, Kingsley & Umans, Electric Machinery).
    [Fact]
    public void Full_pitch_coil_gives_a_square_wave_of_half_its_turns()
    {
        var d = Designs.Create(12, 2, 1, [new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 7, GoLayer = 0, ReturnLayer = 0, Turns = 20, Polarity = 1 }], layers: 1);
        var n = TurnsFunction.FromConductors(d.Conductors.SlotConductors(0));
        Assert.Equal(10, n.ValueAt(Math.PI / 2), 12);
        Assert.Equal(-10, n.ValueAt(3 * Math.PI / 2), 12);
        var w = WindingSpectrum.Of(d);
        Assert.Equal(4 / Math.PI * 10, w.MmfPerAmpere(0, 1), 12);
        Assert.Equal(4 / Math.PI * 10 / 3, w.MmfPerAmpere(0, 3), 12);
        Assert.Equal(0, w.MmfPerAmpere(0, 2), 12);
    }

    // Rotating-field amplitude F1 = (m/2)(4/π)(k_w1 N_ph/(2p)) Î (Fitzgerald, Kingsley & Umans, Electric Machinery).
    [Theory]
    [InlineData(36, 4, 7, 2, 1)]
    [InlineData(48, 4, 10, 2, 2)]
    [InlineData(24, 2, 10, 2, 1)]
    [InlineData(72, 8, 9, 1, 1)]
    public void Forward_fundamental_equals_the_rotating_field_formula(int slots, int poles, int pitch, int layers, int paths)
    {
        var d = Designs.IntegralSlot(slots, poles, pitch, layers, turns: 7, paths: paths);
        var w = WindingSpectrum.Of(d);
        var currents = CurrentPhasors.Of(Designs.Balanced(3, 10, 50, 120), 3)[0];
        var wave = TravellingWaves.Describe(w, currents, d.PolePairs);
        double kw1 = w.WindingFactor(0, d.PolePairs);
        double expected = 1.5 * (4 / Math.PI) * (kw1 * d.SeriesTurns(0) / d.Poles) * 10;
        Assert.Equal(expected, wave.Forward, 9);
        Assert.Equal(0, wave.Backward, 9);
        Assert.Equal(WaveKind.Forward, wave.Kind);
        Assert.Equal(2 * Math.PI * 50 / d.PolePairs, wave.SpeedRadPerSecond, 9);
        Assert.Equal(6000.0 / d.Poles, wave.SpeedRpm, 9);   // synchronous speed 120 f / poles (common practice)
    }

    // A balanced 3-phase integral-slot winding under balanced currents has only the orders
    // 6k + 1 travelling forward and 6k − 1 travelling backward (common practice).
    [Fact]
    public void Balanced_integral_slot_winding_has_only_6k_plus_1_forward_and_6k_minus_1_backward()
    {
        var d = Designs.IntegralSlot(36, 4, 7);
        var w = WindingSpectrum.Of(d);
        var currents = CurrentPhasors.Of(Designs.Balanced(3, 1, 50, 120, angle0: 0.3), 3)[0];
        for (int n = 1; n <= 101; n++)
        {
            var wave = TravellingWaves.Describe(w, currents, n * d.PolePairs);
            double scale = 1e-9 * w.MmfPerAmpere(0, d.PolePairs);
            if (n % 6 == 1) { Assert.True(wave.Forward > scale, $"n={n}"); Assert.True(wave.Backward < scale, $"n={n}"); }
            else if (n % 6 == 5) { Assert.True(wave.Backward > scale, $"n={n}"); Assert.True(wave.Forward < scale, $"n={n}"); }
            else { Assert.True(wave.Forward < scale && wave.Backward < scale, $"n={n}"); }
        }
        // Between the electrical orders (odd mechanical orders for 4 poles) nothing at all.
        Assert.Equal(0, TravellingWaves.At(w, currents.Phasors.AsSpan(), 3).Forward.Magnitude, 12);
    }

    // Single-phase AC gives a pulsating field: equal forward and backward halves (common practice).
    [Fact]
    public void Single_phase_ac_splits_into_equal_halves()
    {
        var d = Designs.IntegralSlot(24, 4, 5);
        var w = WindingSpectrum.Of(d);
        var drive = new Drive { Name = "single", Currents = [new PhaseCurrent(0, [new CurrentComponent(8, 314.159, 0.4)]), new PhaseCurrent(1, []), new PhaseCurrent(2, [])] };
        var wave = TravellingWaves.Describe(w, CurrentPhasors.Of(drive, 3)[0], 2);
        Assert.Equal(WaveKind.Pulsating, wave.Kind);
        Assert.Equal(wave.Forward, wave.Backward, 12);
        Assert.Equal(8 * w.MmfPerAmpere(0, 2) / 2, wave.Forward, 12);
    }

    // DC currents give a standing wave whose amplitude is the instantaneous harmonic (common practice).
    [Fact]
    public void Direct_current_gives_a_standing_wave()
    {
        var d = Designs.IntegralSlot(24, 4, 5);
        var w = WindingSpectrum.Of(d);
        var drive = Designs.Direct("standstill", 8, -4, -4);
        var groups = CurrentPhasors.Of(drive, 3);
        Assert.Single(groups);
        var wave = TravellingWaves.Describe(w, groups[0], 2);
        Assert.Equal(WaveKind.Standing, wave.Kind);
        Assert.Equal(0, wave.SpeedRpm);
        Assert.Equal(MmfStaircase.HarmonicAmplitude(w, [8, -4, -4], 2), wave.Standing, 12);
        // i_A = 8, i_B = i_C = −4 is the balanced set at its crest: 1.5 × 8 × F1 per ampere.
        Assert.Equal(1.5 * 8 * w.MmfPerAmpere(0, 2), wave.Standing, 9);
    }

    // Harmonic amplitudes against an FFT of the sampled staircase (MathNet.Numerics). Samples fall
    // on the slot centres, where the staircase takes the midpoint of its step (as its Fourier
    // series does), so the sampled DFT differs from the series only by aliasing, O((ν/M)²).
    [Theory]
    [InlineData(36, 4, 7, 2, 0.0)]
    [InlineData(12, 10, 0, 2, 0.0013)]
    [InlineData(9, 8, 0, 2, 0.004)]
    public void Harmonic_amplitudes_match_an_fft_of_the_staircase(int slots, int poles, int pitch, int layers, double time)
    {
        var d = pitch > 0 ? Designs.IntegralSlot(slots, poles, pitch, layers) : Designs.ToothCoils(slots, poles, layers);
        var w = WindingSpectrum.Of(d);
        var currents = Designs.Balanced(3, 10, 50, 120, angle0: 0.2).CurrentsAt(time);
        var mmf = MmfStaircase.FromCurrents(w, currents, time);
        int perSlot = 2048, m = slots * perSlot;
        var samples = new Complex[m];
        for (int i = 0; i < m; i++)
        {
            // Slot centres sit at i = s·perSlot + perSlot/2.
            int s = i / perSlot, within = i % perSlot;
            double here = mmf.Levels[s == 0 && within < perSlot / 2 ? slots - 1 : within < perSlot / 2 ? s - 1 : s];
            double previous = mmf.Levels[(s - 1 + slots) % slots];
            samples[i] = within == perSlot / 2 ? (previous + mmf.Levels[s]) / 2 : here;
        }
        Fourier.Forward(samples, FourierOptions.Matlab);
        for (int order = 1; order <= 60; order++)
        {
            double fft = 2 * samples[order].Magnitude / m;
            double series = MmfStaircase.HarmonicAmplitude(w, currents, order);
            Assert.True(Math.Abs(fft - series) <= 1e-5 * mmf.Peak, $"order {order}: fft {fft} series {series}");
        }
    }

    [Fact]
    public void Staircase_has_zero_mean_and_steps_by_the_slot_currents()
    {
        var d = Designs.ToothCoils(12, 10);
        var w = WindingSpectrum.Of(d);
        double[] currents = [3, -1, -2];
        var mmf = MmfStaircase.FromCurrents(w, currents);
        Assert.Equal(0, mmf.Levels.ToArray().Average(), 12);
        for (int s = 1; s < 12; s++)
        {
            double slotCurrent = Enumerable.Range(0, 3).Sum(k => d.Conductors.SlotConductors(k)[s] * currents[k]);
            Assert.Equal(slotCurrent, mmf.Levels[s] - mmf.Levels[s - 1], 12);
        }
    }
}
