using System.Collections.Immutable;
using System.Globalization;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// The slot layout compared cell by cell (slot and layer): phase (by index, so renaming a phase
/// is no change), polarity and conductors. Needs the same slot count on both sides.
/// </summary>
internal static class SlotComparison
{
    public static (string? Note, ImmutableArray<SlotChange> Changes) Compare(WindingDesign? a, WindingDesign? b)
    {
        if (a is null || b is null) return (a is null && b is null ? null : "one side has no complete machine and winding", []);
        if (a.Slots != b.Slots) return ($"slot count changed ({a.Slots} -> {b.Slots}): slots not compared one by one", []);
        var oldLayout = SlotLayout.From(a);
        var newLayout = SlotLayout.From(b);
        int layers = Math.Max(oldLayout.Layers, newLayout.Layers);
        var changes = ImmutableArray.CreateBuilder<SlotChange>();
        for (int slot = 1; slot <= a.Slots; slot++)
            for (int layer = 0; layer < layers; layer++)
            {
                var before = Cells(oldLayout, slot, layer);
                var after = Cells(newLayout, slot, layer);
                if (before.SequenceEqual(after)) continue;
                changes.Add(new SlotChange(slot, layer, LayerName(layer, layers), Describe(before, a.Phases), Describe(after, b.Phases)));
            }
        return (null, changes.ToImmutable());
    }

    /// <summary>"top"/"bottom" for two layers, "slot" for one.</summary>
    public static string LayerName(int layer, int layers) => layers == 1 ? "slot" : layer == 0 ? Syntax.Vocabulary.Word(Syntax.LayerName.Top) : layer == 1 ? Syntax.Vocabulary.Word(Syntax.LayerName.Bottom) : $"layer {layer + 1}";

    /// <summary>A cell as "+U 6" (several phases joined by "/"), or "." when empty.</summary>
    public static string Describe(IReadOnlyList<SlotCell> cells, IReadOnlyList<Phase> phases) =>
        cells.Count == 0
            ? "."
            : string.Join("/", cells.Select(c =>
                (c.Sign < 0 ? "-" : "+") + (c.Phase < phases.Count ? phases[c.Phase].Name : $"#{c.Phase + 1}") + " " +
                Math.Abs(c.Conductors).ToString(CultureInfo.InvariantCulture)));

    private static IReadOnlyList<SlotCell> Cells(SlotLayout layout, int slot, int layer) =>
        layer < layout.Layers ? layout[slot, layer] : [];
}
