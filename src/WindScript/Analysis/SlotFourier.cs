using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

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
internal static class SlotFourier
{
    /// <summary>Number of orders in the base band, ⌊Q/2⌋ + 1 (orders 0..⌊Q/2⌋).</summary>
    public static int BaseBandLength(int slots) => slots / 2 + 1;

    /// <summary>Mechanical angle of the centre of 0-based slot <paramref name="slotIndex"/>, in radians.</summary>
    public static double SlotAngle(int slotIndex, int slots) => 2 * Math.PI * (slotIndex + 0.5) / slots;

    /// <summary>S(ν) directly from the slot values (Q multiply-adds; the angles come from a shared table per Q).</summary>
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

    /// <summary>
    /// The base bands of two real distributions at once: one complex FFT of a + jb (the trade's
    /// "two real transforms for one" identity: A_ν = (X_ν + conj X_(Q−ν))/2,
    /// B_ν = (X_ν − conj X_(Q−ν))/(2j)), so a three-phase winding costs two transforms, not three.
    /// </summary>
    public static void ComputeBaseBands(ReadOnlySpan<double> a, ReadOnlySpan<double> b, Span<Complex> destinationA, Span<Complex> destinationB)
    {
        int q = a.Length;
        if (b.Length != q) throw new ArgumentException("Both distributions need the same slot count.", nameof(b));
        if (q <= FftThreshold)
        {
            ComputeBaseBand(a, destinationA);
            ComputeBaseBand(b, destinationB);
            return;
        }
        int length = BaseBandLength(q);
        var buffer = new Complex[q];
        for (int s = 0; s < q; s++) buffer[s] = new Complex(a[s], b[s]);
        MathNet.Numerics.IntegralTransforms.Fourier.Forward(buffer, MathNet.Numerics.IntegralTransforms.FourierOptions.Matlab);
        for (int order = 0; order < length; order++)
        {
            var x = buffer[order];
            var mirror = Complex.Conjugate(buffer[(q - order) % q]);
            var shift = Complex.FromPolarCoordinates(1, -Math.PI * order / q);
            destinationA[order] = (x + mirror) / 2 * shift;
            destinationB[order] = (x - mirror) / new Complex(0, 2) * shift;
        }
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
        // νθ_s = π·ν(2s + 1)/Q: every angle is a multiple of π/Q, read from a table of the 2Q
        // points of the circle (exact to the last bit, and no dependency between slots).
        var (cos, sin) = CircleTable.For(q);
        int circle = 2 * q;
        int nu = (int)(((long)order % circle + circle) % circle);
        int index = nu, step = 2 * nu % circle;
        double re = 0, im = 0;
        // index stays in [0, 2Q) by construction, so the table reads skip bounds checks.
        ref double cos0 = ref MemoryMarshal.GetArrayDataReference(cos);
        ref double sin0 = ref MemoryMarshal.GetArrayDataReference(sin);
        foreach (var value in values)
        {
            if (!T.IsZero(value))
            {
                double c = double.CreateTruncating(value);
                re += c * Unsafe.Add(ref cos0, index);
                im -= c * Unsafe.Add(ref sin0, index);
            }
            index += step;
            if (index >= circle) index -= circle;
        }
        return new Complex(re, im);
    }

    /// <summary>cos and sin of πi/Q for i = 0..2Q−1, built once per slot count and shared (read-only).</summary>
    private static class CircleTable
    {
        private static readonly System.Collections.Concurrent.ConcurrentDictionary<int, (double[] Cos, double[] Sin)> Tables = new();

        public static (double[] Cos, double[] Sin) For(int slots) => Tables.GetOrAdd(slots, static q =>
        {
            var cos = new double[2 * q];
            var sin = new double[2 * q];
            for (int i = 0; i < 2 * q; i++) (sin[i], cos[i]) = Math.SinCos(Math.PI * i / q);
            return (cos, sin);
        });
    }
}
