using System.Numerics;

namespace WindScript.Analysis;

/// <summary>
/// The complex spectrum S(ν) = Σ_s c_s·e^(−jνθ_s) of a quantity concentrated at the slot
/// centres θ_s = 2π(s + ½)/Q (s = 0-based slot index, ν = mechanical order, cycles per
/// revolution). Every harmonic quantity of the analysis (winding factors, MMF waves,
/// inductances) is built from it.
/// </summary>
/// <remarks>
/// Because the slot centres are equally spaced, the spectrum repeats in the order:
/// S(ν + Q) = −S(ν) and, for real c_s, S(Q − ν) = −conj(S(ν)). The orders 0..⌊Q/2⌋ (the
/// "base band") therefore fix every order: long spectra cost a table look-up per order, and
/// sums over all orders can be done exactly in the slot domain.
/// </remarks>
public static class SlotSpectrum
{
    /// <summary>Number of orders in the base band, ⌊Q/2⌋ + 1 (orders 0..⌊Q/2⌋).</summary>
    public static int BaseBandLength(int slots) => slots / 2 + 1;

    /// <summary>Mechanical angle of the centre of 0-based slot <paramref name="slotIndex"/>, in radians.</summary>
    public static double SlotAngle(int slotIndex, int slots) => 2 * Math.PI * (slotIndex + 0.5) / slots;

    /// <summary>S(ν) directly from the slot values: Horner's rule in ζ = e^(−j2πν/Q), one sin/cos per order.</summary>
    public static Complex Direct(ReadOnlySpan<double> values, int order) => DirectCore(values, order);

    /// <inheritdoc cref="Direct(ReadOnlySpan{double}, int)"/>
    public static Complex Direct(ReadOnlySpan<int> values, int order) => DirectCore(values, order);

    /// <summary>Fills <paramref name="destination"/> (length ⌊Q/2⌋ + 1) with S(0..⌊Q/2⌋).</summary>
    public static void ComputeBaseBand(ReadOnlySpan<double> values, Span<Complex> destination)
    {
        int length = BaseBandLength(values.Length);
        if (destination.Length < length) throw new ArgumentException($"Need {length} entries for {values.Length} slots.", nameof(destination));
        if (values.Length > FftThreshold)
        {
            ComputeBaseBandByFft(values, destination[..length]);
            return;
        }
        for (int order = 0; order < length; order++) destination[order] = DirectCore(values, order);
    }

    /// <summary>Above this slot count the base band comes from one FFT (O(Q log Q)) instead of Q/2 direct sums (O(Q²)).</summary>
    public const int FftThreshold = 96;

    // S(ν) = e^(−jνΔ/2) · DFT_ν(c) with Δ = 2π/Q; MathNet's Matlab convention is the unscaled
    // forward transform with the negative exponent, X_ν = Σ c_s e^(−j2πνs/Q).
    private static void ComputeBaseBandByFft(ReadOnlySpan<double> values, Span<Complex> destination)
    {
        int q = values.Length;
        var buffer = new Complex[q];
        for (int s = 0; s < q; s++) buffer[s] = values[s];
        MathNet.Numerics.IntegralTransforms.Fourier.Forward(buffer, MathNet.Numerics.IntegralTransforms.FourierOptions.Matlab);
        for (int order = 0; order < destination.Length; order++)
            destination[order] = buffer[order] * Complex.FromPolarCoordinates(1, -Math.PI * order / q);
    }

    /// <summary>S(ν) for any order (negative orders give the conjugate) from a base band of a Q-slot distribution.</summary>
    public static Complex FromBaseBand(ReadOnlySpan<Complex> baseBand, int slots, int order)
    {
        if (order < 0) return Complex.Conjugate(FromBaseBand(baseBand, slots, -order));
        int wraps = order / slots;
        int r = order - wraps * slots;
        Complex value = r < baseBand.Length ? baseBand[r] : -Complex.Conjugate(baseBand[slots - r]);
        return (wraps & 1) == 0 ? value : -value;
    }

    private static Complex DirectCore<T>(ReadOnlySpan<T> values, int order) where T : struct, INumberBase<T>
    {
        int q = values.Length;
        if (q == 0) return Complex.Zero;
        // θ_s = (s + ½)Δ, so Σ c_s e^(−jνθ_s) = e^(−jνΔ/2) · Σ c_s ζ^s with ζ = e^(−jνΔ).
        double step = -2 * Math.PI * (order % (2 * q)) / q;
        var (zi, zr) = Math.SinCos(step);
        double ar = 0, ai = 0;
        for (int s = q - 1; s >= 0; s--)
        {
            double r = ar * zr - ai * zi + double.CreateTruncating(values[s]);
            ai = ar * zi + ai * zr;
            ar = r;
        }
        var (hi, hr) = Math.SinCos(step / 2);
        return new Complex(ar * hr - ai * hi, ar * hi + ai * hr);
    }
}
