using System.Globalization;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>Dimensions that cannot exist: a gap as wide as the bore radius, a slot opening as wide as the slot pitch.</summary>
internal static class GeometryChecks
{
    public static void Run(CheckContext c)
    {
        var g = c.Design.Geometry;
        var machine = c.Design.MachineSpan;
        var keyword = c.Design.MachineKeywordSpan;
        Text.TextSpan At(Syntax.PropertyName property) => SourceEdits.PropertySpan(c.Syntax, machine, property) ?? keyword;
        string Mm(double metres) => (metres * 1000).ToString("0.###", CultureInfo.InvariantCulture) + " mm";
        if (!g.RotorOutside && g.Gap is { } gap && g.BoreRadius is { } radius && gap >= radius)
            c.Diagnostics.Add(DiagnosticCatalog.GapTooLarge, At(Syntax.PropertyName.Gap),
                $"the air gap ({Mm(gap)}) is not smaller than the bore radius ({Mm(radius)})");
        if (g.SlotOpening is { } opening && g.SlotPitch(c.Design.Slots) is { } pitch && opening >= pitch)
            c.Diagnostics.Add(DiagnosticCatalog.SlotOpeningTooWide, At(Syntax.PropertyName.SlotOpening),
                $"the slot opening ({Mm(opening)}) is not smaller than the slot pitch π·D/Q = {Mm(pitch)}");
        if (g.RotorRadius is { } rr && g.BoreRadius is { } bs && (g.RotorOutside ? rr <= bs : rr >= bs))
        {
            c.Diagnostics.Add(DiagnosticCatalog.RotorOnWrongSide, At(Syntax.PropertyName.RotorRadius), g.RotorOutside
                ? $"the rotor is outside, but its radius ({Mm(rr)}) is not larger than the stator's gap radius ({Mm(bs)})"
                : $"the rotor radius ({Mm(rr)}) is not smaller than the bore radius ({Mm(bs)}); if the rotor is outside the stator, say 'rotor outside'");
            return;
        }
        if (g.Gap is { } gp && g.RotorRadius is { } r && g.BoreRadius is { } br)
        {
            double expected = g.RotorOutside ? br + gp : br - gp;
            if (Math.Abs(expected - r) > 1e-9)
                c.Diagnostics.Add(DiagnosticCatalog.RadiiDisagree, At(Syntax.PropertyName.RotorRadius), g.RotorOutside
                    ? $"bore radius {Mm(br)} plus gap {Mm(gp)} is {Mm(expected)} (rotor outside), but the rotor radius is {Mm(r)}"
                    : $"bore radius {Mm(br)} minus gap {Mm(gp)} is {Mm(expected)}, but the rotor radius is {Mm(r)}");
        }
    }
}
