namespace WindScript.Review;

/// <summary>
/// When two computed figures count as the same: equal up to rounding (relative 1e-9). The same
/// winding written in another form (a slot pattern or explicit coils, coils in another order)
/// sums its conductors in another order and may differ in the last digits, never more.
/// </summary>
internal static class Tolerance
{
    public const double Relative = 1e-9;

    /// <summary>Below this every figure counts as zero (factors and ratios are of order 1; inductances of order 1e-6 H and up).</summary>
    public const double Absolute = 1e-15;

    public static bool Same(double? a, double? b) =>
        a is null ? b is null : b is not null && Same(a.Value, b.Value);

    public static bool Same(double a, double b) =>
        a == b || Math.Abs(a - b) <= Relative * Math.Max(Math.Abs(a), Math.Abs(b)) + Absolute;
}
