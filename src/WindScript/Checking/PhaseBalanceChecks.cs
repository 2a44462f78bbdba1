using System.Globalization;
using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>Balance: equal series turns, equal fundamental winding factors, axes the phase shift apart.</summary>
internal static class PhaseBalanceChecks
{
    private const double FactorTolerance = 1e-6;
    private const double AngleToleranceDegrees = 0.01;

    public static void Run(CheckContext c)
    {
        if (c.PhaseCount < 2) return;
        var d = c.Design;
        var at = WindingKeyword(c);

        var turns = Enumerable.Range(0, c.PhaseCount).Select(d.SeriesTurns).ToArray();
        if (OddOnesOut(turns, 1e-9) is { } turnsReport)
            c.Diagnostics.Add(DiagnosticCatalog.UnequalSeriesTurns, at, Describe(c, turns, turnsReport, "series turns", v => TurnCountChecks.Format(v)));

        var spectrum = c.Spectrum;
        var factors = new double[c.PhaseCount];
        var axes = new double[c.PhaseCount];
        for (int k = 0; k < c.PhaseCount; k++)
        {
            factors[k] = WindingFactors.Phasor(spectrum.SlotConductors[k], spectrum.SideTurns(k), d.PolePairs).Magnitude;
            axes[k] = WindingFactors.AxisElectricalDegrees(spectrum.SlotConductors[k], d.PolePairs);
        }
        if (OddOnesOut(factors, FactorTolerance) is { } factorReport)
        {
            c.Diagnostics.Add(DiagnosticCatalog.UnequalWindingFactors, at,
                Describe(c, factors, factorReport, "a fundamental winding factor of", v => v.ToString("0.0000", CultureInfo.InvariantCulture)));
            return; // axes of a phase with a different factor are not worth a second message
        }
        if (factors.Any(f => f < 1e-9)) return; // no fundamental at all: nothing to space

        int? direction = WindingDirection(axes, d.PhaseShiftDegrees);
        if (direction is null)
        {
            string list = string.Join(", ", axes.Select((a, k) => $"{c.PhaseName(k)} {Angle(a - axes[0])}"));
            c.Diagnostics.Add(DiagnosticCatalog.AxesNotEvenlySpaced, at,
                $"phase axes relative to {c.PhaseName(0)} are {list} electrical; a balanced winding spaces them {Angle(d.PhaseShiftDegrees)} apart");
        }
    }

    /// <summary>
    /// +1 if each phase's axis lies the phase shift ahead of the previous one in the slot-numbering
    /// direction, -1 if behind, null if the axes are not evenly spaced either way.
    /// </summary>
    public static int? WindingDirection(double[] axes, double shiftDegrees)
    {
        foreach (int sign in new[] { 1, -1 })
        {
            bool ok = true;
            for (int k = 1; k < axes.Length && ok; k++)
                ok = AngleDistance(axes[k] - axes[0], sign * k * shiftDegrees) < AngleToleranceDegrees;
            if (ok) return sign;
        }
        return null;
    }

    private static double AngleDistance(double a, double b)
    {
        double d = ((a - b) % 360 + 360) % 360;
        return Math.Min(d, 360 - d);
    }

    private static string Angle(double degrees)
    {
        double d = ((degrees % 360) + 360) % 360;
        if (d > 180) d -= 360;
        return d.ToString("0.##", CultureInfo.InvariantCulture) + " deg";
    }

    /// <summary>The majority value and the phases that differ from it, or null if all agree.</summary>
    private static (double Common, int[] Odd)? OddOnesOut(double[] values, double tolerance)
    {
        var groups = values.Select((v, k) => (v, k)).GroupBy(x => Math.Round(x.v / Math.Max(tolerance, 1e-12))).OrderByDescending(g => g.Count()).ToArray();
        if (groups.Length <= 1) return null;
        double common = groups[0].First().v;
        return (common, values.Select((v, k) => (v, k)).Where(x => Math.Abs(x.v - common) > tolerance).Select(x => x.k).ToArray());
    }

    private static string Describe(CheckContext c, double[] values, (double Common, int[] Odd) report, string what, Func<double, string> format)
    {
        var odd = report.Odd.Select(k => $"phase {c.PhaseName(k)} has {what} {format(values[k])}");
        var normal = Enumerable.Range(0, values.Length).Where(k => !report.Odd.Contains(k)).Select(c.PhaseName).ToArray();
        string others = normal.Length == 1 ? $"{normal[0]} has" : $"{string.Join(normal.Length == 2 ? " and " : ", ", normal)} have";
        return $"{string.Join("; ", odd)}, {others} {format(report.Common)}";
    }

    internal static TextSpan WindingKeyword(CheckContext c) => c.Design.Winding.KeywordSpan;
}
