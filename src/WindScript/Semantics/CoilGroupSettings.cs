using WindScript.Text;

namespace WindScript.Semantics;

/// <summary>Settings a coil group inherits from its winding and may override: its name, turns per coil and pitch.</summary>
internal sealed record CoilGroupSettings(string Name, int? Turns, int? Pitch, TextSpan PitchSpan);
