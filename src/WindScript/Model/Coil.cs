using WindScript.Text;

namespace WindScript.Model;

/// <summary>
/// One coil: current enters at the go side and leaves at the return side. Slots are numbered
/// from 1 as designers count them; layers from 0 (0 = top, nearest the air gap; 1 = bottom).
/// Polarity +1 means the go side carries +Turns conductors of the phase, the return side -Turns.
/// </summary>
public sealed record Coil(
    int Phase,
    int GoSlot,
    int ReturnSlot,
    int GoLayer,
    int ReturnLayer,
    int Turns,
    int Polarity,
    string Group = "",
    TextSpan Span = default)
{
    /// <summary>The coil span in slot pitches, measured forward from go to return (1..Q-1), or 0.</summary>
    public int PitchSlots(int slots) => ((ReturnSlot - GoSlot) % slots + slots) % slots;
}
