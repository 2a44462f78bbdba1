using System.Globalization;

namespace WindScript.Review;

/// <summary>How figures read in reviews and reports: up to 5 significant digits, no exponent for machine-sized numbers.</summary>
internal static class FigureFormat
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string Number(double? x)
    {
        if (x is not { } v || !double.IsFinite(v)) return "n/a";
        if (v == 0) return "0";
        int decimals = Math.Clamp(4 - (int)Math.Floor(Math.Log10(Math.Abs(v))), 0, 9);
        double rounded = Math.Round(v, decimals);
        return rounded == 0 ? "0" : rounded.ToString("0." + new string('#', Math.Max(1, decimals)), Inv);
    }

    /// <summary>A winding factor: four decimals.</summary>
    public static string Factor(double? x) => x is { } v ? v.ToString("0.0000", Inv) : "n/a";
}
