namespace WindScript.Diagnostics;

// Conductors and slots (#15): WS2080-WS2089 (reading the slot and conductor blocks), WS5030-WS5079 (fit, fill, density, slot geometry).
internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor UnknownChoice = new(
        "WS2080", Severity.Error, "A word the property does not take",
        "Some properties take one of a few words: a slot's 'shape' (open, semi_closed, trapezoid, round_bottom), a conductor's 'material' (copper, aluminium) and 'end_shape' (lap, concentric, tooth_coil). The message lists the words this one takes.");

    public static readonly DiagnosticDescriptor SlotDimensionMissing = new(
        "WS2081", Severity.Error, "Slot description incomplete or contradictory",
        "A slot is described either by a shape with its dimensions (width and depth, and for the shapes under tooth tips the tip height, taper and the machine's slot opening) or by its area alone. A shape without its dimensions cannot be drawn or evaluated; a shape with an area as well says the same thing twice, and the two may disagree.");

    public static readonly DiagnosticDescriptor ConductorDescription = new(
        "WS2082", Severity.Error, "Conductor description incomplete or contradictory",
        "A conductor is round enamelled wire, given by its bare diameter and enamel grade (grade 1, 2 or 3 sets the overall diameter) or by its overall diameter, or rectangular strip, given by width and height (with corner radius and insulation thickness). A block that mixes the two, or lacks what its kind needs, does not say which wire the shop should use. Coil ends have a shape or a stated length, not both. Sources: IEC 60317-0-1 (enamel grades).");

    public static readonly DiagnosticDescriptor WireOutsideGradeTable = new(
        "WS2083", Severity.Error, "Bare diameter outside the enamelled-wire table",
        "The overall diameter of round enamelled wire by grade comes from a table of nominal sizes covering bare diameters from 0.1 mm to 2.5 mm. Outside it, give the wire's 'overall_diameter' from the supplier's data sheet instead of a grade. Sources: IEC 60317-0-1 (maximum overall diameters by grade, from memory).");

    public static readonly DiagnosticDescriptor BeyondPackingLimit = new(
        "WS5030", Severity.Error, "Conductors cannot fit the slot",
        "The insulated conductors need more area than the slot offers inside liner, separator and wedge, beyond what their shape can pack at best: equal round strands fill at most π/(2√3) ≈ 0.907 of a plane (hexagonal packing, the densest packing of equal circles), rectangular strip at most all of it. No winding technique fits them: use thinner wire, fewer turns or strands, or a larger slot. Fill here is the net fill: insulated conductor area over the slot area inside liner, separator and wedge. Sources: common practice (plane geometry: Thue's theorem on circle packing).");

    public static readonly DiagnosticDescriptor FillAboveLimit = new(
        "WS5031", Severity.Warning, "Slot fill above the limit",
        "The net fill (insulated conductor area over the slot area inside liner, separator and wedge) is above the limit the conductor block sets with 'fill_limit', or the default of common practice: 0.75 for random-wound round wire (hand or needle insertion gets hard beyond it) and 0.9 for formed strip. The winding may still fit, but ask the winding shop. Sources: common practice.");

    public static readonly DiagnosticDescriptor StrandWiderThanOpening = new(
        "WS5032", Severity.Error, "Strand wider than the slot opening",
        "Conductors enter the slot through its opening. A round strand's overall diameter, or a strip's insulated narrow side, wider than the opening cannot be inserted. Widen the opening, use thinner strands (more strands in hand), or turn the strip.");

    public static readonly DiagnosticDescriptor CurrentDensityAboveLimit = new(
        "WS5033", Severity.Warning, "Current density above the limit",
        "The rms current density of a drive (phase rms current over the copper area of a path: parallel paths times strands in hand times the strand's area) is above the conductor block's 'density_limit', or 6 A/mm² by default, a figure for totally enclosed fan-cooled machines (air-cooled stator windings run at about 3-8 A/mm²). The thermal design decides; check it with a thermal model and test. Sources: common practice.");

    public static readonly DiagnosticDescriptor ToothWidthNotPositive = new(
        "WS5034", Severity.Error, "No tooth between the slots",
        "At some depth the slots, each as wide as the slot block says, take the whole circumference 2πr/Q: the tooth between two slots has no width there. Check the slot width against the bore, the slot count and the units.");

    public static readonly DiagnosticDescriptor SlotDeeperThanCore = new(
        "WS5035", Severity.Error, "Slot deeper than the core allows",
        "With the core's back diameter given, the slot depth must leave a yoke: depth < (back diameter − bore)/2 for an inner rotor, < (bore − back diameter)/2 when the rotor is outside. A slot as deep as the core has no yoke to carry the flux back.");

    public static readonly DiagnosticDescriptor SlotDimensionsContradict = new(
        "WS5036", Severity.Error, "Slot dimensions contradict each other",
        "The slot's dimensions leave no room for conductors or cannot be drawn: tooth tips, taper and wedge as deep as the slot, a liner as thick as half the width, an opening wider than the slot, or a shape under tooth tips without the machine's 'slot_opening'.");

    public static readonly DiagnosticDescriptor DrawnStrandsDisagree = new(
        "WS5037", Severity.Error, "Strands per slot differ from the slot drawing",
        "The coils put turns × strands in hand conductors into each slot (coil sides summed over layers; parallel paths do not change the count in a slot). The slot block's 'drawn_strands' says how many the slot drawing holds. If the two differ, the shop builds one of them and the turns or the fill are not what was designed. A common cause: counting parallel paths as strands, or turns per coil as conductors per slot in a double-layer winding.");
}
