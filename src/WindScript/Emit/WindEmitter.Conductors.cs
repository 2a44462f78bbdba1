using System.Text;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Emit;

// Conductors and slots (#15): the slot and conductor blocks, written back as the language reads them.
public static partial class WindEmitter
{
    private static void WriteSlotAndConductor(StringBuilder o, WindingDesign d)
    {
        void Mm(PropertyName property, double? metres, bool skipZero = false)
        {
            if (metres is { } v && !(skipZero && v == 0)) Line(o, $"{W(property)} {Number(v * 1000)} mm");
        }
        if (d.Slot is { } s)
        {
            o.Append('\n');
            Open(o, BlockKind.Slot, s.Name);
            if (s.Shape != SlotShape.AreaOnly) Line(o, $"{W(PropertyName.SlotShape)} {Vocabulary.Property(PropertyName.SlotShape).Words[(int)s.Shape - 1]}");
            Mm(PropertyName.SlotWidth, s.Width);
            Mm(PropertyName.SlotBottomWidth, s.BottomWidth);
            Mm(PropertyName.SlotDepth, s.Depth);
            Mm(PropertyName.TipHeight, s.TipHeight, skipZero: true);
            Mm(PropertyName.TipTaper, s.TipTaper, skipZero: true);
            if (s.Area is { } area) Line(o, $"{W(PropertyName.SlotArea)} {Number(area * 1e6)} mm2");
            Mm(PropertyName.Liner, s.Liner, skipZero: true);
            Mm(PropertyName.Separator, s.Separator, skipZero: true);
            Mm(PropertyName.Wedge, s.Wedge, skipZero: true);
            if (s.DrawnStrands is { } n) Line(o, $"{W(PropertyName.DrawnStrands)} {n}");
            o.Append("}\n");
        }
        if (d.Conductor is { } c)
        {
            o.Append('\n');
            Open(o, BlockKind.Conductor, c.Name);
            Mm(PropertyName.BareDiameter, c.BareDiameter);
            if (c.Grade is { } grade) Line(o, $"{W(PropertyName.Grade)} {grade}");
            Mm(PropertyName.OverallDiameter, c.OverallDiameter);
            Mm(PropertyName.StripWidth, c.StripWidth);
            Mm(PropertyName.StripHeight, c.StripHeight);
            Mm(PropertyName.CornerRadius, c.CornerRadius, skipZero: true);
            Mm(PropertyName.Insulation, c.Insulation, skipZero: true);
            if (c.Strands != 1) Line(o, $"{W(PropertyName.Strands)} {c.Strands}");
            Line(o, $"{W(PropertyName.Material)} {(c.Material == ConductorMaterial.Aluminium ? "aluminium" : "copper")}");
            if (c.Temperature is { } t) Line(o, $"{W(PropertyName.Temperature)} {Number(t)} degC");
            Mm(PropertyName.EndExtension, c.EndExtension, skipZero: true);
            if (c.EndShape is { } shape) Line(o, $"{W(PropertyName.EndShape)} {Vocabulary.Property(PropertyName.EndShape).Words[(int)shape]}");
            Mm(PropertyName.EndOverhang, c.EndOverhang);
            Mm(PropertyName.EndLength, c.EndLength);
            if (c.FillLimit is { } f) Line(o, $"{W(PropertyName.FillLimit)} {Number(f)}");
            if (c.DensityLimit is { } j) Line(o, $"{W(PropertyName.DensityLimit)} {Number(j / 1e6)} A/mm2");
            o.Append("}\n");
        }
    }
}
