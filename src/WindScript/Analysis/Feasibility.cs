using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// Whether Q slots, 2p poles and m phases admit a balanced winding, by the star of slots
/// (N. Bianchi, M. Dai Pre, "Use of the star of slots in designing fractional-slot single-layer
/// synchronous motors", IEE Proc. Electr. Power Appl., 2006), with the failed condition and the
/// nearest feasible slot and pole counts when they do not.
/// </summary>
/// <remarks>
/// The star has Q/t spokes of t phasors each, t = gcd(Q, p). The phases are copies of each other
/// turned by the phase shift φ only if turning the star by φ maps it onto itself, i.e. if a slot
/// shift Δ with p·Δ ≡ Q·φ/360° (mod Q) exists: Q·φ/360° must be a whole multiple of t.
/// For odd m (φ = 360°/m) this is the paper's double-layer condition, Q/(m·t) a whole number.
/// A single-layer winding puts a coil side in every other slot (its go sides; the returns fill
/// the rest), so it needs Q even and the same condition for the star of the Q/2 go sides:
/// Q/(2m·t*) a whole number with t* = gcd(Q/2, p), which is the paper's single-layer condition
/// (t* = t when Q/t is even, t/2 when Q/t is odd). For any phase count the star must also have
/// at least two spokes (p not a multiple of Q), or no coil links flux.
/// </remarks>
public static class Feasibility
{
    /// <summary>Whether Q slots, 2p poles and m phases admit a balanced winding with the given layers, with the condition and the nearest feasible counts.</summary>
    public static FeasibilityReport Check(int slots, int poles, int phases, int layers)
    {
        var belts = PhaseBelts.ForPhases(phases) ?? throw new ArgumentOutOfRangeException(nameof(phases), "at least one phase is needed");
        return Check(slots, poles, belts, layers);
    }

    internal static FeasibilityReport Check(int slots, int poles, PhaseBelts belts, int layers)
    {
        if (slots < 1) throw new ArgumentOutOfRangeException(nameof(slots), "at least one slot is needed");
        if (poles < 2 || poles % 2 != 0) throw new ArgumentOutOfRangeException(nameof(poles), "the pole count must be even and at least 2");
        if (layers is not (1 or 2)) throw new ArgumentOutOfRangeException(nameof(layers), "a winding has 1 or 2 layers");
        bool feasible = IsFeasible(slots, poles / 2, belts, layers);
        string condition = Describe(slots, poles / 2, belts, layers);
        if (feasible) return new FeasibilityReport(true, slots, poles, belts.Phases, layers, condition, null, null, null, null);
        var (slotsBelow, slotsAbove) = NearestSlots(slots, poles, belts, layers);
        var (polesBelow, polesAbove) = NearestPoles(slots, poles, belts, layers);
        return new FeasibilityReport(false, slots, poles, belts.Phases, layers, condition, slotsBelow, slotsAbove, polesBelow, polesAbove);
    }

    /// <summary>The condition alone, without the search for neighbours (cheap: a few integer operations).</summary>
    internal static bool IsFeasible(int slots, int polePairs, PhaseBelts belts, int layers)
    {
        if (slots < 1 || polePairs < 1) return false;
        if (polePairs % slots == 0) return false;   // one spoke: every slot sees the same EMF, no coil links flux
        if (layers == 1) return slots % 2 == 0 && StarTurnsOntoItself(slots / 2, polePairs, belts);
        return StarTurnsOntoItself(slots, polePairs, belts);
    }

    /// <summary>True if turning the star of Q slots by the phase shift maps it onto itself (see remarks).</summary>
    internal static bool StarTurnsOntoItself(int slots, int polePairs, PhaseBelts belts)
    {
        long shift = (long)slots * belts.ShiftNumerator;
        if (shift % belts.ShiftDenominator != 0) return false;
        long t = WindScript.Numerics.IntegerMath.Gcd(slots, polePairs);
        return shift / belts.ShiftDenominator % t == 0;
    }

    /// <summary>
    /// The slot shift Δ (0 ≤ Δ &lt; Q) with p·Δ ≡ Q·φ/360° (mod Q) that carries each phase onto the
    /// next, or −1 if there is none. When several exist (t of them) the smallest is returned.
    /// </summary>
    internal static int PhaseStep(int slots, int polePairs, PhaseBelts belts)
    {
        long shift = (long)slots * belts.ShiftNumerator;
        if (shift % belts.ShiftDenominator != 0) return -1;
        long u = shift / belts.ShiftDenominator % slots;
        long p = polePairs % slots;
        for (int delta = 0; delta < slots; delta++)
            if (p * delta % slots == u) return delta;
        return -1;
    }

