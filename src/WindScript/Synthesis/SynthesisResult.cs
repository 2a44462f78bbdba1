using WindScript.Analysis;
using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;

namespace WindScript.Synthesis;

/// <summary>
/// The outcome of a synthesis: the winding design (null when none exists), the feasibility
/// report, and the facts of the layout that a designer reads next to it. When the design is
/// null, <see cref="Diagnostics"/> says why, with the nearest feasible choices.
/// </summary>
public sealed record SynthesisResult
{
    /// <summary>The synthesised design, or null when none exists.</summary>
    public WindingDesign? Design { get; init; }

    /// <summary>The balance condition and, when it fails, the nearest feasible counts.</summary>
    public required FeasibilityReport Feasibility { get; init; }

    /// <summary>The coil pitch used (or tried), in slots.</summary>
    public int Pitch { get; init; }

    /// <summary>Identical sections around the bore; parallel paths must divide it (see <see cref="StarLayout.Sections"/>).</summary>
    public int Sections { get; init; }

    /// <summary>The slot shift carrying each phase onto the next.</summary>
    public int PhaseStep { get; init; }

    /// <summary>Single layer: true when every coil runs forward (the slot-pattern form applies).</summary>
    public bool ForwardCoils { get; init; }

    /// <summary>Why synthesis failed (WS600x), empty on success.</summary>
    public ImmutableArray<Diagnostic> Diagnostics { get; init; } = [];

    /// <summary>True if a design was synthesised.</summary>
    public bool Succeeded => Design is not null;
}
