namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor GapTooLarge = new(
        "WS5001", Severity.Error, "Air gap not smaller than the bore radius",
        "With the rotor inside, the rotor radius is the bore radius minus the air gap, so the gap must be smaller than the bore radius; otherwise there is no rotor. Check the units (mm against m), whether 'bore' was given as a radius instead of a diameter, and whether the rotor is outside the stator ('rotor outside').");

    public static readonly DiagnosticDescriptor SlotOpeningTooWide = new(
        "WS5002", Severity.Error, "Slot opening not smaller than the slot pitch",
        "The slot pitch at the bore is π·D/Q; a slot opening at least that wide leaves no tooth tip between slots. Carter's coefficient is then meaningless. Sources: Carter 1901; Pyrhonen et al. 2014, ch. 3 (Carter coefficient).");

    public static readonly DiagnosticDescriptor RadiiDisagree = new(
        "WS5003", Severity.Error, "Rotor radius, bore and gap disagree",
        "Both 'gap' and 'rotor_radius' are given, but the bore radius minus the gap (plus the gap when the rotor is outside) is not the rotor radius. Give two of the three, or make them consistent.");

    public static readonly DiagnosticDescriptor RotorPositionUnknown = new(
        "WS5004", Severity.Error, "Rotor position is neither inside nor outside",
        "'rotor' says where the rotor lies relative to the stator: 'rotor inside' (the default: the gap is at the stator's bore) or 'rotor outside' (hub and fan motors: the stator is inside and the gap lies outside its slotted surface, whose diameter 'bore' then gives). Any other word is not a position.");

    public static readonly DiagnosticDescriptor RotorOnWrongSide = new(
        "WS5005", Severity.Error, "Rotor radius on the wrong side of the stator",
        "With the rotor inside, the rotor's gap surface lies inside the bore, so 'rotor_radius' must be smaller than half the bore; with 'rotor outside' it lies outside the stator's slotted surface and must be larger. A rotor radius on the wrong side usually means an outer-rotor machine that does not say 'rotor outside', or a diameter given as a radius. The radial gap is the difference of the two radii. Sources: common practice; Pyrhonen et al. 2014, ch. 3 (gap geometry of inner- and outer-rotor machines).");
}
