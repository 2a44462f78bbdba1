using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

/// <summary>The FFT path of the slot spectrum (large Q) agrees with the direct sum (independent computation).</summary>
public class SlotSpectrumFftTests
{
    [Theory]
    [InlineData(97)]
    [InlineData(120)]
    [InlineData(1001)]
    public void Fft_base_band_equals_the_direct_sums(int slots)
    {
        var rng = new Random(slots);
        var values = Enumerable.Range(0, slots).Select(_ => (double)rng.Next(-20, 21)).ToArray();
        var band = new System.Numerics.Complex[SlotSpectrum.BaseBandLength(slots)];
        SlotSpectrum.ComputeBaseBand(values, band);
        Assert.True(slots > SlotSpectrum.FftThreshold);
        for (int order = 0; order < band.Length; order += Math.Max(1, band.Length / 50))
        {
            var direct = SlotSpectrum.Direct(values, order);
            Assert.True((band[order] - direct).Magnitude < 1e-9 * Math.Max(1, direct.Magnitude) * slots, $"order {order}: {band[order]} vs {direct}");
        }
    }
}
