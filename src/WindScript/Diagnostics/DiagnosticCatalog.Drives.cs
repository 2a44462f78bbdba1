namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor SequenceAgainstWinding = new(
        "WS4001", Severity.Warning, "Drive sequence runs against the winding",
        "The phases' currents peak in an order opposite to the order of their axes around the bore, so the fundamental field rotates backwards (towards decreasing slot numbers). Swapping two supply phases reverses a machine; if reverse rotation is intended, write the phases in that order on purpose and ignore this. Sources: Fitzgerald et al. 2003, ch. 4 (rotating fields).");

    public static readonly DiagnosticDescriptor CurrentsDoNotSumToZero = new(
        "WS4002", Severity.Error, "Phase currents do not sum to zero",
        "Without a connected neutral (star point), Kirchhoff's current law forces the phase currents to sum to zero at every instant. A drive that does not is impossible as written; add 'neutral' to the drive if the star point is connected (zero-sequence current then flows in the neutral), or correct the currents.");

    public static readonly DiagnosticDescriptor UnequalPhaseCurrents = new(
        "WS4003", Severity.Warning, "Phases differ in amplitude or frequency",
        "The alternating currents of the phases differ in amplitude or in frequency content. Unbalanced currents produce a backward-rotating field besides the forward one (symmetrical components), with torque pulsation and extra losses. DC-only drives (resistance or standstill tests) are exempt.");

    public static readonly DiagnosticDescriptor SpeedAsFrequency = new(
        "WS4004", Severity.Error, "A speed written as a current's frequency",
        "'rpm' measures how fast the rotor turns, not how often a phase current alternates. A sine's 'at' takes the current's frequency (Hz or rad/s). The two are tied by the pole pairs: the synchronous speed is n = 60 f / p rpm, so the frequency that turns a 2p-pole field at n rpm is f = n p / 60 Hz. Read as a frequency, 750 rpm would silently become 12.5 Hz; the fix writes the synchronous frequency at the machine's pole count instead. Sources: common practice; Fitzgerald et al. 2003, ch. 4 (synchronous speed).");
}
