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

    /// <summary>
    /// Frequency in Hz, as written: ω is held in rad/s, and ω/2π is rounded to 15 significant
    /// digits so that "60 Hz" comes back as 60, not 59.99999999999999 (a value written with up to
    /// 15 digits survives the round trip exactly).
    /// </summary>
    public double FrequencyHz => AsWritten(Omega / (2 * Math.PI));

    /// <summary>A value converted back to the unit it was written in, without the conversion's last-digit noise.</summary>
    public static double AsWritten(double value) =>
        double.IsFinite(value) && value != 0
            ? double.Parse(value.ToString("G15", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture)
            : value;

    /// <summary>The instantaneous current (A) at <paramref name="time"/> (s): peak·cos(ωt + φ).</summary>
    public double At(double time) => Peak * Math.Cos(Omega * time + PhaseAngle);
}
