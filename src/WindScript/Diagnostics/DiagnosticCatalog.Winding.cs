namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor SlotOutOfRange = new(
        "WS3001", Severity.Error, "Slot number out of range",
        "Slots are numbered from 1 to Q, the machine's slot count, as designers count them. A coil side outside that range lies in no slot. In a loop, wrap(n) brings a slot number back into 1..Q.");

    public static readonly DiagnosticDescriptor CoilSidesCoincide = new(
        "WS3003", Severity.Error, "Coil goes and returns in the same slot",
        "A coil whose go and return sides lie in the same slot links no flux: its conductors cancel and it adds copper, resistance and leakage without any EMF. Its pitch is zero; a coil needs a pitch of at least one slot.");

    public static readonly DiagnosticDescriptor LayerOverfilled = new(
        "WS3002", Severity.Error, "More coil sides in a slot than layers",
        "Each layer of a slot holds one coil side. Two coil sides in the same slot and layer cannot be built (they would occupy the same place) and usually mean a coil was written twice or with a wrong slot or layer. A double-layer winding has a top and a bottom side in every slot; a single-layer winding one side per slot.");

    public static readonly DiagnosticDescriptor PhaseSidesDoNotCancel = new(
        "WS3004", Severity.Error, "A phase's coil sides do not sum to zero",
        "Every coil has a go side and a return side carrying opposite conductors, so the signed conductors of a phase add up to zero around the bore. A slot pattern whose '+' and '-' entries of one phase do not balance cannot be made of coils: a side is missing, extra or of the wrong sign. (The zero sum is also what makes the turns function periodic: Ampere's law around the bore.)");

    public static readonly DiagnosticDescriptor SeriesTurnsMismatch = new(
        "WS3005", Severity.Error, "Declared series turns disagree with the coils",
        "The winding declares 'series_turns N', but the coils give a different number of series turns per phase: N_ph = (sum of the turns of the phase's coils) / (parallel paths). For a double-layer winding of Q coils of N_c turns this is Q·N_c/(m·a). The declared value is what nameplate, EMF and inductance estimates use, so it must match the coils. Sources: common practice.");

    public static readonly DiagnosticDescriptor PathsDoNotDivideCoils = new(
        "WS3006", Severity.Error, "Parallel paths do not divide the coils",
        "A phase with a parallel paths needs its coils split into a groups of equal size; if a does not divide the number of coils of the phase, the paths have different numbers of turns, different EMFs, and circulating currents flow between them.");

    public static readonly DiagnosticDescriptor PathsUnequalEmf = new(
        "WS3007", Severity.Error, "Parallel paths would carry circulating currents",
        "Parallel paths must have equal EMF phasors, at every harmonic, or currents circulate between them and heat the winding. That needs the phase to consist of a identical sections: the number of parallel paths must divide the winding's periodicity t_w (the number of identical repeats of the layout around the bore), or 2·t_w when the layout also repeats reversed every half period. Sources: Pyrhonen et al. 2014, ch. 2 (the largest number of parallel paths).");

    public static readonly DiagnosticDescriptor UnequalSeriesTurns = new(
        "WS3008", Severity.Error, "Phases have unequal series turns",
        "A balanced winding gives every phase the same number of series turns; otherwise balanced voltages drive unbalanced currents, producing a backward-rotating field, extra losses and torque pulsation at twice the supply frequency.");

    public static readonly DiagnosticDescriptor UnequalWindingFactors = new(
        "WS3009", Severity.Error, "Phases have unequal fundamental winding factors",
        "The fundamental winding factor k_w1 = |sum of the coil-side phasors| / (number of conductors) measures how well a phase's conductors add up at the working order p. Phases with different k_w1 have different EMFs and MMF amplitudes: the winding is unbalanced. Sources: Pyrhonen et al. 2014, ch. 2 (winding factors).");

    public static readonly DiagnosticDescriptor AxesNotEvenlySpaced = new(
        "WS3010", Severity.Error, "Phase axes are not evenly spaced",
        "The magnetic axes of the phases (where each phase's fundamental turns function peaks) must lie the phase shift apart — 360/m electrical degrees unless the machine says otherwise — for balanced currents to produce a pure forward-rotating field. Sources: Fitzgerald et al. 2003, ch. 4 (rotating MMF of a polyphase winding).");

    public static readonly DiagnosticDescriptor SubHarmonics = new(
        "WS3012", Severity.Info, "Sub-harmonic MMF waves",
        "The air-gap MMF contains waves with fewer pole pairs than the working wave (mechanical order below p). This is a property of many fractional-slot windings (e.g. 12 slots, 10 poles), legal but noteworthy: sub-harmonics travel at high speed relative to the rotor and induce rotor and magnet eddy-current losses, and add differential leakage. Sources: Pyrhonen et al. 2014, ch. 2 and 4 (space harmonics, differential leakage).");

    public static readonly DiagnosticDescriptor EvenHarmonics = new(
        "WS3013", Severity.Info, "Even-order MMF harmonics",
        "The air-gap MMF contains even electrical orders (2p, 4p, ...). Windings that repeat reversed every pole pitch have only odd orders; even orders appear in many fractional-slot windings and in asymmetric layouts. They add differential leakage and torque ripple; in an integral-slot winding they usually point to a layout mistake.");

    public static readonly DiagnosticDescriptor UnbalancedMagneticPull = new(
        "WS3014", Severity.Warning, "Adjacent MMF orders: unbalanced magnetic pull",
        "The layout repeats only once around the bore and not reversed over half a turn (winding periodicity 1, typical when t = gcd(Q, p) = 1, e.g. 9 slots and 8 poles), so MMF waves of adjacent orders ν and ν+1 coexist. Their product has a one-cycle component: a net radial force that rotates with the field and pulls the rotor sideways — noise, vibration and bearing load.");

    public static readonly DiagnosticDescriptor OpposingCoil = new(
        "WS3015", Severity.Warning, "A coil works against its phase",
        "The coil's EMF phasor at the working order points more than 90 degrees away from the phase's total: it subtracts from the phase's EMF and MMF instead of adding to them. This is almost always a coil with the wrong polarity (go and return swapped). The fix reverses it.");

    public static readonly DiagnosticDescriptor ConductorsPerSlotMismatch = new(
        "WS3016", Severity.Error, "Declared conductors per slot disagree with the coils",
        "The winding declares 'conductors_per_slot N', but some slots hold a different number of conductors (the turns of every coil side in the slot, all layers and phases). The slot fill, current density and insulation design depend on this number.");

    public static readonly DiagnosticDescriptor PhaseNotWound = new(
        "WS3017", Severity.Error, "A declared phase has no coils",
        "Every phase the machine declares must be wound: a phase without coils carries no current and makes no field, so the machine runs as an unbalanced winding of the remaining phases (or not at all). Usually a group or a pattern line was left out, or a phase name was mistyped in the coils. A symmetric m-phase winding has m identical phases shifted by the phase shift. Sources: Pyrhonen et al. 2014, ch. 2 (symmetric windings).");

    public static readonly DiagnosticDescriptor NoWorkingWave = new(
        "WS3018", Severity.Error, "No working wave at the declared pole count",
        "A winding for 2p poles must make an air-gap wave at mechanical order p (p pole pairs). Its winding factor there, k_w = |sum of the coil-side phasors at order p| / (number of conductors), is zero when the phases' conductors cancel at that order: the winding then works, if at all, as a machine of another pole count and will not run as declared. The message names the order with the largest winding factor, where the layout does work. The classic cause is a slot pattern with every '-' forgotten: all coil sides of a phase carry the same sign, and the layout repeats every pole pair instead of every pole, doubling the working pole count. Sources: Pyrhonen et al. 2014, ch. 2 (winding factors and space harmonics).");

    public static readonly DiagnosticDescriptor DeclaredPitchContradicted = new(
        "WS3019", Severity.Warning, "Declared pitch contradicted by the coils",
        "The winding declares 'pitch y slots', but some of its explicit coils span a different number of slots (counted the short way round the bore). The declaration is what a reader, the closed-form pitch factor k_p = sin(y/tau * pi/2) and the slot patterns take for the winding, so it must agree with the coils: correct the coils or the declaration. Coils of a group are judged by the group's own pitch. Sources: Pyrhonen et al. 2014, ch. 2 (pitch factor).");
}
