namespace WindScript.Numerics;

/// <summary>
/// Integer helpers shared by every stage (text formatting of fractions, the model's periodicity,
/// the star of slots, the sweep): kept apart so that no stage depends on another for them.
/// </summary>
internal static class IntegerMath
{
    /// <summary>Greatest common divisor of |a| and |b| (gcd(0, 0) = 0).</summary>
    public static long Gcd(long a, long b)
    {
        a = Math.Abs(a); b = Math.Abs(b);
        while (b != 0) (a, b) = (b, a % b);
        return a;
    }

    /// <summary>Least common multiple of |a| and |b| (0 when either is 0).</summary>
    public static long Lcm(long a, long b) => a == 0 || b == 0 ? 0 : Math.Abs(a / Gcd(a, b) * b);
}
