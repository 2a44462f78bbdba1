using System.Collections.Immutable;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// Coils compared as connections: the same slots can hold the same conductors with different
/// end connections (lap against concentric), which changes end-winding length and leakage.
/// A coil wound the other way round (go and return swapped, polarity reversed) is the same
/// coil; the form the source used (pattern, explicit, loop) and the group names do not matter.
/// The comparison lists coils only when the slot layout is unchanged: a changed slot already says it.
/// </summary>
internal static class CoilComparison
{
    private readonly record struct Connection(int Phase, int Go, int Return, int GoLayer, int ReturnLayer, int Turns);

    public static ImmutableArray<CoilChange> Compare(WindingDesign? a, WindingDesign? b)
    {
        if (a is null || b is null || a.Slots != b.Slots) return [];
        var before = Count(a);
        var after = Count(b);
        var changes = ImmutableArray.CreateBuilder<CoilChange>();
        foreach (var (coil, n) in before)
            for (int i = after.GetValueOrDefault(coil); i < n; i++) changes.Add(Describe(coil, false, a));
        foreach (var (coil, n) in after)
            for (int i = before.GetValueOrDefault(coil); i < n; i++) changes.Add(Describe(coil, true, b));
        return [.. changes.OrderBy(c => c.GoSlot).ThenBy(c => c.ReturnSlot).ThenBy(c => c.Added)];
    }

    /// <summary>Every coil of a design as a connection (go side first for positive polarity), sorted by slot.</summary>
    public static ImmutableArray<CoilChange> Connections(WindingDesign design) =>
        [.. Count(design).SelectMany(x => Enumerable.Repeat(Describe(x.Key, true, design), x.Value))
            .OrderBy(c => c.GoSlot).ThenBy(c => c.ReturnSlot).ThenBy(c => c.Phase, StringComparer.Ordinal)];

    private static Dictionary<Connection, int> Count(WindingDesign design)
    {
        var counts = new Dictionary<Connection, int>();
        foreach (var c in design.Winding.Coils)
        {
            var key = c.Polarity >= 0
                ? new Connection(c.Phase, c.GoSlot, c.ReturnSlot, c.GoLayer, c.ReturnLayer, c.Turns)
                : new Connection(c.Phase, c.ReturnSlot, c.GoSlot, c.ReturnLayer, c.GoLayer, c.Turns);
            counts[key] = counts.GetValueOrDefault(key) + 1;
        }
        return counts;
    }

    private static CoilChange Describe(Connection c, bool added, WindingDesign design)
    {
        int layers = design.Winding.Layers;
        string phase = c.Phase < design.Phases.Length ? design.Phases[c.Phase].Name : $"#{c.Phase + 1}";
        return new CoilChange(added, phase, c.Go, c.Return,
            $"{SlotComparison.LayerName(c.GoLayer, layers)}/{SlotComparison.LayerName(c.ReturnLayer, layers)}", c.Turns);
    }
}
