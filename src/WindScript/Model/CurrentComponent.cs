using WindScript.Text;

namespace WindScript.Model;

/// <summary>
/// One term of a phase current, i(t) = Peak · cos(Omega·t + PhaseAngle). Direct current is
/// Omega = 0 and PhaseAngle = 0, so i = Peak (which may be negative).
/// </summary>
public sealed record CurrentComponent(double Peak, double Omega, double PhaseAngle, TextSpan Span = default)
{
    /// <summary>True for direct current (zero frequency).</summary>
    public bool IsDirect => Omega == 0;

    /// <summary>Frequency in Hz.</summary>
    public double FrequencyHz => Omega / (2 * Math.PI);

    /// <summary>The instantaneous current (A) at <paramref name="time"/> (s): peak·cos(ωt + φ).</summary>
    public double At(double time) => Peak * Math.Cos(Omega * time + PhaseAngle);
}
