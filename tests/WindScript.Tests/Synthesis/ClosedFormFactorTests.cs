namespace WindScript.Tests.Synthesis;

/// <summary>
/// Integral-slot windings against the closed forms of J. Pyrhonen, T. Jokinen, V. Hrabovcova,
/// Design of Rotating Electrical Machines (Wiley, 2nd ed. 2014), ch. 2: for the n-th electrical
/// harmonic, k_d = sin(n·q·α/2) / (q·sin(n·α/2)) with α = 2πp/Q the slot angle, and
/// k_p = sin(n·(y/τ_p)·π/2) with τ_p = Q/(2p) the pole pitch in slots; k_w = k_d·k_p.
/// The formulas are written out here, independently of the analysis code.
/// </summary>
public class ClosedFormFactorTests
{
    private static double Distribution(int n, int q, int slots, int polePairs)
    {
        double alpha = 2 * Math.PI * polePairs / slots;
        return Math.Sin(n * q * alpha / 2) / (q * Math.Sin(n * alpha / 2));
    }

    private static double Pitch(int n, int y, int slots, int poles) => Math.Sin(n * (double)y / ((double)slots / poles) * Math.PI / 2);

    [Theory]
    // slots, poles, pitch (double layer, 60° belts, 3 phases)
    [InlineData(36, 4, 7)]
    [InlineData(36, 4, 9)]
    [InlineData(24, 4, 5)]
    [InlineData(48, 4, 10)]
    [InlineData(72, 8, 7)]
    [InlineData(18, 2, 7)]
    [InlineData(54, 6, 8)]
    [InlineData(12, 2, 5)]
    public void Double_layer_factors_equal_distribution_times_pitch_factor(int slots, int poles, int y)
    {
        var design = Synth.Design(slots, poles, pitch: y);
        int p = poles / 2, q = slots / (poles * 3);
        foreach (int n in new[] { 1, 3, 5, 7, 11, 13, 17, 19 })
        {
            double expected = Math.Abs(Distribution(n, q, slots, p) * Pitch(n, y, slots, poles));
            for (int phase = 0; phase < 3; phase++)
                Assert.Equal(expected, Synth.WindingFactor(design, phase, n * p), 9);
        }
    }

    [Theory]
    [InlineData(24, 4)]
    [InlineData(36, 4)]
    [InlineData(36, 6)]
    [InlineData(48, 8)]
    [InlineData(18, 2)]
    public void Single_layer_factors_equal_the_distribution_factor(int slots, int poles)
    {
        var design = Synth.Design(slots, poles, layers: 1);
        int p = poles / 2, q = slots / (poles * 3);
        foreach (int n in new[] { 1, 5, 7, 11, 13 })
            Assert.Equal(Math.Abs(Distribution(n, q, slots, p)), Synth.WindingFactor(design, 0, n * p), 9);
    }

    [Fact]
    public void A_single_layer_integral_slot_winding_uses_full_pitch_coils_and_the_textbook_pattern()
    {
        // 24 slots, 4 poles, q = 2: belts of two slots, coils spanning the pole pitch of 6 slots (common practice).
        var design = Synth.Design(24, 4, layers: 1);
        Assert.All(design.Winding.Coils, c => Assert.Equal(6, c.PitchSlots(24)));
        var layout = Model.SlotLayout.From(design);
        var labels = Enumerable.Range(1, 12).Select(s => layout.Label(s, 0, design.Phases));
        Assert.Equal("+U +U -W -W +V +V -U -U +W +W -V -V", string.Join(" ", labels));
    }
}
