namespace WindScript.Analysis.Conductors;

/// <summary>
/// The overall diameter of round enamelled wire from its bare diameter and enamel grade: the
/// maximum overall diameters of the nominal sizes after IEC 60317-0-1 (grades 1, 2, 3), FROM MEMORY
/// (approximate to a few µm; check the supplier's data sheet), linearly interpolated in the
/// enamel build between sizes. Bare diameters outside 0.1..2.5 mm are not covered.
/// </summary>
internal static class EnamelledWire
{
    public const double SmallestBare = 0.100e-3, LargestBare = 2.500e-3;

    // bare, grade 1, grade 2, grade 3 (mm): maximum overall diameters, from memory.
    private static readonly double[][] Table =
    [
        [0.100, 0.117, 0.125, 0.132],
        [0.200, 0.226, 0.239, 0.252],
        [0.250, 0.281, 0.297, 0.312],
        [0.315, 0.349, 0.367, 0.384],
        [0.400, 0.439, 0.459, 0.479],
        [0.500, 0.544, 0.566, 0.587],
        [0.630, 0.678, 0.704, 0.729],
        [0.800, 0.855, 0.884, 0.913],
        [1.000, 1.062, 1.093, 1.124],
        [1.250, 1.316, 1.349, 1.381],
        [1.600, 1.670, 1.706, 1.741],
        [2.000, 2.074, 2.112, 2.149],
        [2.500, 2.578, 2.618, 2.658],
    ];

    /// <summary>The overall diameter (m) of a bare diameter (m) and grade 1..3, or null outside the table.</summary>
    public static double? OverallDiameter(double bare, int grade)
    {
        if (grade is < 1 or > 3) return null;
        double mm = bare * 1e3;
        if (mm < Table[0][0] - 1e-9 || mm > Table[^1][0] + 1e-9) return null;
        for (int i = 1; i < Table.Length; i++)
        {
            var (lo, hi) = (Table[i - 1], Table[i]);
            if (mm > hi[0] + 1e-12) continue;
            double t = (mm - lo[0]) / (hi[0] - lo[0]);
            double build = (lo[grade] - lo[0]) + t * ((hi[grade] - hi[0]) - (lo[grade] - lo[0]));
            return (mm + build) * 1e-3;
        }
        return null;
    }
}
