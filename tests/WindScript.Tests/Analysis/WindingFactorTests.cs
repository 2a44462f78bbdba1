using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

public class WindingFactorTests
{
    private static double[] Factors(WindingDesign d, int phase, int orders, double skew = 0)
    {
        var f = new double[orders];
        WindingFactors.Compute(d.Conductors, phase, skew, f);
        return f;
    }

    // Closed forms k_d·k_p: Pyrhonen, Jokinen, Hrabovcova, Design of Rotating Electrical Machines, ch. 2.
    [Theory]
    [InlineData(24, 4, 6, 2)]   // q = 2, full pitch
    [InlineData(24, 4, 5, 2)]   // q = 2, y = 5/6
    [InlineData(36, 4, 7, 2)]   // q = 3, y = 7/9
    [InlineData(48, 4, 10, 2)]  // q = 4, y = 10/12
    [InlineData(72, 6, 10, 2)]  // q = 4, y = 10/12, six poles
    [InlineData(18, 2, 9, 1)]   // q = 3, single layer
    [InlineData(12, 4, 3, 1)]   // q = 1, single layer
    public void Numeric_factors_equal_the_closed_forms_at_every_order(int slots, int poles, int pitch, int layers)
    {
        var d = Designs.IntegralSlot(slots, poles, pitch, layers);
        int q = slots / (poles * 3);
        var regular = RegularWinding.TryRecognise(d);
        Assert.NotNull(regular);
        Assert.Equal(q, regular.SlotsPerPolePerPhase);
        int effectivePitch = layers == 1 ? 3 * q : pitch;
        for (int k = 0; k < 3; k++)
        {
            var f = Factors(d, k, 50 * d.PolePairs);
            for (int order = 1; order <= f.Length; order++)
            {
                // The closed forms hold at odd electrical orders; the belts repeat every pole pair
                // with reversed sign, so every other order vanishes.
                bool odd = order % d.PolePairs == 0 && order / d.PolePairs % 2 == 1;
                double closed = odd ? ClosedFormFactors.Distribution(order, q, slots) * ClosedFormFactors.Pitch(order, effectivePitch, slots) : 0;
                Assert.Equal(closed, f[order - 1], 12);
            }
        }
    }

    // Fundamental distribution factors of 60° belts for q = 1..6 and the limit 3/π as q grows:
    // Pyrhonen et al. ch. 2 (tabulated values 1, 0.966, 0.960, 0.958, 0.957, 0.956 from memory).
    [Theory]
    [InlineData(1, 1.0)]
    [InlineData(2, 0.966)]
    [InlineData(3, 0.960)]
    [InlineData(4, 0.958)]
    [InlineData(5, 0.957)]
    [InlineData(6, 0.956)]
    public void Distribution_factor_falls_with_q_towards_three_over_pi(int q, double published)
    {
        var d = Designs.IntegralSlot(6 * q * 2, 4, 3 * q);
        double k1 = Factors(d, 0, 2)[1];
        Assert.Equal(published, k1, 3);
        Assert.True(k1 > 3 / Math.PI);
        if (q > 1) Assert.True(k1 < Factors(Designs.IntegralSlot(6 * (q - 1) * 2, 4, 3 * (q - 1)), 0, 2)[1]);
    }

    // Concentrated (tooth-coil) windings: Cros & Viarouge (2002); Magnussen & Sadarangani (2003)
    // (values from memory): 12s/10p double layer 0.933, single layer 0.966; 9s/8p 0.945; 12s/8p 0.866.
    [Theory]
    [InlineData(12, 10, 2, 0.933)]
    [InlineData(12, 10, 1, 0.966)]
    [InlineData(9, 8, 2, 0.945)]
    [InlineData(12, 8, 2, 0.866)]
    [InlineData(12, 14, 2, 0.933)]
    [InlineData(24, 22, 2, 0.949)]
    public void Tooth_coil_fundamental_factors_match_the_published_tables(int slots, int poles, int layers, double published)
    {
        var d = Designs.ToothCoils(slots, poles, layers);
        for (int k = 0; k < 3; k++)
            Assert.Equal(published, Factors(d, k, poles / 2)[poles / 2 - 1], 3);
        Assert.Null(RegularWinding.TryRecognise(d));
    }

