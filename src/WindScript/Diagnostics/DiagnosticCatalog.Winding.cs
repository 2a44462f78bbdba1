namespace WindScript.Diagnostics;

public static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor SlotOutOfRange = new(
        "WS3001", Severity.Error, "Slot number out of range",
        "Slots are numbered from 1 to Q, the machine's slot count, as designers count them. A coil side outside that range lies in no slot. In a loop, wrap(n) brings a slot number back into 1..Q.");

    public static readonly DiagnosticDescriptor CoilSidesCoincide = new(
        "WS3003", Severity.Error, "Coil goes and returns in the same slot",
        "A coil whose go and return sides lie in the same slot links no flux: its conductors cancel and it adds copper, resistance and leakage without any EMF. Its pitch is zero; a coil needs a pitch of at least one slot.");
}
