using WindScript.Synthesis;

namespace WindScript.Sweep;

/// <summary>
/// What a sweep covers: every slot count in [SlotsFrom, SlotsTo] and every even pole count in
/// [PolesFrom, PolesTo], with one phase count and layer count, pitches by a rule, and winding
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
    /// <summary>Number of phases m.</summary>
    public int Phases { get; init; } = 3;
    /// <summary>Number of layers (1 or 2).</summary>
    public int Layers { get; init; } = 2;
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
        if (Phases is < 2 or > 64) return $"the phase count must be from 2 to 64, not {Phases}";
        if (Layers is not (1 or 2)) return $"a winding has 1 or 2 layers, not {Layers}";
        if (Orders is < 1 or > 10_000) return $"the number of orders must be from 1 to 10000, not {Orders}";
        return null;
    }
}
