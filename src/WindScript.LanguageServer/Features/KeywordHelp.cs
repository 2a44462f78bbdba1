namespace WindScript.LanguageServer.Features;

/// <summary>One line of help per reserved word, shown in completion lists and on hover.</summary>
public static class KeywordHelp
{
    private static readonly Dictionary<string, string> Help = new(StringComparer.Ordinal)
    {
        ["machine"] = "machine NAME { ... } — the core: slots, poles, phases and dimensions",
        ["winding"] = "winding NAME { ... } — the stator winding: layers, turns, pitch, paths and its coils",
        ["group"] = "group NAME { ... } — a named coil group inside the winding",
        ["drive"] = "drive NAME { ... } — an operating point: a current waveform per phase",
        ["let"] = "let NAME = VALUE — a named value, visible below it",
        ["slots"] = "slots N — stator slot count Q; as 'slots:' a single-layer slot pattern",
        ["poles"] = "poles N — pole count 2p (even)",
        ["phases"] = "phases U V W — the phase names, in order",
        ["bore"] = "bore LENGTH — stator bore (inner) diameter",
        ["stack"] = "stack LENGTH — axial core length",
        ["gap"] = "gap LENGTH — radial mechanical air gap",
        ["slot_opening"] = "slot_opening LENGTH — slot opening width at the bore (for Carter's coefficient)",
        ["rotor_radius"] = "rotor_radius LENGTH — rotor outer radius (for a thick gap)",
        ["skew"] = "skew N slots | ANGLE — skew of the stator slots; an angle here is mechanical (around the bore): write electrical(ANGLE) to give it in electrical degrees",
        ["phase_shift"] = "phase_shift ANGLE — electrical angle between successive phase axes (default 360/m); write mechanical(ANGLE) to give it around the bore",
        ["gap_flux_density"] = "gap_flux_density T — peak fundamental air-gap flux density (for back-EMF)",
        ["layers"] = "layers 1|2 — coil sides per slot",
        ["turns"] = "turns N — turns per coil",
        ["pitch"] = "pitch N slots — coil pitch, from go side to return side",
        ["paths"] = "paths N — parallel paths per phase",
        ["series_turns"] = "series_turns N — declared series turns per phase (checked against the coils)",
        ["conductors_per_slot"] = "conductors_per_slot N — declared conductors per slot (checked against the coils)",
        ["top"] = "top: U U -W ... — the top-layer pattern, one entry per slot from slot 1",
        ["bottom"] = "bottom: ... — the bottom-layer pattern (else derived from the pitch)",
        ["neutral"] = "neutral — the star point is connected (zero-sequence current may flow)",
        ["for"] = "for k in A .. B step S { ... } — repeat coils over an inclusive range",
        ["in"] = "for k in A .. B — the range of a loop",
        ["step"] = "step S — the step of a loop range",
        ["coil"] = "coil PHASE: GO -> RETURN turns N layer top|bottom — one coil",
        ["layer"] = "layer top|bottom — the layer of a coil's go side",
        ["repeat"] = "repeat N — repeat a slot pattern line N times",
        ["balanced"] = "balanced sine ... sequence U V W — one current per phase, displaced by the phase shift",
        ["sequence"] = "sequence U V W — the order in which the phase currents peak",
        ["sine"] = "sine AMPLITUDE peak|rms at FREQUENCY phase ANGLE — i = Î·cos(ωt + φ)",
        ["dc"] = "dc CURRENT — direct current",
        ["peak"] = "peak — the amplitude is the peak value Î",
        ["rms"] = "rms — the amplitude is the rms value (Î = √2·I)",
        ["at"] = "at FREQUENCY — the frequency of a sinusoid (Hz or rad/s; a speed in rpm is refused: the synchronous frequency is n·p/60)",
        ["phase"] = "phase ANGLE — the time phase angle φ of a sinusoid, an electrical angle",
    };

    public static string? For(string keyword) => Help.GetValueOrDefault(keyword);
}
