using System.Numerics;
using WindScript.Model;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>A change to the coils written by one piece of source (one coil line, one pattern entry).</summary>
internal sealed record CoilChange(IReadOnlyList<Coil> Coils, int NewPhase, int NewPolarity, int NewTurns)
{
    public Coil First => Coils[0];
}

internal enum RepairKind { Reverse, MovePhase, SetTurns, SwapPhases }

/// <summary>One way of changing a few coils after which the phases balance.</summary>
internal sealed record Repair(RepairKind Kind, IReadOnlyList<CoilChange> Changes);

/// <summary>
/// Finds the coils that explain an unbalanced winding by the winding's own symmetry: every
/// change a winding mistake undoes (reverse a coil, move it to another phase with either
/// polarity, give it the turns most coils have, exchange the phases of two coils) is tried on
/// the per-phase totals, and the changes after which the phases balance are the culprits. The
/// coils one source line writes (a loop body, a repeated pattern entry) change together, as an
/// edit of that line would change them.
/// </summary>
internal static class BalanceRepair
{
    /// <summary>Pairs are tried only up to this many source units (the search is quadratic).</summary>
    private const int MaxUnitsForPairs = 400;

    public static IReadOnlyList<Repair> Find(WindingDesign design, PhaseTotals totals)
    {
        var units = Units(design);
        int m = totals.Phases;
        int common = CommonTurns(design);
        var found = new List<Repair>();
        var turns = new long[m];
        var phasors = new Complex[m];
        foreach (var unit in units)
        {
            var first = unit[0];
            if (unit.Any(c => c.Phase != first.Phase || c.Turns != first.Turns)) continue;
            Try(RepairKind.Reverse, [new CoilChange(unit, first.Phase, -first.Polarity, first.Turns)]);
            for (int j = 0; j < m; j++)
            {
                if (j == first.Phase) continue;
                Try(RepairKind.MovePhase, [new CoilChange(unit, j, first.Polarity, first.Turns)]);
                Try(RepairKind.MovePhase, [new CoilChange(unit, j, -first.Polarity, first.Turns)]);
            }
            if (common > 0 && first.Turns != common)
                Try(RepairKind.SetTurns, [new CoilChange(unit, first.Phase, first.Polarity, common)]);
        }
        if (found.Count == 0 && units.Count <= MaxUnitsForPairs)
        {
            for (int a = 0; a < units.Count; a++)
                for (int b = a + 1; b < units.Count; b++)
                {
                    var (x, y) = (units[a], units[b]);
                    if (x[0].Phase == y[0].Phase || !Uniform(x) || !Uniform(y)) continue;
                    Try(RepairKind.SwapPhases, [new CoilChange(x, y[0].Phase, x[0].Polarity, x[0].Turns), new CoilChange(y, x[0].Phase, y[0].Polarity, y[0].Turns)]);
                }
        }
        return found;

        void Try(RepairKind kind, CoilChange[] changes)
        {
            totals.Turns.CopyTo(turns, 0);
            totals.Phasors.CopyTo(phasors, 0);
            foreach (var change in changes)
                foreach (var coil in change.Coils)
                {
                    turns[coil.Phase] -= coil.Turns;
                    phasors[coil.Phase] -= totals.Contribution(coil, coil.Polarity);
                    turns[change.NewPhase] += change.NewTurns;
                    phasors[change.NewPhase] += totals.Contribution(coil, change.NewPolarity * coil.Polarity * change.First.Polarity, change.NewTurns);
                }
            if (BalanceRule.Judge(turns, phasors, totals.PhaseShiftDegrees) == BalanceFault.None) found.Add(new Repair(kind, changes));
        }
    }

    /// <summary>The design with the repair applied (what the edited source evaluates to).</summary>
    public static WindingDesign Apply(WindingDesign design, Repair repair)
    {
        var replaced = new Dictionary<Coil, Coil>(ReferenceEqualityComparer.Instance);
        foreach (var change in repair.Changes)
            foreach (var coil in change.Coils)
                replaced[coil] = coil with { Phase = change.NewPhase, Polarity = change.NewPolarity * coil.Polarity * change.First.Polarity, Turns = change.NewTurns };
        var coils = design.Winding.Coils.Select(c => replaced.TryGetValue(c, out var r) ? r : c).ToArray();
        return design with { Winding = design.Winding with { Coils = [.. coils] } };
    }

    private static bool Uniform(IReadOnlyList<Coil> unit) => unit.All(c => c.Phase == unit[0].Phase);

    /// <summary>Coils grouped by the source that wrote them (a coil built in code is its own unit).</summary>
    private static List<IReadOnlyList<Coil>> Units(WindingDesign design)
    {
        var bySpan = new Dictionary<TextSpan, List<Coil>>();
        var units = new List<IReadOnlyList<Coil>>();
        foreach (var coil in design.Winding.Coils)
        {
            if (coil.Phase < 0 || coil.Phase >= design.Phases.Length) continue;
            if (coil.Span == default) { units.Add([coil]); continue; }
            if (!bySpan.TryGetValue(coil.Span, out var list))
            {
                bySpan[coil.Span] = list = [];
                units.Add(list);
            }
            list.Add(coil);
        }
        return units;
    }

    /// <summary>The turns most coils have (the smallest such count on a tie), or 0 for no coils.</summary>
    private static int CommonTurns(WindingDesign design) =>
        design.Winding.Coils.GroupBy(c => c.Turns).OrderByDescending(g => g.Count()).ThenBy(g => g.Key).Select(g => g.Key).FirstOrDefault();
}
