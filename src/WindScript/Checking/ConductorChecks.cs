using System.Globalization;
using WindScript.Analysis.Conductors;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>
/// Conductors and slots (#15): slot dimensions that contradict each other or the core, strands that
/// cannot pass the opening, conductors that cannot fit, fill and current density above their limits,
/// and strands per slot that differ from the slot drawing.
/// </summary>
internal static class ConductorChecks
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        SlotSection? section = null;
        if (d.Slot is { } slot)
        {
            section = SlotSection.Of(d);
            if (!SlotGeometryHolds(c, slot, section)) section = null;
        }
        var strand = d.Conductor is { } conductor ? Strand.Of(conductor) : null;
        if (d.Conductor is { Grade: { } grade, BareDiameter: { } bare, OverallDiameter: null } wire && strand is null)
            c.Diagnostics.Add(DiagnosticCatalog.WireOutsideGradeTable, At(c, wire.Span, PropertyName.BareDiameter, wire.KeywordSpan),
                $"the enamelled-wire table covers bare diameters from {Mm(EnamelledWire.SmallestBare)} to {Mm(EnamelledWire.LargestBare)}; for {Mm(bare)} (grade {grade}) give 'overall_diameter'");
        if (section is not null && strand is not null) FitChecks(c, section, strand);
        if (strand is not null) DensityChecks(c, strand);
        if (d.Slot is { DrawnStrands: { } drawn } s) DrawnStrandCheck(c, s, drawn);
    }

    private static bool SlotGeometryHolds(CheckContext c, SlotGeometry slot, SlotSection s)
    {
        var d = c.Design;
        int before = c.Diagnostics.Items.Count;
        void Contradiction(PropertyName at, string message) =>
            c.Diagnostics.Add(DiagnosticCatalog.SlotDimensionsContradict, At(c, slot.Span, at, slot.KeywordSpan), message);
        if (s.Shape == SlotShape.AreaOnly) return true;
        if (slot.Width is not { } width || slot.Depth is not { } depth) return false; // reported by the binder
        if (s.Shape != SlotShape.Open)
        {
            if (d.Geometry.SlotOpening is not { } opening)
                Contradiction(PropertyName.SlotShape, $"a {ConductorAnalysis.ShapeWord(s.Shape)} slot has tooth tips, but the machine gives no 'slot_opening'");
            else if (opening > width)
                Contradiction(PropertyName.SlotWidth, $"the slot opening ({Mm(opening)}) is wider than the slot ({Mm(width)}): make the shape 'open' or check the widths");
        }
        if (s.ConductorHeight is not { } h4 || h4 <= 2 * slot.Liner)
            Contradiction(PropertyName.SlotDepth, $"tooth tips ({Mm(s.TipHeight)}), taper ({Mm(s.TipTaper)}), wedge ({Mm(s.Wedge)}) and liner leave no room for conductors in a slot {Mm(depth)} deep");
        if (2 * slot.Liner >= width)
            Contradiction(PropertyName.Liner, $"a liner {Mm(slot.Liner)} thick on each side fills the slot's width of {Mm(width)}");
        if (s.Shape == SlotShape.RoundBottom && s.ArcStart is { } arc && arc < s.ConductorTop)
            Contradiction(PropertyName.SlotDepth, $"the conductor region ({Mm(s.ConductorHeight ?? 0)}) is shallower than the round bottom's radius ({Mm(width / 2)})");
        if (s.Shape == SlotShape.Trapezoid && s.BottomWidth is <= 0)
            Contradiction(PropertyName.SlotDepth, $"with parallel teeth the slot narrows to nothing before its bottom (the slots point inward): give 'bottom_width' or a shallower slot");
        if (c.Diagnostics.Items.Count > before) return false;

        // Against the core: a tooth between the slots, and a yoke behind them.
        // An open slot is as wide at the gap as below; under tooth tips the opening is WS5002's.
        foreach (double depthAt in new[] { s.Shape == SlotShape.Open ? 0 : s.ConductorTop, s.ConductorTop, s.ArcStart ?? depth })
            if (s.ToothWidthAt(depthAt) is { } tooth && tooth <= 0)
            {
                c.Diagnostics.Add(DiagnosticCatalog.ToothWidthNotPositive, At(c, slot.Span, PropertyName.SlotWidth, slot.KeywordSpan),
                    $"at a depth of {Mm(depthAt)} the slot pitch 2πr/Q is {Mm(2 * Math.PI * s.RadiusAt(depthAt)!.Value / d.Slots)} and the slot {Mm(s.Width(depthAt))} wide: the tooth width is {Mm(tooth)}");
                return false;
            }
        if (d.Geometry.BackDiameter is { } back && d.Geometry.BoreDiameter is { } bore)
        {
            double room = d.Geometry.RotorOutside ? (bore - back) / 2 : (back - bore) / 2;
            if (depth >= room)
            {
                c.Diagnostics.Add(DiagnosticCatalog.SlotDeeperThanCore, At(c, slot.Span, PropertyName.SlotDepth, slot.KeywordSpan), room <= 0
                    ? $"the back diameter ({Mm(back)}) leaves no core {(d.Geometry.RotorOutside ? "inside" : "outside")} the {(d.Geometry.RotorOutside ? "stator's gap surface" : "bore")} ({Mm(bore)})"
                    : $"the slot is {Mm(depth)} deep, but the core between the gap surface and the back diameter is only {Mm(room)}: no yoke is left");
                return false;
            }
        }
        return true;
    }

    private static void FitChecks(CheckContext c, SlotSection section, Strand strand)
    {
        var d = c.Design;
        var conductor = d.Conductor!;
        TextSpan wire = At(c, conductor.Span, strand.IsStrip ? PropertyName.StripWidth : d.Conductor!.BareDiameter is null ? PropertyName.OverallDiameter : PropertyName.BareDiameter, conductor.KeywordSpan);
        double? opening = section.Shape == SlotShape.Open ? section.Opening - 2 * section.Liner : section.Opening;
        if (opening is { } b1 && strand.NarrowestWidth > b1)
            c.Diagnostics.Add(DiagnosticCatalog.StrandWiderThanOpening, wire,
                strand.IsStrip
                    ? $"the strip's narrow side with insulation is {Mm(strand.NarrowestWidth)}, wider than the slot opening ({Mm(b1)})"
                    : $"the wire's overall diameter ({Mm(strand.NarrowestWidth)}) is wider than the slot opening ({Mm(b1)}{(section.Shape == SlotShape.Open ? ", inside the liner" : "")})");
        // A strand must lie in the slot: its insulated width within the narrowest width inside the liner.
        if (section.Drawable)
        {
            double narrowest = Math.Min(section.Width(section.ConductorTop), section.BottomWidth ?? section.Width(section.ConductorTop)) - 2 * section.Liner;
            if (section.Shape == SlotShape.RoundBottom) narrowest = section.Width(section.ConductorTop) - 2 * section.Liner;
            double across = strand.IsStrip ? strand.OverallWidth : strand.NarrowestWidth;
            if (across > narrowest)
            {
                c.Diagnostics.Add(DiagnosticCatalog.BeyondPackingLimit, wire,
                    $"the {(strand.IsStrip ? "strip is" : "wire is")} {Mm(across)} wide with insulation, but the slot is {Mm(narrowest)} wide inside the liner");
                return;
            }
        }
        if (ConductorAnalysis.Fill(d, section, strand, conductor) is not { } fill) return;
        string counted = $"{fill.StrandsPerSlot} strands of {Mm2(strand.InsulatedArea)} insulated need {Mm2(fill.InsulatedArea)}";
        if (fill.NetFill > fill.PackingLimit)
            c.Diagnostics.Add(DiagnosticCatalog.BeyondPackingLimit, wire,
                $"{counted}, a net fill of {F(fill.NetFill)} of the {Mm2(fill.NetArea)} inside liner and separator; {(strand.IsStrip ? "strip" : "round strands")} pack at most {F(fill.PackingLimit)}");
        else if (fill.NetFill > fill.FillLimit)
            c.Diagnostics.Add(DiagnosticCatalog.FillAboveLimit,
                conductor.FillLimit is null ? wire : At(c, conductor.Span, PropertyName.FillLimit, conductor.KeywordSpan),
                $"{counted}: a net fill of {F(fill.NetFill)}, above the {(conductor.FillLimit is null ? "common-practice limit" : "limit")} of {F(fill.FillLimit)} for {(strand.IsStrip ? "formed strip" : "random-wound round wire")}");
    }

    private static void DensityChecks(CheckContext c, Strand strand)
    {
        var d = c.Design;
        var conductor = d.Conductor!;
        double limit = conductor.DensityLimit ?? DefaultDensityLimit;
        double copper = d.Winding.Paths * conductor.Strands * strand.BareArea;
        foreach (var drive in d.Drives)
        {
            if (drive.Incomplete) continue;
            double rms = drive.Currents.Select(ConductorAnalysis.Rms).DefaultIfEmpty(0).Max();
            double density = rms / copper;
            if (density > limit)
                c.Diagnostics.Add(DiagnosticCatalog.CurrentDensityAboveLimit, drive.NameSpan.Length > 0 ? drive.NameSpan : drive.Span,
                    $"drive '{drive.Name}' drives {F(rms)} A rms through {d.Winding.Paths} path(s) × {conductor.Strands} strand(s) of {Mm2(strand.BareArea)}: {F(density / 1e6)} A/mm2, above the {(conductor.DensityLimit is null ? "default " : "")}limit of {F(limit / 1e6)} A/mm2");
        }
    }

    /// <summary>6 A/mm²: common practice for air-cooled, totally enclosed machines.</summary>
    public const double DefaultDensityLimit = 6e6;

    private static void DrawnStrandCheck(CheckContext c, SlotGeometry slot, int drawn)
    {
        var counts = ConductorAnalysis.StrandsPerSlot(c.Design);
        var wrong = counts.Select((n, i) => (n, slot: i + 1)).Where(x => x.n != drawn && x.n != 0).ToArray();
        if (wrong.Length == 0) return;
        var first = wrong[0];
        int turns = first.n / Math.Max(1, c.Design.Conductor?.Strands ?? 1);
        c.Diagnostics.Add(DiagnosticCatalog.DrawnStrandsDisagree, At(c, slot.Span, PropertyName.DrawnStrands, slot.KeywordSpan),
            $"the slot drawing holds {drawn} strands, but the coils put {first.n} into slot {first.slot} ({turns} conductors × {c.Design.Conductor?.Strands ?? 1} strands in hand){(wrong.Length > 1 ? $" and differ in {wrong.Length - 1} more slot(s)" : "")}");
    }

    private static TextSpan At(CheckContext c, TextSpan block, PropertyName property, TextSpan fallback) =>
        SourceEdits.PropertySpan(c.Syntax, block, property) ?? fallback;

    private static string Mm(double metres) => (metres * 1000).ToString("0.###", CultureInfo.InvariantCulture) + " mm";
    private static string Mm2(double squareMetres) => (squareMetres * 1e6).ToString("0.###", CultureInfo.InvariantCulture) + " mm2";
    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
