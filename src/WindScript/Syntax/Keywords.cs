namespace WindScript.Syntax;

/// <summary>The words the language reserves, by role. A reserved word cannot name anything.</summary>
internal static class Keywords
{
    /// <summary>Blocks: their bodies hold statements.</summary>
    public static readonly IReadOnlySet<string> Blocks = new HashSet<string> { "machine", "winding", "group", "drive" };

    /// <summary>Statements of the form <c>keyword value</c>.</summary>
    public static readonly IReadOnlySet<string> Properties = new HashSet<string>
    {
        // machine
        "slots", "poles", "bore", "stack", "gap", "slot_opening", "rotor_radius", "skew", "phase_shift", "gap_flux_density",
        // winding and group
        "layers", "turns", "pitch", "paths", "series_turns", "conductors_per_slot",
    };

    /// <summary>Layer names of a slot pattern line (<c>slots:</c> is the single-layer form).</summary>
    public static readonly IReadOnlySet<string> PatternLayers = new HashSet<string> { "top", "bottom", "slots" };

    public static readonly IReadOnlySet<string> Flags = new HashSet<string> { "neutral" };

    private static readonly HashSet<string> Others =
    [
        "let", "phases", "for", "in", "step", "coil", "layer", "repeat",
        "balanced", "sequence", "sine", "dc", "peak", "rms", "at", "phase",
    ];

    public static readonly IReadOnlySet<string> All =
        Blocks.Concat(Properties).Concat(PatternLayers).Concat(Flags).Concat(Others).ToHashSet();

    public static bool IsReserved(string word) => All.Contains(word);
}
