using System.Collections.Immutable;

namespace WindScript.Emit;

/// <summary>How <see cref="WindEmitter"/> writes a design.</summary>
public sealed record EmitOptions
{
    /// <summary>Comment lines for the top of the file, without the leading '#'.</summary>
    public ImmutableArray<string> Header { get; init; } = [];

    /// <summary>Write the compact slot-pattern form when the winding is regular (explicit coils otherwise).</summary>
    public bool PreferPatterns { get; init; } = true;

    /// <summary>Most pattern entries on one line before the pattern is split over several lines.</summary>
    public int EntriesPerLine { get; init; } = 24;
}
