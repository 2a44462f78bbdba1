using WindScript.Synthesis;

namespace WindScript.Sweep;

/// <summary>
/// What a sweep covers: every slot count in [SlotsFrom, SlotsTo] and every even pole count in
/// [PolesFrom, PolesTo], with one or several phase and layer counts, pitches by a rule, and winding
/// factors to electrical order <see cref="Orders"/>.
/// </summary>
public sealed record SweepSpec
{
    /// <summary>Lowest slot count swept.</summary>
    public required int SlotsFrom { get; init; }
    /// <summary>Highest slot count swept.</summary>
    public required int SlotsTo { get; init; }
    /// <summary>Lowest pole count swept (odd values are skipped).</summary>
    public required int PolesFrom { get; init; }
    /// <summary>Highest pole count swept.</summary>
    public required int PolesTo { get; init; }
    /// <summary>Number of phases m (when <see cref="PhaseCounts"/> is not given).</summary>
    public int Phases { get; init; } = 3;
    /// <summary>Number of layers, 1 or 2 (when <see cref="LayerCounts"/> is not given).</summary>
    public int Layers { get; init; } = 2;
    /// <summary>Several phase counts in one sweep (e.g. 3, 5, 6); null means just <see cref="Phases"/>.</summary>
    public IReadOnlyList<int>? PhaseCounts { get; init; }
    /// <summary>Several layer counts in one sweep (1 and 2); null means just <see cref="Layers"/>.</summary>
    public IReadOnlyList<int>? LayerCounts { get; init; }
    /// <summary>The phase counts swept, ascending and without repeats (the order records come in for each slot and pole count).</summary>
    public IReadOnlyList<int> PhaseList => (PhaseCounts ?? [Phases]).Distinct().Order().ToArray();
    /// <summary>The layer counts swept, ascending and without repeats.</summary>
    public IReadOnlyList<int> LayerList => (LayerCounts ?? [Layers]).Distinct().Order().ToArray();
    /// <summary>Which coil pitches are laid out.</summary>
    public PitchRule Pitch { get; init; } = PitchRule.PolePitch;

    /// <summary>Winding factors are reported at electrical orders 1..Orders (mechanical orders p..Orders·p).</summary>
    public int Orders { get; init; } = 49;

    /// <summary>The first problem with the spec, or null.</summary>
    public string? Problem()
    {
        if (SlotsFrom < 2) return $"the slot range must start at 2 or more, not {SlotsFrom}";
        if (SlotsTo < SlotsFrom) return $"the slot range {SlotsFrom}..{SlotsTo} is empty";
        if (SlotsTo > 100_000) return "at most 100000 slots";
        if (PolesFrom < 2) return $"the pole range must start at 2 or more, not {PolesFrom}";
        if (PolesTo < PolesFrom) return $"the pole range {PolesFrom}..{PolesTo} is empty";
        if (PolesTo > 200_000) return "at most 200000 poles";
        if (PolesFrom == PolesTo && PolesFrom % 2 != 0) return $"the pole count must be even, not {PolesFrom}";
        if (PhaseCounts is { Count: 0 } || LayerCounts is { Count: 0 }) return "the list of phase or layer counts is empty";
        foreach (int m in PhaseList)
            if (m is < 2 or > 64) return $"the phase count must be from 2 to 64, not {m}";
        foreach (int layers in LayerList)
            if (layers is not (1 or 2)) return $"a winding has 1 or 2 layers, not {layers}";
        if (Orders is < 1 or > 10_000) return $"the number of orders must be from 1 to 10000, not {Orders}";
        return null;
    }
}
