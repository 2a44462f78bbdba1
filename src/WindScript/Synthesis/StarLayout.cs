namespace WindScript.Synthesis;

/// <summary>
/// A synthesised slot layout as plain arrays, reusable across many syntheses (the sweep lays
/// out thousands of windings without allocating): for every slot (0-based) and layer, the
/// phase of the coil side there (−1 for none) and its sign (+1 go side of a forward coil).
/// </summary>
internal sealed class StarLayout
{
    private int[] _phase;
    private int[] _sign;
    private int[] _coilPolarity;

    /// <summary>A layout with room for <paramref name="slotCapacity"/> slots in two layers (it grows when needed).</summary>
    public StarLayout(int slotCapacity = 0)
    {
        _phase = new int[2 * slotCapacity];
        _sign = new int[2 * slotCapacity];
        _coilPolarity = new int[slotCapacity];
    }

    public int Slots { get; private set; }
    public int PolePairs { get; private set; }
    public int Layers { get; private set; }
    public int Pitch { get; private set; }

    /// <summary>The slot shift that carries phase k onto phase k + 1 (see <see cref="Analysis.Feasibility.PhaseStep"/>).</summary>
    public int PhaseStep { get; internal set; } = -1;

    /// <summary>
    /// Single layer: true when every coil runs forward from a + side to the − side one pitch on
    /// (the slot-pattern form); false when some coils had to be reversed. Always true for two layers.
    /// </summary>
    public bool ForwardCoils { get; internal set; }

    /// <summary>Phase of the coil side in a slot (0-based) and layer, or −1.</summary>
    public int PhaseAt(int slot, int layer) => _phase[layer * Slots + slot];

    /// <summary>Sign of the coil side in a slot and layer: +1, −1, or 0 when empty.</summary>
    public int SignAt(int slot, int layer) => _sign[layer * Slots + slot];

    /// <summary>
    /// Polarity of the coil whose go side is in this slot (top layer for double layer), or 0 if
    /// no coil starts there. Its return side is slot + pitch.
    /// </summary>
    public int CoilAt(int slot) => _coilPolarity[slot];

    internal void Reset(int slots, int polePairs, int layers, int pitch)
    {
        Slots = slots;
        PolePairs = polePairs;
        Layers = layers;
        Pitch = pitch;
        PhaseStep = -1;
        ForwardCoils = false;
        int cells = slots * layers;
        if (_phase.Length < cells)
        {
            _phase = new int[Math.Max(cells, 2 * _phase.Length)];   // geometric: a sweep's growing Q reallocates rarely
            _sign = new int[_phase.Length];
        }
        if (_coilPolarity.Length < slots) _coilPolarity = new int[Math.Max(slots, 2 * _coilPolarity.Length)];
        Array.Fill(_phase, -1, 0, cells);
        Array.Clear(_sign, 0, cells);
        Array.Clear(_coilPolarity, 0, slots);
    }

    internal void Set(int slot, int layer, int phase, int sign)
    {
        _phase[layer * Slots + slot] = phase;
        _sign[layer * Slots + slot] = sign;
    }

    internal void SetCoil(int goSlot, int polarity) => _coilPolarity[goSlot] = polarity;

    /// <summary>Signed conductors per slot of one phase, layers summed, for coils of one turn each.</summary>
    public void SlotConductors(int phase, Span<int> destination)
    {
        for (int s = 0; s < Slots; s++)
        {
            int sum = 0;
            for (int l = 0; l < Layers; l++)
                if (_phase[l * Slots + s] == phase) sum += _sign[l * Slots + s];
            destination[s] = sum;
        }
    }

    /// <summary>
    /// The number of identical sections around the bore: the largest S dividing Q such that the
    /// layout repeats every Q/S slots, or (S even) repeats reversed. The parallel paths of a phase
    /// carry equal EMFs when their number divides S (each path takes the same share of sections).
    /// </summary>
    public int Sections()
    {
        for (int sections = Slots; sections > 1; sections--)
        {
            if (Slots % sections != 0) continue;
            int shift = Slots / sections;
            if (RepeatsAfter(shift, 1) || (sections % 2 == 0 && RepeatsAfter(shift, -1))) return sections;
        }
        return 1;
    }

    private bool RepeatsAfter(int shift, int sign)
    {
        for (int l = 0; l < Layers; l++)
            for (int s = 0; s < Slots; s++)
            {
                int from = l * Slots + s, to = l * Slots + (s + shift) % Slots;
                if (_phase[to] != _phase[from] || _sign[to] != sign * _sign[from]) return false;
            }
        return true;
    }
}
