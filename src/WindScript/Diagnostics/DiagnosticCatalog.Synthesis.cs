namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor NoBalancedWinding = new(
        "WS6001", Severity.Error, "No balanced winding for these slot, pole and phase counts",
        "A balanced m-phase winding has phases that are identical copies of each other, displaced by the phase shift (360/m electrical degrees). " +
        "In the star of slots the Q slot EMF phasors lie on Q/t spokes of t phasors each, with t = gcd(Q, p) the machine periodicity; the phases " +
        "can be copies of each other only if turning the star by the phase shift maps it onto itself, which for three or any odd number of phases " +
        "is the condition that Q/(m·t) is a whole number. Pick slot and pole counts that satisfy it (the message lists the nearest ones). " +
        "Sources: Bianchi and Dai Pre 2006.");

    public static readonly DiagnosticDescriptor NoBalancedSingleLayer = new(
        "WS6002", Severity.Error, "No balanced single-layer winding for these slot, pole and phase counts",
        "A single-layer winding holds one coil side per slot, so it has Q/2 coils and needs an even slot count; its go sides take every " +
        "other slot and must themselves form a balanced star. For an odd number of phases the condition is that Q/(2·m·t*) is a whole " +
        "number with t* = gcd(Q/2, p) (t* = t when Q/t is even and t/2 when Q/t is odd). A double-layer winding needs only Q/(m·t) to be whole, " +
        "so many combinations that fail here work with two layers. " +
        "Sources: Bianchi and Dai Pre 2006.");

    public static readonly DiagnosticDescriptor PitchNotBalanced = new(
        "WS6003", Severity.Error, "No balanced winding with this coil pitch",
        "In a single-layer winding with every coil of pitch y, the go and return sides alternate along the chain of slots s, s + y, s + 2y, ...; " +
        "that chain closes after Q/gcd(Q, y) slots, which must be even, and the go sides it selects must form a balanced star of slots. " +
        "The message lists the pitches that work for these slot and pole counts. A double-layer winding accepts any pitch. " +
        "Sources: Bianchi and Dai Pre 2006 (star of slots); common practice (the chain argument).");

    public static readonly DiagnosticDescriptor PitchLinksNoFlux = new(
        "WS6004", Severity.Error, "The coil pitch links no working flux",
        "A coil whose span y is a whole number of pole pairs (y·p a multiple of Q) has its two sides under poles of the same polarity: " +
        "the EMFs of its sides cancel and its pitch factor sin(y·p·π/Q) is zero, so the winding makes no working field. " +
        "Choose a pitch near the pole pitch Q/(2p). Sources: Pyrhonen et al. 2014, ch. 2 (pitch factor).");
}
