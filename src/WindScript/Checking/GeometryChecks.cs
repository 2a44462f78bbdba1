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
        if (g.Gap is { } gap && g.BoreRadius is { } radius && gap >= radius)
            c.Diagnostics.Add(DiagnosticCatalog.GapTooLarge, At(Syntax.PropertyName.Gap),
                $"the air gap ({Mm(gap)}) is not smaller than the bore radius ({Mm(radius)})");
        if (g.SlotOpening is { } opening && g.SlotPitch(c.Design.Slots) is { } pitch && opening >= pitch)
            c.Diagnostics.Add(DiagnosticCatalog.SlotOpeningTooWide, At(Syntax.PropertyName.SlotOpening),
                $"the slot opening ({Mm(opening)}) is not smaller than the slot pitch π·D/Q = {Mm(pitch)}");
        if (g.Gap is { } gp && g.RotorRadius is { } r && g.BoreRadius is { } br && Math.Abs(br - gp - r) > 1e-9)
            c.Diagnostics.Add(DiagnosticCatalog.RadiiDisagree, At(Syntax.PropertyName.RotorRadius),
                $"bore radius {Mm(br)} minus gap {Mm(gp)} is {Mm(br - gp)}, but the rotor radius is {Mm(r)}");
    }
}
