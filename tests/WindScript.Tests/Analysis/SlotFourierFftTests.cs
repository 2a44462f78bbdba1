using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

/// <summary>The FFT path of the slot spectrum (large Q) agrees with the direct sum (independent computation).</summary>
public class SlotFourierFftTests
{
    [Theory]
    [InlineData(97)]
    [InlineData(120)]
    [InlineData(1001)]
    public void Fft_base_band_equals_the_direct_sums(int slots)
    {
        var rng = new Random(slots);
        var values = Enumerable.Range(0, slots).Select(_ => (double)rng.Next(-20, 21)).ToArray();
        var band = new System.Numerics.Complex[SlotFourier.BaseBandLength(slots)];
        SlotFourier.ComputeBaseBand(values, band);
        Assert.True(slots > SlotFourier.FftThreshold);
        for (int order = 0; order < band.Length; order += Math.Max(1, band.Length / 50))
        {
            var direct = SlotFourier.Direct(values, order);
            Assert.True((band[order] - direct).Magnitude < 1e-9 * Math.Max(1, direct.Magnitude) * slots, $"order {order}: {band[order]} vs {direct}");
        }
    }

    // Independent computation: the direct slot sums of each distribution on its own.
    [Theory]
    [InlineData(48)]
    [InlineData(97)]
    [InlineData(120)]
    [InlineData(10_008)]
    public void Two_real_distributions_from_one_transform_equal_their_direct_sums(int slots)
    {
        var rng = new Random(slots + 1);
        var a = Enumerable.Range(0, slots).Select(_ => (double)rng.Next(-20, 21)).ToArray();
        var b = Enumerable.Range(0, slots).Select(_ => (double)rng.Next(-20, 21)).ToArray();
        int length = SlotFourier.BaseBandLength(slots);
        var bandA = new System.Numerics.Complex[length];
        var bandB = new System.Numerics.Complex[length];
        SlotFourier.ComputeBaseBands(a, b, bandA, bandB);
        for (int order = 0; order < length; order += Math.Max(1, length / 40))
        {
            var da = SlotFourier.Direct(a, order);
            var db = SlotFourier.Direct(b, order);
            Assert.True((bandA[order] - da).Magnitude < 1e-9 * Math.Max(1, da.Magnitude) * slots, $"a, order {order}: {bandA[order]} vs {da}");
            Assert.True((bandB[order] - db).Magnitude < 1e-9 * Math.Max(1, db.Magnitude) * slots, $"b, order {order}: {bandB[order]} vs {db}");
        }
    }
}
