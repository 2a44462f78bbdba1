using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

public class SymmetryTests
{
    // Periodicity t = gcd(Q, p), cogging order lcm(Q, 2p) (common practice); which tooth-coil windings
    // have sub-harmonics, even harmonics and unbalanced pull: Bianchi & Dai Pre (2006), from memory.
    [Theory]
    [InlineData(36, 4, 2, 2, true, 36, false)]    // integral slot q = 3
    [InlineData(9, 8, 1, 1, false, 72, true)]     // odd Q: no symmetry at all, unbalanced pull
    [InlineData(12, 10, 1, 1, true, 60, false)]   // half-period reversal: odd orders only
    [InlineData(12, 8, 4, 4, false, 24, false)]   // q = 1/2: period of 3 slots
    [InlineData(24, 22, 1, 1, true, 264, false)]
    public void Periodicities_and_cogging_order(int slots, int poles, int machine, int winding, bool reversal, int cogging, bool adjacent)
    {
        var d = slots % (3 * poles) == 0 ? Designs.IntegralSlot(slots, poles, slots / poles - 2) : Designs.ToothCoils(slots, poles);
        var s = WindingSymmetry.Of(d);
        Assert.Equal(machine, s.MachinePeriodicity);
        Assert.Equal(winding, s.WindingPeriodicity);
        Assert.Equal(reversal, s.HalfPeriodReversal);
        Assert.Equal(cogging, s.CoggingOrder);
        Assert.Equal(adjacent, s.AdjacentOrders);
    }

    [Fact]
    public void Orders_present_follow_the_symmetry()
    {
        // 12/8 (q = 1/2) has a second electrical harmonic; 12/10 a first-order sub-harmonic and no
        // even harmonics; the integral-slot winding neither (common practice).
        var half = MachineAnalysis.Evaluate(Designs.ToothCoils(12, 8)).Balanced;
        Assert.Contains(8, half.EvenHarmonics);
        Assert.Empty(half.SubHarmonics);
        var tenPole = MachineAnalysis.Evaluate(Designs.ToothCoils(12, 10)).Balanced;
        Assert.Contains(1, tenPole.SubHarmonics);
        Assert.Empty(tenPole.EvenHarmonics);
        Assert.Contains(7, tenPole.InterHarmonics);
        var integral = MachineAnalysis.Evaluate(Designs.IntegralSlot(36, 4, 7)).Balanced;
        Assert.Empty(integral.SubHarmonics);
        Assert.Empty(integral.EvenHarmonics);
        Assert.Empty(integral.InterHarmonics);
        Assert.All(integral.Waves, w => Assert.True(w.Order % 2 == 0));
    }
}
