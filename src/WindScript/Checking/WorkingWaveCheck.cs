using System.Globalization;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>
/// A winding with no working wave: at mechanical order p (the declared pole pairs) the phases'
/// conductors cancel, so the winding factor there is zero and the machine cannot run as
/// declared. The message names the order where the layout does work (its largest winding
/// factor): a pattern with every '-' forgotten works at twice the poles.
/// </summary>
internal static class WorkingWaveCheck
{
    public static void Report(CheckContext c)
    {
        var d = c.Design;
        int p = d.PolePairs, half = Math.Max(1, d.Slots / 2);
        int best = 1;
        for (int order = 2; order <= half; order++)
            if (c.Spectrum.WindingFactor(0, order) > c.Spectrum.WindingFactor(0, best) + 1e-9) best = order;
        double largest = c.Spectrum.WindingFactor(0, best);
        string subject = c.PhaseCount == 1 ? "the winding" : SameForAll(c, best) ? "the layout" : $"phase {c.PhaseName(0)}";
        string message = largest < BalanceRule.FactorTolerance
            ? $"no working wave at the declared {d.Poles} poles: the coils of every phase cancel at every order"
            : $"no working wave at the declared {d.Poles} poles: the winding factor at mechanical order {p} is {PhaseBalanceChecks.Factor(c.Spectrum.WindingFactor(0, p))}; "
              + $"{subject} works as a {(2 * best).ToString(CultureInfo.InvariantCulture)}-pole winding: its largest winding factor, {PhaseBalanceChecks.Factor(largest)}, is at mechanical order {best}";
        var diagnostic = DiagnosticCatalog.NoWorkingWave.At(PhaseBalanceChecks.WindingKeyword(c), message);
        if (d.PolesSpan != default) diagnostic = diagnostic with { Related = [new RelatedSpan(d.PolesSpan, "the declared pole count")] };
        c.Diagnostics.Add(diagnostic);
    }

    private static bool SameForAll(CheckContext c, int order)
    {
        double f = c.Spectrum.WindingFactor(0, order);
        for (int k = 1; k < c.PhaseCount; k++)
            if (Math.Abs(c.Spectrum.WindingFactor(k, order) - f) > BalanceRule.FactorTolerance) return false;
        return true;
    }
}
