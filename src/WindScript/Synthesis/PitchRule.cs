using System.Globalization;

namespace WindScript.Synthesis;

/// <summary>
/// How a sweep (or synthesis without an explicit pitch) chooses coil pitches:
/// <c>pole</c> — the longest pitch not exceeding the pole pitch, max(1, ⌊Q/2p⌋), that gives a
/// balanced winding (for a single layer the search continues downwards, then upwards);
/// <c>pole-K</c> — that pitch shortened by K slots; <c>N</c> — exactly N slots;
/// <c>all</c> — every pitch from 1 to the pole pitch.
/// </summary>
public sealed record PitchRule(PitchRuleKind Kind, int Value = 0)
{
    /// <summary>The pole pitch (rounded as synth does).</summary>
    public static readonly PitchRule PolePitch = new(PitchRuleKind.PolePitch);

    /// <summary>Every pitch from 1 slot to the pole pitch.</summary>
    public static readonly PitchRule UpToPolePitch = new(PitchRuleKind.UpToPolePitch);

    /// <summary>A fixed pitch of <paramref name="slots"/> slots.</summary>
    public static PitchRule Fixed(int slots) => new(PitchRuleKind.Fixed, slots);

    /// <summary>The pole pitch shortened by <paramref name="slots"/> slots.</summary>
    public static PitchRule Shortened(int slots) => new(PitchRuleKind.Shortened, slots);

    /// <summary>The longest pitch not exceeding the pole pitch Q/(2p), at least 1.</summary>
    public static int PolePitchSlots(int slots, int poles) => Math.Max(1, slots / poles);

    /// <summary>The pitches to try for one slot/pole pair, ascending (0 stands for "the pole-pitch rule", resolved when laying out).</summary>
    public int Candidates(int slots, int poles, Span<int> destination)
    {
        int pole = PolePitchSlots(slots, poles);
        switch (Kind)
        {
            case PitchRuleKind.PolePitch:
                destination[0] = 0;
                return 1;
            case PitchRuleKind.Shortened:
                if (pole - Value < 1) return 0;
                destination[0] = pole - Value;
                return 1;
            case PitchRuleKind.Fixed:
                if (Value >= slots) return 0;
                destination[0] = Value;
                return 1;
            default:
                int n = Math.Min(pole, destination.Length);
                for (int y = 1; y <= n; y++) destination[y - 1] = y;
                return n;
        }
    }

    /// <summary>The most pitches <see cref="Candidates"/> can return for Q slots.</summary>
    public int MaxCandidates(int maxSlots) => Kind == PitchRuleKind.UpToPolePitch ? Math.Max(1, maxSlots / 2) : 1;

    /// <summary>The rule as written on the command line (pole, pole-K, all, or a number).</summary>
    public override string ToString() => Kind switch
    {
        PitchRuleKind.PolePitch => "pole",
        PitchRuleKind.Shortened => $"pole-{Value.ToString(CultureInfo.InvariantCulture)}",
        PitchRuleKind.Fixed => Value.ToString(CultureInfo.InvariantCulture),
        _ => "all",
    };

    /// <summary>Reads "pole", "pole-K", "all" or a whole number of slots; null with a message otherwise.</summary>
    public static PitchRule? Parse(string text, out string? error)
    {
        error = null;
        text = text.Trim();
        if (text == "pole") return PolePitch;
        if (text == "all") return UpToPolePitch;
        if (text.StartsWith("pole-", StringComparison.Ordinal)
            && int.TryParse(text.AsSpan(5), NumberStyles.None, CultureInfo.InvariantCulture, out int k) && k >= 1)
            return Shortened(k);
        if (int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int y) && y >= 1) return Fixed(y);
        error = $"'{text}' is not a pitch rule: use 'pole' (the longest pitch not exceeding the pole pitch), 'pole-K' (shortened by K slots), 'all' (1 to the pole pitch) or a whole number of slots";
        return null;
    }
}

/// <summary>The kinds of pitch rule.</summary>
public enum PitchRuleKind
{
    /// <summary>The pole pitch.</summary>
    PolePitch,
    /// <summary>The pole pitch shortened by a number of slots.</summary>
    Shortened,
    /// <summary>A fixed number of slots.</summary>
    Fixed,
    /// <summary>Every pitch up to the pole pitch.</summary>
    UpToPolePitch,
}
