using WindScript.Analysis;
using WindScript.Synthesis;

namespace WindScript.Sweep;

/// <summary>
/// The layouts of a sweep, in a fixed order: slots ascending, then poles ascending, then pitch
/// ascending; combinations that admit no balanced winding are left out. The enumeration is lazy,
/// so memory stays flat however large the ranges.
/// </summary>
internal static class SweepPlan
{
    /// <summary>Every candidate of the spec (all shards).</summary>
    public static IEnumerable<SweepCandidate> All(SweepSpec spec)
    {
        if (spec.Problem() is { } problem) throw new ArgumentException(problem, nameof(spec));
        var belts = PhaseBelts.ForPhases(spec.Phases)!;
        var pitches = new int[spec.Pitch.MaxCandidates(spec.SlotsTo)];
        int firstPoles = spec.PolesFrom + spec.PolesFrom % 2;
        for (int q = spec.SlotsFrom; q <= spec.SlotsTo; q++)
            for (int poles = firstPoles; poles <= spec.PolesTo; poles += 2)
            {
                if (!Feasibility.IsFeasible(q, poles / 2, belts, spec.Layers)) continue;
                int n = spec.Pitch.Candidates(q, poles, pitches);
                for (int i = 0; i < n; i++) yield return new SweepCandidate(q, poles, pitches[i]);
            }
    }

    /// <summary>The candidates of one shard (a first pass sums the work of all candidates to place the cuts).</summary>
    public static IEnumerable<SweepCandidate> Shard(SweepSpec spec, SweepShard shard)
    {
        if (shard.IsWhole)
        {
            foreach (var c in All(spec)) yield return c;
            yield break;
        }
        long total = TotalWeight(spec);
        long start = 0;
        foreach (var c in All(spec))
        {
            if (shard.Holds(start, total)) yield return c;
            start += c.Weight(spec.Orders);
        }
    }

    public static long TotalWeight(SweepSpec spec)
    {
        long total = 0;
        foreach (var c in All(spec)) total += c.Weight(spec.Orders);
        return total;
    }

    /// <summary>Number of candidates in a shard (for progress reporting).</summary>
    public static long Count(SweepSpec spec, SweepShard shard)
    {
        long n = 0;
        foreach (var _ in Shard(spec, shard)) n++;
        return n;
    }
}