    // Skew factor sin(x)/x with x = νsπ/Q (Pyrhonen et al. ch. 2): numeric × skew equals the closed form.
    [Fact]
    public void Skewed_factors_equal_distribution_times_pitch_times_skew()
    {
        var d = Designs.IntegralSlot(36, 4, 7);
        var f = Factors(d, 0, 200, skew: 1);
        for (int order = 2; order <= 200; order += 4)
        {
            double closed = ClosedFormFactors.Distribution(order, 3, 36) * ClosedFormFactors.Pitch(order, 7, 36) * ClosedFormFactors.Skew(order, 1, 36);
            Assert.Equal(closed, f[order - 1], 12);
        }
        // Skewing by one slot pitch cuts the first slot harmonics Q/p ± 1 by an order of magnitude (common practice).
        var unskewed = Factors(d, 0, 200);
        Assert.True(f[17 * 2 - 1] < 0.1 * unskewed[17 * 2 - 1] && f[19 * 2 - 1] < 0.1 * unskewed[19 * 2 - 1]);
    }

    // Independent check of the fast path: the base-band look-up beyond Q/2 equals a direct
    // evaluation of Σ n e^(−jνθ) at every order (plain complex arithmetic, no recurrences).
    [Fact]
    public void Fast_factors_equal_a_direct_sum_at_every_order()
    {
        var d = Designs.ToothCoils(9, 8);
        var f = Factors(d, 1, 400);
        var c = d.Conductors.SlotConductors(1);
        double sides = c.Sum(Math.Abs);
        for (int order = 1; order <= 400; order++)
        {
            System.Numerics.Complex sum = 0;
            for (int s = 0; s < 9; s++) sum += c[s] * System.Numerics.Complex.Exp(new System.Numerics.Complex(0, -order * SlotFourier.SlotAngle(s, 9)));
            Assert.Equal(sum.Magnitude / sides, f[order - 1], 12);
        }
    }

    [Fact]
    public void A_single_full_pitch_coil_is_not_a_regular_winding()
    {
        // Its conductor pattern equals belts of 12 with pitch 1, whose sides cancel inside the belt:
        // k_d·k_p = 0.083 there, while the lone coil has k = 1 (common practice).
        var d = Designs.Create(24, 2, 1, [new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 13, GoLayer = 0, ReturnLayer = 0, Turns = 50, Polarity = 1 }], layers: 1);
        Assert.Null(RegularWinding.TryRecognise(d));
        Assert.Equal(1, Factors(d, 0, 1)[0], 12);
    }

    [Fact]
    public void A_slot_whose_layers_cancel_lowers_the_factor()
    {
        // Two coils of one phase with opposite sides in slot 4: the sides count, their currents cancel.
        var coils = new[] { new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 4, GoLayer = 0, ReturnLayer = 1, Turns = 5, Polarity = 1 }, new Coil { Phase = 0, GoSlot = 4, ReturnSlot = 6, GoLayer = 0, ReturnLayer = 1, Turns = 5, Polarity = 1 } };
        var d = Designs.Create(6, 2, 1, coils);
        var f = Factors(d, 0, 1);
        Assert.Equal(0.25, f[0], 12);   // |5 e^(−j30°) − 5 e^(−j330°)| = 5, over 4 sides of 5 turns
    }

    [Fact]
    public void Phase_axes_of_a_balanced_winding_are_120_electrical_degrees_apart()
    {
        var d = Designs.IntegralSlot(36, 4, 7);
        var axes = Enumerable.Range(0, 3).Select(k => WindingFactors.AxisElectricalDegrees(d.Conductors.SlotConductors(k), 2)).ToArray();
        Assert.Equal(120, Mod360(axes[1] - axes[0]), 9);
        Assert.Equal(120, Mod360(axes[2] - axes[1]), 9);
    }

    private static double Mod360(double a) => (a % 360 + 360) % 360;
}
