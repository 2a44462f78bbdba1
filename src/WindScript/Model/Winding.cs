using System.Collections.Immutable;
using WindScript.Text;

namespace WindScript.Model;

/// <summary>The stator winding: its coils, layers and parallel paths, plus what the source declared.</summary>
public sealed record Winding
{
    /// <summary>The winding's name, as written after <c>winding</c>.</summary>
    public required string Name { get; init; }

    /// <summary>Coil sides a slot may hold (1 or 2).</summary>
    public required int Layers { get; init; }

    /// <summary>Parallel paths per phase.</summary>
    public int Paths { get; init; } = 1;

    /// <summary>Every coil of the winding, in source order.</summary>
    public required ImmutableArray<Coil> Coils { get; init; }

    /// <summary>Coil pitch in slots if the source stated one.</summary>
    public int? DeclaredPitch { get; init; }

    /// <summary>Series turns per phase if the source stated them (checked against the coils).</summary>
    public int? DeclaredSeriesTurns { get; init; }

    /// <summary>Conductors per slot if the source stated them (checked against the coils).</summary>
    public int? DeclaredConductorsPerSlot { get; init; }

    /// <summary>Where the winding block is in the source.</summary>
    public TextSpan Span { get; init; }

    /// <summary>The span of the block's <c>winding</c> keyword, where whole-winding diagnostics point.</summary>
    public TextSpan KeywordSpan { get; init; }

    /// <summary>Spans of the declarations of paths, series turns and conductors (for diagnostics and fixes).</summary>
    public TextSpan PathsSpan { get; init; }
    /// <summary>Where <c>series_turns</c> is written (empty if it is not).</summary>
    public TextSpan SeriesTurnsSpan { get; init; }
    /// <summary>Where <c>conductors_per_slot</c> is written (empty if it is not).</summary>
    public TextSpan ConductorsPerSlotSpan { get; init; }
    /// <summary>Where <c>layers</c> is written (empty if it is not).</summary>
    public TextSpan LayersSpan { get; init; }
    /// <summary>Where the winding's own <c>pitch</c> is written (empty if it is not).</summary>
    public TextSpan PitchSpan { get; init; }
}
