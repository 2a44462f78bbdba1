namespace WindScript.Model;

/// <summary>One coil side's place in the layout: which phase, with which sign and how many conductors.</summary>
public readonly record struct SlotCell(int Phase, int Conductors)
{
    /// <summary>+1 for a go side, -1 for a return side, 0 for an empty cell.</summary>
    public int Sign => Math.Sign(Conductors);
}

/// <summary>
/// The slot layout per layer: what lies in each slot and layer. Cells usually hold one phase;
/// a cell listing two phases is a layout error the checker reports.
/// </summary>
public sealed class SlotLayout
{
    private readonly List<SlotCell>[,] _cells;

    private SlotLayout(int slots, int layers)
    {
        Slots = slots;
        Layers = layers;
        _cells = new List<SlotCell>[slots, layers];
    }

    /// <summary>Number of slots Q.</summary>
    public int Slots { get; }
    /// <summary>Number of layers.</summary>
    public int Layers { get; }

    /// <summary>The phases in a slot (1-based) and layer (0 = top).</summary>
    public IReadOnlyList<SlotCell> this[int slot, int layer] => (IReadOnlyList<SlotCell>?)_cells[slot - 1, layer] ?? [];

    /// <summary>The layout of a design's coils.</summary>
    public static SlotLayout From(WindingDesign design)
    {
        var m = design.Conductors;
        var layout = new SlotLayout(m.Slots, m.Layers);
        for (int s = 0; s < m.Slots; s++)
            for (int l = 0; l < m.Layers; l++)
                for (int p = 0; p < m.Phases; p++)
                    if (m[p, s, l] != 0)
                        (layout._cells[s, l] ??= []).Add(new SlotCell(p, m[p, s, l]));
        return layout;
    }

    /// <summary>A short label such as "+U", "-W", "." (empty) or "U/V" (two phases: a layout error).</summary>
    public string Label(int slot, int layer, IReadOnlyList<Phase> phases)
    {
        var cells = this[slot, layer];
        if (cells.Count == 0) return ".";
        return string.Join("/", cells.Select(c => (c.Sign < 0 ? "-" : "+") + phases[c.Phase].Name));
    }
}
