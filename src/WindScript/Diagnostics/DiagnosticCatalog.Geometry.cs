namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor GapTooLarge = new(
        "WS5001", Severity.Error, "Air gap not smaller than the bore radius",
        "The rotor radius is the bore radius minus the air gap, so the gap must be smaller than the bore radius; otherwise there is no rotor. Check the units (mm against m) and whether 'bore' was given as a radius instead of a diameter.");

    public static readonly DiagnosticDescriptor SlotOpeningTooWide = new(
        "WS5002", Severity.Error, "Slot opening not smaller than the slot pitch",
        "The slot pitch at the bore is π·D/Q; a slot opening at least that wide leaves no tooth tip between slots. Carter's coefficient (F. W. Carter, 1901; Pyrhonen et al., ch. 3) is then meaningless.");

    public static readonly DiagnosticDescriptor RadiiDisagree = new(
        "WS5003", Severity.Error, "Rotor radius, bore and gap disagree",
        "Both 'gap' and 'rotor_radius' are given, but the bore radius minus the gap is not the rotor radius. Give two of the three, or make them consistent.");
}
