using WindScript.Analysis;
using WindScript.Synthesis;

namespace WindScript.Sweep;

/// <summary>
/// The layouts of a sweep, in a fixed order: slots ascending, then poles ascending, then phase
/// count, layer count and pitch ascending; combinations that admit no balanced winding are left out. The enumeration is lazy,
/// so memory stays flat however large the ranges.
/// </summary>
internal static class SweepPlan
{
    /// <summary>Every candidate of the spec (all shards).</summary>
    public static IEnumerable<SweepCandidate> All(SweepSpec spec)
    {
        if (spec.Problem() is { } problem) throw new ArgumentException(problem, nameof(spec));
        var phases = spec.PhaseList;
        var layers = spec.LayerList;
        var belts = phases.Select(m => PhaseBelts.ForPhases(m)!).ToArray();
        var pitches = new int[spec.Pitch.MaxCandidates(spec.SlotsTo)];
        int firstPoles = spec.PolesFrom + spec.PolesFrom % 2;
        for (int q = spec.SlotsFrom; q <= spec.SlotsTo; q++)
            for (int poles = firstPoles; poles <= spec.PolesTo; poles += 2)
                for (int b = 0; b < belts.Length; b++)
                    foreach (int l in layers)
                    {
                        if (!Feasibility.IsFeasible(q, poles / 2, belts[b], l)) continue;
                        int n = spec.Pitch.Candidates(q, poles, pitches);
                        for (int i = 0; i < n; i++) yield return new SweepCandidate(q, poles, pitches[i], phases[b], l);
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
