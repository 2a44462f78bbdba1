using System.Numerics;

namespace WindScript.Analysis;

/// <summary>
/// Rotating-field theory: the MMF of order ν that currents of one frequency ω produce, split
/// into a forward wave (moving towards increasing θ, the slot-numbering direction) and a
/// backward wave:
/// F_ν(θ, t) = Re(F⁺ e^(j(νθ − ωt))) + Re(F⁻ e^(j(νθ + ωt))),
/// F⁺ = ½ Σ_k C_k(ν)·conj(I_k), F⁻ = ½ Σ_k C_k(ν)·I_k,
/// which follows from Re(a)·Re(b) = ½Re(ab) + ½Re(a·conj(b)). Each wave moves at ω/ν mechanical
/// rad/s. A DC drive (ω = 0) gives a standing wave of amplitude |F⁺ + F⁻|.
/// </summary>
internal static class TravellingWaves
{
    /// <summary>The complex forward and backward amplitudes (A) of order ν for one set of phasors.</summary>
    public static (Complex Forward, Complex Backward) At(WindingSpectrum winding, ReadOnlySpan<Complex> phasors, int order)
    {
        Complex forward = Complex.Zero, backward = Complex.Zero;
        int phases = Math.Min(winding.Phases, phasors.Length);
        for (int k = 0; k < phases; k++)
        {
            var c = winding.TurnsCoefficient(k, order);
            forward += c * Complex.Conjugate(phasors[k]);
            backward += c * phasors[k];
        }
        return (forward / 2, backward / 2);
    }

    /// <summary>A wave of one order and one current frequency, as reported.</summary>
    public static TravellingWave Describe(WindingSpectrum winding, CurrentPhasors currents, int order)
    {
        var (f, b) = At(winding, currents.Phasors.AsSpan(), order);
        double electrical = MachineAnalysis.ElectricalOrder(order, winding.PolePairs);
        if (currents.IsDirect)
            return new TravellingWave(order, electrical, 0, 0, 0, (f + b).Magnitude, 0, 0, WaveKind.Standing);
        double speed = currents.Omega / order;
        double forward = f.Magnitude, backward = b.Magnitude, noise = 1e-12 * Math.Max(forward, backward);
        if (forward < noise) forward = 0;      // cancellation leaves rounding residue, not a wave
        if (backward < noise) backward = 0;
        var kind = Classify(forward, backward);
        // Signed by direction: a backward wave (or an elliptic one whose backward half is larger) moves at −ω/ν.
        if (kind == WaveKind.Backward || (kind == WaveKind.Elliptic && backward > forward)) speed = -speed;
        return new TravellingWave(order, electrical, currents.FrequencyHz, forward, backward, 0,
            speed, Model.CurrentComponent.AsWritten(speed * 60 / (2 * Math.PI)), kind);
    }

    private static WaveKind Classify(double forward, double backward)
    {
        double largest = Math.Max(forward, backward), tolerance = 1e-9 * largest;
        if (Math.Abs(forward - backward) <= tolerance) return WaveKind.Pulsating;
        if (backward <= tolerance) return WaveKind.Forward;
        if (forward <= tolerance) return WaveKind.Backward;
        return WaveKind.Elliptic;
    }
}

/// <summary>How a harmonic of the air-gap MMF moves.</summary>
public enum WaveKind
{
    /// <summary>Only a forward wave (towards increasing slot number).</summary>
    Forward,
    /// <summary>Only a backward wave.</summary>
    Backward,
    /// <summary>Equal forward and backward halves: a wave that pulsates in place (single-phase AC).</summary>
    Pulsating,
    /// <summary>Unequal forward and backward waves.</summary>
    Elliptic,
    /// <summary>A DC drive: the wave stands still.</summary>
    Standing,
}

/// <summary>
/// One MMF harmonic of a drive: mechanical order, electrical order ν/p, current frequency,
/// forward and backward amplitudes (A, peak ampere-turns), the standing amplitude for DC, and the
/// signed mechanical speed: positive for a forward wave (towards higher slot numbers), negative for
/// a backward one; an elliptic wave takes the sign of its larger half, a pulsating wave (equal
/// halves at ±speed) is given as +speed.
/// </summary>
public sealed record TravellingWave(
    int Order,
    double ElectricalOrder,
    double FrequencyHz,
    double Forward,
    double Backward,
    double Standing,
    double SpeedRadPerSecond,
    double SpeedRpm,
    WaveKind Kind);
