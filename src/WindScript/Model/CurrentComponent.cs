using WindScript.Text;

namespace WindScript.Model;

/// <summary>
/// One term of a phase current, i(t) = Peak · cos(Omega·t + PhaseAngle). Direct current is
/// Omega = 0 and PhaseAngle = 0, so i = Peak (which may be negative).
/// </summary>
public sealed record CurrentComponent(double Peak, double Omega, double PhaseAngle, TextSpan Span = default)
{
    public bool IsDirect => Omega == 0;

    public double FrequencyHz => Omega / (2 * Math.PI);

    public double At(double time) => Peak * Math.Cos(Omega * time + PhaseAngle);
}
