using System.Globalization;
using WindScript.Model;

namespace WindScript.Text;

/// <summary>A ratio in lowest terms as people write it: "3", "2/5", "12/17".</summary>
internal static class FractionText
{
    public static string Of(long numerator, long denominator)
    {
        long g = Math.Max(1, WindScript.Numerics.IntegerMath.Gcd(numerator, denominator));
        long n = numerator / g, d = denominator / g;
        return d == 1 ? n.ToString(CultureInfo.InvariantCulture) : string.Create(CultureInfo.InvariantCulture, $"{n}/{d}");
    }
}
