using System.Collections.Immutable;

namespace WindScript.Synthesis;

/// <summary>
/// What to synthesise: slot and pole counts, phases, layers and, optionally, the coil pitch,
/// turns per coil and parallel paths. Names default to ones the language accepts.
/// </summary>
public sealed record SynthesisRequest
{
    /// <summary>Number of slots Q.</summary>
    public required int Slots { get; init; }

    /// <summary>Number of poles 2p (even).</summary>
    public required int Poles { get; init; }

    /// <summary>Number of phases m.</summary>
    public int Phases { get; init; } = 3;

    /// <summary>1 (single layer: one coil side per slot) or 2 (double layer: top and bottom).</summary>
    public int Layers { get; init; } = 2;

    /// <summary>Coil pitch in slots; null takes <see cref="PitchRule.PolePitch"/>.</summary>
    public int? Pitch { get; init; }

    /// <summary>Turns of every coil.</summary>
    public int TurnsPerCoil { get; init; } = 1;

    /// <summary>Parallel paths per phase.</summary>
    public int Paths { get; init; } = 1;

    /// <summary>Machine block name; null gives "slots{Q}_poles{2p}".</summary>
    public string? MachineName { get; init; }

    /// <summary>The winding block's name.</summary>
    public string WindingName { get; init; } = "main";

    /// <summary>Phase names in order; default U V W for up to three phases, then A, B, C, ...</summary>
    public ImmutableArray<string> PhaseNames { get; init; } = [];

    /// <summary>The first problem with the request itself (not the physics), or null when it is well formed.</summary>
    public string? Problem()
    {
        if (Slots < 2) return $"the slot count must be at least 2, not {Slots}";
        if (Poles < 2 || Poles % 2 != 0) return $"the pole count must be even and at least 2, not {Poles}";
        if (Phases < 2) return $"a balanced winding needs at least two phases, not {Phases}";
        if (Phases > 64) return $"at most 64 phases are supported, not {Phases}";
        if (Layers is not (1 or 2)) return $"a winding has 1 or 2 layers, not {Layers}";
        if (Pitch is { } y && (y < 1 || y >= Slots)) return $"the coil pitch must be from 1 to {Slots - 1} slots, not {y}";
        if (TurnsPerCoil < 1) return $"turns per coil must be at least 1, not {TurnsPerCoil}";
        if (Paths < 1) return $"the number of parallel paths must be at least 1, not {Paths}";
        if (!PhaseNames.IsDefaultOrEmpty && PhaseNames.Length != Phases) return $"{PhaseNames.Length} phase names were given for {Phases} phases";
        return null;
    }

    /// <summary>The machine name, or one made from the counts.</summary>
    public string ResolvedMachineName => MachineName ?? $"slots{Slots}_poles{Poles}";

    /// <summary>The phase names, or the defaults for the phase count.</summary>
    public ImmutableArray<string> ResolvedPhaseNames => PhaseNames.IsDefaultOrEmpty ? DefaultPhaseNames(Phases) : PhaseNames;

    /// <summary>U V W for up to three phases; A B C ... Z beyond; P1 P2 ... beyond 26.</summary>
    public static ImmutableArray<string> DefaultPhaseNames(int phases)
    {
        if (phases <= 3) return [.. new[] { "U", "V", "W" }.Take(phases)];
        if (phases <= 26) return [.. Enumerable.Range(0, phases).Select(k => ((char)('A' + k)).ToString())];
        return [.. Enumerable.Range(1, phases).Select(k => $"P{k}")];
    }
}
