using System.Globalization;
using System.Text.RegularExpressions;

namespace WindScript.Reporting.Plots;

/// <summary>
/// Reads the instant for a plot: seconds ("0.0025", "2.5 ms", "250 us", "0.0025 s"), or an
/// electrical angle within the drive's period ("90 deg" = a quarter period).
/// </summary>
public static partial class TimeValue
{
    [GeneratedRegex(@"^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([a-zµ]*)\s*$")]
    private static partial Regex Pattern();

    /// <summary>The largest |time| accepted, in seconds: beyond it the phase angle w*t has no digits left.</summary>
    public const double MaxSeconds = 1e6;

    public static bool TryParse(string text, double? periodSeconds, out double seconds, out string error)
    {
        if (!TryParseUnbounded(text, periodSeconds, out seconds, out error)) return false;
        if (Math.Abs(seconds) <= MaxSeconds) return true;
        error = $"the time '{text}' is outside ±{MaxSeconds:0e0} s";
        return false;
    }

    private static bool TryParseUnbounded(string text, double? periodSeconds, out double seconds, out string error)
    {
        seconds = 0;
        error = "";
        var match = Pattern().Match(text);
        if (!match.Success || !double.TryParse(match.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
        {
            error = $"cannot read the time '{text}': expected a number with an optional unit s, ms, us or deg";
            return false;
        }
        switch (match.Groups[2].Value)
        {
            case "" or "s": seconds = value; return true;
            case "ms": seconds = value / 1e3; return true;
            case "us" or "µs": seconds = value / 1e6; return true;
            case "deg":
                if (periodSeconds is not { } period) { error = "an angle needs an AC drive (its period); give the time in s or ms"; return false; }
                seconds = value / 360 * period;
                return true;
            default:
                error = $"unknown time unit '{match.Groups[2].Value}': use s, ms, us or deg";
                return false;
        }
    }
}
