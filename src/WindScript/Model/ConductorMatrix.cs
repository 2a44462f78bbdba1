using System.Runtime.CompilerServices;

namespace WindScript.Model;

/// <summary>
/// Signed conductors (turns times polarity) per phase, slot and layer. Slots are 0-based here
/// (slot s in source is index s - 1); the layout is flat for speed.
/// </summary>
public sealed class ConductorMatrix
{
    private readonly int[] _cells;

    /// <summary>An empty matrix of the given size.</summary>
    public ConductorMatrix(int phases, int slots, int layers)
    {
        Phases = phases;
        Slots = slots;
        Layers = layers;
        _cells = new int[phases * slots * layers];
    }

    /// <summary>Number of phases m.</summary>
    public int Phases { get; }
    /// <summary>Number of slots Q.</summary>
    public int Slots { get; }
    /// <summary>Number of layers.</summary>
    public int Layers { get; }

    /// <summary>Signed conductors of a phase in a slot (0-based) and layer (0 = top).</summary>
    public int this[int phase, int slotIndex, int layer]
    {
        get => _cells[(phase * Slots + slotIndex) * Layers + layer];
        internal set => _cells[(phase * Slots + slotIndex) * Layers + layer] = value;
    }

    /// <summary>Signed conductors of a phase in each slot, layers summed (length Q).</summary>
    public int[] SlotConductors(int phase)
    {
        var result = new int[Slots];
        for (int s = 0; s < Slots; s++)
            for (int l = 0; l < Layers; l++)
                result[s] += this[phase, s, l];
        return result;
    }

    private static readonly ConditionalWeakTable<WindingDesign, ConductorMatrix> Computed = new();

    /// <summary>The conductors of a design, built from its coils once per design instance.</summary>
    public static ConductorMatrix Of(WindingDesign design) =>
        Computed.GetValue(design, d => FromCoils(d.Phases.Length, d.Slots, d.Winding.Layers, d.Winding.Coils));

    /// <summary>Builds the matrix from coils; sides in slots or layers out of range are skipped (the checker reports them).</summary>
    public static ConductorMatrix FromCoils(int phases, int slots, int layers, IEnumerable<Coil> coils)
    {
        var m = new ConductorMatrix(phases, slots, Math.Max(1, layers));
        foreach (var c in coils)
        {
            if (c.Phase < 0 || c.Phase >= phases) continue;
            int n = c.Turns * c.Polarity;
            if (c.GoSlot >= 1 && c.GoSlot <= slots && c.GoLayer >= 0 && c.GoLayer < m.Layers)
                m[c.Phase, c.GoSlot - 1, c.GoLayer] += n;
            if (c.ReturnSlot >= 1 && c.ReturnSlot <= slots && c.ReturnLayer >= 0 && c.ReturnLayer < m.Layers)
                m[c.Phase, c.ReturnSlot - 1, c.ReturnLayer] -= n;
        }
        return m;
    }
}
