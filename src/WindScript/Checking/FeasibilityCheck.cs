using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Synthesis;

namespace WindScript.Checking;

/// <summary>
/// Whether the slot, pole and phase counts admit a balanced winding at all, by the star of
/// slots (the same rule and codes as synthesis), with the nearest counts that do.
/// </summary>
internal static class FeasibilityCheck
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        if (c.PhaseCount < 2 || PhaseBelts.ForPhases(c.PhaseCount) is not { } belts) return;
        // The rule is stated for the usual phase shift; a machine with its own shift is judged by the balance checks.
        if (Math.Abs(belts.PhaseShiftDegrees - d.PhaseShiftDegrees) > 1e-9) return;
        int layers = d.Winding.Layers;
        var report = Feasibility.Check(d.Slots, d.Poles, belts, layers);
        if (report.IsFeasible) return;
        var at = d.SlotsSpan != default ? d.SlotsSpan : d.MachineKeywordSpan;
        var descriptor = layers == 1 ? DiagnosticCatalog.NoBalancedSingleLayer : DiagnosticCatalog.NoBalancedWinding;
        c.Diagnostics.Add(descriptor.At(at, $"{d.Slots} slots, {d.Poles} poles and {c.PhaseCount} phases admit no balanced {(layers == 1 ? "single" : "double")}-layer winding: {report.Condition}; {report.NearestText()}")
            with { Related = d.PolesSpan != default ? [new RelatedSpan(d.PolesSpan, "the pole count")] : [] });
    }
}
