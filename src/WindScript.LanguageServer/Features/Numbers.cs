using System.Globalization;

namespace WindScript.LanguageServer.Features;

/// <summary>Numbers as hover text shows them: invariant culture, a sensible number of digits.</summary>
public static class Numbers
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string Show(double value, int decimals = 4)
    {
        if (double.IsNaN(value) || double.IsInfinity(value)) return value.ToString(Inv);
        double rounded = Math.Round(value, decimals);
        // A small value that is not zero keeps its significant digits (q = 1/25000 is 0.00004, not 0).
        if (rounded == 0 && value != 0) return double.Parse(value.ToString("G3", Inv), Inv).ToString("0.#################", Inv);
        return (rounded == 0 ? 0 : rounded).ToString("0." + new string('#', decimals), Inv);
    }

    public static string Degrees(double radians) => Show(radians * 180 / Math.PI, 2) + "°";

    /// <summary>A ratio as a reduced fraction ("7/9"), or a whole number.</summary>
    public static string Fraction(long numerator, long denominator) => Text.FractionText.Of(numerator, denominator);
}
