using WindScript.Text;

namespace WindScript.Model;

/// <summary>
/// One coil: current enters at the go side and leaves at the return side. Slots are numbered
/// from 1 as designers count them; layers from 0 (0 = top, nearest the air gap; 1 = bottom).
/// Polarity +1 means the go side carries +Turns conductors of the phase, the return side -Turns.
/// Built with named values: <c>new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 7, Turns = 20 }</c>.
/// </summary>
public sealed record Coil
{
    /// <summary>Index of the phase the coil belongs to (0-based, in the machine's phase order).</summary>
    public required int Phase { get; init; }

    /// <summary>Slot of the go side (1-based).</summary>
    public required int GoSlot { get; init; }

    /// <summary>Slot of the return side (1-based).</summary>
    public required int ReturnSlot { get; init; }

    /// <summary>Layer of the go side (0 = top).</summary>
    public int GoLayer { get; init; }

    /// <summary>Layer of the return side (0 = top).</summary>
    public int ReturnLayer { get; init; }

    /// <summary>Turns of the coil.</summary>
    public required int Turns { get; init; }

    /// <summary>+1: the go side carries +Turns conductors of the phase; -1: the coil is wound reversed.</summary>
    public int Polarity { get; init; } = 1;

    /// <summary>Name of the coil group it was written in ("" outside any group).</summary>
    public string Group { get; init; } = "";

    /// <summary>Where the coil was written in the source (empty for coils built in code).</summary>
    public TextSpan Span { get; init; }

    /// <summary>The coil span in slot pitches, measured forward from go to return (1..Q-1), or 0.</summary>
    public int PitchSlots(int slots) => ((ReturnSlot - GoSlot) % slots + slots) % slots;
}
