using System.Numerics;
using WindScript.Analysis;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>
/// A coil whose fundamental EMF phasor points away from its phase's total: almost always reversed
/// by mistake. The fix reverses it if that alone repairs (re-checked); when the same mistake was
/// made in every phase (the phases still balance), reversing one alone would unbalance the
/// winding, so the fix reverses every such coil together.
/// </summary>
internal static class OpposingCoilCheck
{
    /// <summary>Each offered fix costs one re-check of the file; beyond this many, none is offered.</summary>
    private const int MaxVerifiedFixes = 8;

    public static void Run(CheckContext c)
    {
        var d = c.Design;
        int p = d.PolePairs;
        // e^(−jpθ) of every slot centre, once: a coil's phasor is then two look-ups.
        var unit = new Complex[d.Slots];
        for (int s = 0; s < d.Slots; s++) unit[s] = Complex.FromPolarCoordinates(1, -p * SlotFourier.SlotAngle(s, d.Slots));
        var found = new List<(Model.Coil Coil, Diagnostic Diagnostic, CodeFix? Fix)>();
        for (int k = 0; k < c.PhaseCount; k++)
        {
            var total = SlotFourier.Direct(c.Spectrum.SlotConductors[k], p);
            if (total.Magnitude < 1e-9) continue;
            foreach (var coil in d.Winding.Coils)
            {
                if (coil.Phase != k || c.Culprits.Contains(coil)) continue;
                var phasor = coil.Turns * coil.Polarity * (unit[coil.GoSlot - 1] - unit[coil.ReturnSlot - 1]);
                // Only coils that link the fundamental at all have a direction to judge.
                if (phasor.Magnitude < 1e-6 * coil.Turns) continue;
                double cos = (phasor * Complex.Conjugate(total)).Real / (phasor.Magnitude * total.Magnitude);
                if (cos >= -1e-9) continue;
                var diagnostic = DiagnosticCatalog.OpposingCoil.At(coil.Span,
                    $"this coil of phase {c.PhaseName(k)} ({coil.GoSlot} -> {coil.ReturnSlot}) subtracts from the phase's EMF: it points {Math.Acos(Math.Clamp(cos, -1, 1)) * 180 / Math.PI:0} deg electrical away from the phase's total");
                var fix = c.Syntax is { } tree ? SourceEdits.FlipPolarity(tree, coil.Span) : null;
                found.Add((coil, diagnostic, fix));
            }
        }
        if (found.Count == 0) return;
        var starts = found.Select(f => f.Coil.Span.Start).ToHashSet();
        CodeFix? together = null;
        bool triedTogether = false;
        int verified = 0;
        foreach (var (coil, diagnostic, fix) in found)
        {
            var offered = diagnostic;
            if (c.Syntax is { } tree && fix is not null && !FixVerifier.Verifying && verified < MaxVerifiedFixes)
            {
                verified++;
                int start = coil.Span.Start;
                if (FixVerifier.Repairs(c, tree, fix.Edits, x => x.Code == DiagnosticCatalog.OpposingCoil.Code && x.Span.Start == start))
                    offered = diagnostic with { Fix = fix };
                else if (found.Count > 1 && found.All(f => f.Fix is not null))
                {
                    if (!triedTogether)
                    {
                        triedTogether = true;
                        var edits = found.SelectMany(f => f.Fix!.Edits).ToArray();
                        if (FixVerifier.Repairs(c, tree, edits, x => x.Code == DiagnosticCatalog.OpposingCoil.Code && starts.Contains(x.Span.Start)))
                            together = new CodeFix($"Reverse the {found.Count} coils that work against their phases", edits);
                    }
                    if (together is not null) offered = diagnostic with { Fix = together };
                }
            }
            c.Diagnostics.Add(offered);
        }
    }
}
