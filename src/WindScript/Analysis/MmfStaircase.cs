using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The air-gap MMF F(θ, t) = Σ_k N_k(θ)·i_k(t) at one instant: a zero-mean staircase with one
/// level per slot interval (level i from the centre of slot i to the centre of slot i + 1).
/// </summary>
internal sealed class MmfStaircase
{
    private readonly double[] _levels;

    private MmfStaircase(double time, double[] levels)
    {
        Time = time;
        _levels = levels;
    }

    public double Time { get; }

    public ReadOnlySpan<double> Levels => _levels;

    public int Slots => _levels.Length;

    /// <summary>Largest |F| over the circumference (A-turns).</summary>
    public double Peak
    {
        get
        {
            double peak = 0;
            foreach (double v in _levels) peak = Math.Max(peak, Math.Abs(v));
            return peak;
        }
    }

    public double ValueAt(double theta) => _levels[TurnsFunction.IntervalAt(theta, _levels.Length)];

    /// <summary>The staircase of a drive's currents at <paramref name="time"/> (seconds).</summary>
    public static MmfStaircase At(WindingSpectrum winding, Drive drive, double time)
    {
        return FromCurrents(winding, drive.CurrentsAt(time, winding.Phases), time);
    }

    /// <summary>The staircase for given instantaneous phase currents (A), in phase order.</summary>
    public static MmfStaircase FromCurrents(WindingSpectrum winding, ReadOnlySpan<double> currents, double time = 0)
    {
        int q = winding.Slots;
        var total = new double[q];
        Span<double> phase = q <= 1024 ? stackalloc double[q] : new double[q];
        for (int k = 0; k < winding.Phases && k < currents.Length; k++)
        {
            TurnsFunction.Levels(winding.SlotConductors[k], 1 / winding.Paths, phase);
            for (int i = 0; i < q; i++) total[i] += phase[i] * currents[k];
        }
        return new MmfStaircase(time, total);
    }

    /// <summary>Complex amplitude C of the order-ν harmonic of the staircase of given currents: F_ν(θ) = Re(C·e^(jνθ)).</summary>
    public static Complex Harmonic(WindingSpectrum winding, ReadOnlySpan<double> currents, int order)
    {
        Complex sum = Complex.Zero;
        for (int k = 0; k < winding.Phases && k < currents.Length; k++) sum += winding.TurnsCoefficient(k, order) * currents[k];
        return sum;
    }

    /// <summary>Amplitude (A-turns) of the order-ν harmonic of the staircase of given instantaneous currents.</summary>
    public static double HarmonicAmplitude(WindingSpectrum winding, ReadOnlySpan<double> currents, int order) =>
        Harmonic(winding, currents, order).Magnitude;
}
