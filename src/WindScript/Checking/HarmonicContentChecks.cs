using WindScript.Analysis;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>Sub-harmonics, even harmonics and adjacent orders (unbalanced magnetic pull) of the winding's MMF.</summary>
internal static class HarmonicContentChecks
{
    // A wave smaller than this fraction of the working wave is rounding, not content.
    private const double Threshold = 1e-6;

    public static void Run(CheckContext c)
    {
        var d = c.Design;
        if (c.PhaseCount < 2) return;
        int p = d.PolePairs;
        var spectrum = c.Spectrum;
        var balanced = CurrentPhasors.Balanced(c.PhaseCount, d.PhaseShiftDegrees * Math.PI / 180);
        double Wave(int order)
        {
            var (f, b) = TravellingWaves.At(spectrum, balanced.Phasors.AsSpan(), order);
            return Math.Max(f.Magnitude, b.Magnitude);
        }
        double working = Wave(p);
        if (working < 1e-12) return;
        var at = PhaseBalanceChecks.WindingKeyword(c);

        var subs = Enumerable.Range(1, p - 1).Where(v => Wave(v) > Threshold * working).ToArray();
        if (subs.Length > 0)
            c.Diagnostics.Add(DiagnosticCatalog.SubHarmonics, at,
                $"balanced currents produce sub-harmonic waves of order {string.Join(", ", subs.Take(4))} (working order p = {p}), the largest {subs.Max(v => Wave(v)) / working:P0} of the working wave");

        // Even electrical orders n = ν/p, within one slot-harmonic period.
        var evens = Enumerable.Range(1, Math.Min(d.Slots, 200)).Select(n => 2 * n * p).Where(v => v <= 2 * d.Slots && Wave(v) > Threshold * working).ToArray();
        if (evens.Length > 0)
            c.Diagnostics.Add(DiagnosticCatalog.EvenHarmonics, at,
                $"balanced currents produce even electrical harmonics (electrical order {string.Join(", ", evens.Take(4).Select(v => v / p))})");

        if (c.Symmetry.AdjacentOrders)
            c.Diagnostics.Add(DiagnosticCatalog.UnbalancedMagneticPull, at,
                $"the layout repeats only once around the bore, not reversed (winding periodicity 1; machine periodicity t = gcd(Q, p) = {d.Periodicity}), so adjacent orders such as {p} and {p + 1} coexist and pull the rotor sideways");
    }
}
