using WindScript.Text;

namespace WindScript.Model;

/// <summary>A phase of the machine, in declaration order (Index 0 is the reference phase).</summary>
public sealed record Phase(string Name, int Index, TextSpan Span = default);
