using System.Numerics;
using WindScript.Analysis;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>A coil whose fundamental EMF phasor points away from its phase's total: almost always reversed by mistake.</summary>
internal static class OpposingCoilCheck
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        int p = d.PolePairs;
        for (int k = 0; k < c.PhaseCount; k++)
        {
            var total = SlotSpectrum.Direct(c.Spectrum.SlotConductors[k], p);
            if (total.Magnitude < 1e-9) continue;
            foreach (var coil in d.Winding.Coils)
            {
                if (coil.Phase != k) continue;
                var phasor = CoilPhasor(coil, d.Slots, p);
                // Only coils that link the fundamental at all have a direction to judge.
                if (phasor.Magnitude < 1e-6 * coil.Turns) continue;
                double cos = (phasor * Complex.Conjugate(total)).Real / (phasor.Magnitude * total.Magnitude);
                if (cos >= -1e-9) continue;
                var diagnostic = DiagnosticCatalog.OpposingCoil.At(coil.Span,
                    $"this coil of phase {c.PhaseName(k)} ({coil.GoSlot} -> {coil.ReturnSlot}) subtracts from the phase's EMF: it points {Math.Acos(Math.Clamp(cos, -1, 1)) * 180 / Math.PI:0} deg electrical away from the phase's total");
                if (c.Syntax is not null && SourceEdits.FlipPolarity(c.Syntax, coil.Span) is { } fix) diagnostic = diagnostic with { Fix = fix };
                c.Diagnostics.Add(diagnostic);
            }
        }
    }

    /// <summary>The coil's slot spectrum at order ν: its go side minus its return side.</summary>
    private static Complex CoilPhasor(Model.Coil coil, int slots, int order)
    {
        double go = order * SlotSpectrum.SlotAngle(coil.GoSlot - 1, slots);
        double back = order * SlotSpectrum.SlotAngle(coil.ReturnSlot - 1, slots);
        return coil.Turns * coil.Polarity * (Complex.FromPolarCoordinates(1, -go) - Complex.FromPolarCoordinates(1, -back));
    }
}
