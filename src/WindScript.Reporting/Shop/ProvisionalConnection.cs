using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Reporting.Shop;

/// <summary>
/// TEMPORARY, to be replaced by the core's connection model (issue #14 items 1-4) once it lands:
/// a stand-in connection so the sheet can be drawn from the coil layout alone. It groups coils
/// that lie in consecutive slots (cyclically) with the same phase and polarity, splits each phase's
/// groups into the winding's parallel paths in slot order, joins the path ends at U1/U2-style
/// marks (phase name + 1/2), stars the finishes of three or more phases, and takes the direction of
/// rotation from the order of the phase axes. It derives nothing the checker relies on.
/// </summary>
internal static class ProvisionalConnection
{
    public sealed record Group(int Phase, IReadOnlyList<int> Coils, int Polarity);

    public sealed record Result(IReadOnlyList<Group> Groups, IReadOnlyList<IReadOnlyList<int>> PathsOfPhase, int PathCount, bool Star, int SlotDirection);

    /// <summary><paramref name="order"/>: indices into the winding's coils, in shop numbering order.</summary>
    public static Result Derive(WindingDesign d, IReadOnlyList<int> order)
    {
        var coils = d.Winding.Coils;
        var groups = new List<Group>();
        for (int phase = 0; phase < d.Phases.Length; phase++)
        {
            var mine = order.Where(i => coils[i].Phase == phase).ToList();
            var runs = new List<List<int>>();
            foreach (int i in mine)
            {
                if (runs.Count > 0 && Continues(coils[runs[^1][^1]], coils[i], d.Slots)) runs[^1].Add(i);
                else runs.Add([i]);
            }
            // The last run continues into the first one across slot Q -> 1.
            if (runs.Count > 1 && Continues(coils[runs[^1][^1]], coils[runs[0][0]], d.Slots))
            {
                runs[^1].AddRange(runs[0]);
                runs.RemoveAt(0);
            }
            groups.AddRange(runs.Select(r => new Group(phase, r, coils[r[0]].Polarity)));
        }

        int paths = Math.Max(1, d.Winding.Paths);
        var pathsOfPhase = new List<IReadOnlyList<int>>();
        for (int phase = 0; phase < d.Phases.Length; phase++)
        {
            var mine = Enumerable.Range(0, groups.Count).Where(g => groups[g].Phase == phase).ToList();
            int per = mine.Count % paths == 0 ? mine.Count / paths : mine.Count;
            for (int start = 0; start < mine.Count; start += Math.Max(1, per)) pathsOfPhase.Add(mine.Skip(start).Take(Math.Max(1, per)).ToList());
        }
        return new Result(groups, pathsOfPhase, paths, d.Phases.Length >= 3, SlotDirection(d));
    }

    private static bool Continues(Coil previous, Coil next, int slots) =>
        previous.Polarity == next.Polarity && (next.GoSlot - previous.GoSlot + slots) % slots == 1;

    private static int SlotDirection(WindingDesign d)
    {
        if (d.Phases.Length < 2) return 0;
        Span<int> summed = stackalloc int[d.Slots];
        WindingFactors.SumLayers(d.Conductors, 0, summed);
        double first = WindingFactors.AxisElectricalDegrees(summed, d.PolePairs);
        WindingFactors.SumLayers(d.Conductors, 1, summed);
        double second = WindingFactors.AxisElectricalDegrees(summed, d.PolePairs);
        double step = ((second - first) % 360 + 540) % 360 - 180;
        return step > 0 ? 1 : step < 0 ? -1 : 0;
    }
}
