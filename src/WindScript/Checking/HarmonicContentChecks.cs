using WindScript.Analysis;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>Sub-harmonics, even harmonics and adjacent orders (unbalanced magnetic pull) of the winding's MMF.</summary>
internal static class HarmonicContentChecks
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        if (c.PhaseCount < 2) return;
        int p = d.PolePairs;
        // The same balanced waves eval reports, to twice the slot count: that covers every
        // sub-harmonic and every even order within the first slot-harmonic period.
        var balanced = MachineAnalysis.BalancedWaves(d, c.Spectrum, 2 * d.Slots);
        if (balanced.WorkingWave <= 0) return;
        var at = PhaseBalanceChecks.WindingKeyword(c);
        var waves = balanced.Waves.ToDictionary(w => w.Order);
        double Relative(int order) => Math.Max(waves[order].Forward, waves[order].Backward);

        var subs = balanced.SubHarmonics;
        if (subs.Length > 0)
            c.Diagnostics.Add(DiagnosticCatalog.SubHarmonics, at,
                $"balanced currents produce sub-harmonic waves of order {string.Join(", ", subs.Take(4))} (working order p = {p}), the largest {subs.Max(Relative):P0} of the working wave");

        var evens = balanced.EvenHarmonics;
        if (evens.Length > 0)
            c.Diagnostics.Add(DiagnosticCatalog.EvenHarmonics, at,
                $"balanced currents produce even electrical harmonics (electrical order {string.Join(", ", evens.Take(4).Select(v => v / p))})");

        if (c.Symmetry.AdjacentOrders)
            c.Diagnostics.Add(DiagnosticCatalog.UnbalancedMagneticPull, at,
                $"the layout repeats only once around the bore, not reversed (winding periodicity 1; machine periodicity t = gcd(Q, p) = {d.Periodicity}), so adjacent orders such as {p} and {p + 1} coexist and pull the rotor sideways");
    }
}
