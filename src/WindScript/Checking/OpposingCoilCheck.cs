using System.Numerics;
using WindScript.Analysis;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>A coil whose fundamental EMF phasor points away from its phase's total: almost always reversed by mistake.</summary>
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
        for (int s = 0; s < d.Slots; s++) unit[s] = Complex.FromPolarCoordinates(1, -p * SlotSpectrum.SlotAngle(s, d.Slots));
        int verified = 0;
        for (int k = 0; k < c.PhaseCount; k++)
        {
            var total = SlotSpectrum.Direct(c.Spectrum.SlotConductors[k], p);
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
                // Offered only if reversing it leaves no error and no such warning on this coil.
                if (c.Syntax is { } tree && verified < MaxVerifiedFixes && !FixVerifier.Verifying && SourceEdits.FlipPolarity(tree, coil.Span) is { } fix)
                {
                    verified++;
                    int start = coil.Span.Start;
                    if (FixVerifier.Repairs(c, tree, fix.Edits, x => x.Code == DiagnosticCatalog.OpposingCoil.Code && x.Span.Start == start))
                        diagnostic = diagnostic with { Fix = fix };
                }
                c.Diagnostics.Add(diagnostic);
            }
        }
    }
}