    /// <summary>The condition in words, with this machine's numbers ("Q/(m·t) = 9/(3·1) = 3 must be a whole number, ...").</summary>
    internal static string Describe(int slots, int polePairs, PhaseBelts belts, int layers)
    {
        if (polePairs % slots == 0)
            return $"the star of slots needs at least two spokes, Q/t ≥ 2 with t = gcd(Q, p) = gcd({slots}, {polePairs}) = {slots}: every slot sees the same EMF";
        if (layers == 1)
        {
            if (slots % 2 != 0)
                return $"a single-layer winding has one coil side per slot and two per coil, so Q must be even (Q = {slots})";
            long tStar = WindScript.Numerics.IntegerMath.Gcd(slots / 2, polePairs);
            return $"{Quotient(slots, 2, belts, tStar, "t*")} must be a whole number, with t* = gcd(Q/2, p) = gcd({slots / 2}, {polePairs}) = {tStar}";
        }
        long t = WindScript.Numerics.IntegerMath.Gcd(slots, polePairs);
        return $"{Quotient(slots, 1, belts, t, "t")} must be a whole number, with t = gcd(Q, p) = gcd({slots}, {polePairs}) = {t}";
    }

    // "Q/(2·m·t*) = 12/(2·3·2) = 1": the phase shift is 1/d of a turn (d = m, or 4 for two phases in quadrature).
    private static string Quotient(int slots, int factor, PhaseBelts belts, long t, string tName)
    {
        var inv = System.Globalization.CultureInfo.InvariantCulture;
        string d = belts.ShiftDenominator == belts.Phases ? "m" : belts.ShiftDenominator.ToString(inv);
        string k = factor == 1 ? "" : $"{factor}·";
        string shape = belts.ShiftNumerator == 1 ? $"Q/({k}{d}·{tName})" : $"{belts.ShiftNumerator}·Q/({k}{belts.ShiftDenominator}·{tName})";
        string numbers = belts.ShiftNumerator == 1 ? $"{slots}/({k}{belts.ShiftDenominator}·{t})" : $"{belts.ShiftNumerator}·{slots}/({k}{belts.ShiftDenominator}·{t})";
        string value = Text.FractionText.Of((long)slots * belts.ShiftNumerator, factor * belts.ShiftDenominator * t);
        return $"{shape} = {numbers} = {value}";
    }

    /// <summary>The nearest feasible slot counts below and above Q for the same poles and phases.</summary>
    internal static (int? Below, int? Above) NearestSlots(int slots, int poles, PhaseBelts belts, int layers)
    {
        int p = poles / 2;
        int? below = null, above = null;
        for (int q = slots - 1; q >= 1; q--)
            if (IsFeasible(q, p, belts, layers)) { below = q; break; }
        // Q = 2·p·d (an integral-slot winding with q = 1 for 360/m) is always feasible, so the search ends.
        // Counts beyond the limits are not offered: nothing could evaluate them.
        int limit = (int)Math.Min(InputLimits.MaxSlots, (long)slots + 2L * p * belts.ShiftDenominator + 2);
        for (int q = slots + 1; q <= limit; q++)
            if (IsFeasible(q, p, belts, layers)) { above = q; break; }
        return (below, above);
    }

    /// <summary>The nearest feasible pole counts below and above 2p for the same slots and phases (none if no pole count works).</summary>
    internal static (int? Below, int? Above) NearestPoles(int slots, int poles, PhaseBelts belts, int layers)
    {
        int p = poles / 2;
        int? below = null, above = null;
        for (int pp = p - 1; pp >= 1; pp--)
            if (IsFeasible(slots, pp, belts, layers)) { below = 2 * pp; break; }
        // The star depends on p only modulo Q, so one period of p values settles it.
        for (int pp = p + 1; pp <= Math.Min(InputLimits.MaxPoles / 2, (long)p + Math.Max(1, slots)); pp++)
            if (IsFeasible(slots, pp, belts, layers)) { above = 2 * pp; break; }
        return (below, above);
    }
}

/// <summary>
/// The answer of <see cref="Feasibility.Check(int, int, int, int)"/>: whether a balanced winding
/// exists, the condition with this machine's numbers, and (when it does not) the nearest slot
/// counts for the same poles and the nearest pole counts for the same slots that do.
/// </summary>
public sealed record FeasibilityReport(
    bool IsFeasible,
    int Slots,
    int Poles,
    int Phases,
    int Layers,
    string Condition,
    int? SlotsBelow,
    int? SlotsAbove,
    int? PolesBelow,
    int? PolesAbove)
{
    /// <summary>"nearest feasible: 9 or 12 slots with 8 poles; 10 poles with 12 slots", or "" when feasible.</summary>
    public string NearestText()
    {
        if (IsFeasible) return "";
        var parts = new List<string>();
        if (Either(SlotsBelow, SlotsAbove) is { } s) parts.Add($"{s} slots with {Poles} poles");
        if (Either(PolesBelow, PolesAbove) is { } p) parts.Add($"{p} poles with {Slots} slots");
        else parts.Add($"no pole count works with {Slots} slots");
        return "nearest feasible: " + string.Join("; ", parts);
    }

    private static string? Either(int? below, int? above) => (below, above) switch
    {
        ({ } b, { } a) => $"{b} or {a}",
        ({ } b, null) => $"{b}",
        (null, { } a) => $"{a}",
        _ => null,
    };
}
