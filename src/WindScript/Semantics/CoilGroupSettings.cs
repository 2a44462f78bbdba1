using WindScript.Text;

namespace WindScript.Semantics;

/// <summary>
/// Settings a coil group inherits from its winding and may override: its name, turns per coil and pitch.
/// <paramref name="TurnsStated"/> is true when a 'turns' statement applies, even if its value was refused
/// (then <paramref name="Turns"/> is null and the coils are skipped without a second, missing-turns error).
/// </summary>
internal sealed record CoilGroupSettings(string Name, int? Turns, int? Pitch, TextSpan PitchSpan, bool TurnsStated = false);
