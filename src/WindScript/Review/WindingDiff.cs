using System.Collections.Immutable;
using WindScript.Diagnostics;

namespace WindScript.Review;

/// <summary>
/// What changed between two winding files, in physical terms. Every section lists rows for
/// both sides (null where a side has no such figure); <see cref="Identical"/> says whether
/// anything physical changed. Names (machine, winding, phases) are reported but are not
/// physical: renaming alone leaves two windings identical.
/// </summary>
public sealed record WindingDiff(
    string OldLabel,
    string NewLabel,
    bool OldAbsent,
    bool NewAbsent,
    ImmutableArray<TextRow> Names,
    ImmutableArray<FigureRow> Machine,
    ImmutableArray<TextRow> MachineChoices,
    string? SlotNote,
    ImmutableArray<SlotChange> Slots,
    ImmutableArray<CoilChange> Coils,
    ImmutableArray<FigureRow> SeriesTurns,
    ImmutableArray<PhaseFactors> WindingFactors,
    ImmutableArray<MmfRow> Mmf,
    ImmutableArray<FigureRow> MmfFigures,
    ImmutableArray<FigureRow> FieldAndInductance,
    ImmutableArray<FigureRow> Conductors,
    ImmutableArray<DriveChange> Drives,
    ImmutableArray<DiagnosticChange> Diagnostics)
{
    /// <summary>The sections with a physical change, in the order they are printed.</summary>
    public ImmutableArray<string> ChangedSections
    {
        get
        {
            var changed = ImmutableArray.CreateBuilder<string>();
            if (OldAbsent != NewAbsent) changed.Add("file");
            if (Machine.Any(r => r.Changed) || MachineChoices.Any(r => r.Changed)) changed.Add("machine");
            if (!Slots.IsEmpty) changed.Add("slots");
            if (!Coils.IsEmpty) changed.Add("coils");
            if (SeriesTurns.Any(r => r.Changed)) changed.Add("series turns");
            if (WindingFactors.Any(p => p.Rows.Any(r => r.Changed))) changed.Add("winding factors");
            if (Mmf.Any(r => r.Changed) || MmfFigures.Any(r => r.Changed)) changed.Add("MMF harmonics");
            if (FieldAndInductance.Any(r => r.Changed)) changed.Add("field and inductances");
            if (Conductors.Any(r => r.Changed)) changed.Add("conductors");
            if (!Drives.IsEmpty) changed.Add("drives");
            if (!Diagnostics.IsEmpty) changed.Add("diagnostics");
            return changed.ToImmutable();
        }
    }

    /// <summary>True when nothing physical changed (comments, formatting, names or the form of the source may have).</summary>
    public bool Identical => ChangedSections.IsEmpty;
}

/// <summary>A number on both sides (null where a side lacks it), in the unit named.</summary>
public sealed record FigureRow(string Name, double? Old, double? New, string Unit = "")
{
    /// <summary>True if the figure differs beyond 1e-9 relative.</summary>
    public bool Changed => !Tolerance.Same(Old, New);

    /// <summary>New minus old, or null unless both exist.</summary>
    public double? Delta => Old is { } a && New is { } b ? b - a : null;
}

/// <summary>A text on both sides (null where a side lacks it).</summary>
public sealed record TextRow(string Name, string? Old, string? New)
{
    /// <summary>True if the text differs.</summary>
    public bool Changed => Old != New;
}

/// <summary>
/// One slot and layer whose content changed. Cells read like "+U 6" (polarity, phase,
/// conductors), "." when empty, and list every phase when a cell holds more than one.
/// </summary>
public sealed record SlotChange(int Slot, int Layer, string LayerName, string Old, string New);

/// <summary>A coil present on one side only (coils compared as connections, whatever form the source used).</summary>
public sealed record CoilChange(bool Added, string Phase, int GoSlot, int ReturnSlot, string Layers, int Turns);

/// <summary>The winding factors of one phase, by mechanical order.</summary>
public sealed record PhaseFactors(string Phase, ImmutableArray<FactorRow> Rows);

/// <summary>
/// The winding factor at mechanical order ν on both sides, with the electrical order n = ν/p of
/// each side (they differ when the pole count changed).
/// </summary>
public sealed record FactorRow(int Order, double? OldElectricalOrder, double? NewElectricalOrder, double? Old, double? New)
{
    /// <summary>True if the factor differs beyond 1e-9 relative.</summary>
    public bool Changed => !Tolerance.Same(Old, New);

    /// <summary>New minus old, or null unless both exist.</summary>
    public double? Delta => Old is { } a && New is { } b ? b - a : null;
}

/// <summary>
/// One MMF wave under balanced currents on both sides: forward and backward amplitudes
/// relative to the working wave (1 = the working wave).
/// </summary>
public sealed record MmfRow(int Order, double? OldForward, double? OldBackward, double? NewForward, double? NewBackward)
{
    /// <summary>True if either wave differs beyond 1e-9 relative.</summary>
    public bool Changed => !Tolerance.Same(OldForward, NewForward) || !Tolerance.Same(OldBackward, NewBackward);
}

/// <summary>A drive added, removed or changed, with the lines of its description that differ.</summary>
public sealed record DriveChange(string Name, DriveChangeKind Kind, ImmutableArray<TextRow> Details);

/// <summary>How a drive differs between the two files.</summary>
public enum DriveChangeKind
{
    /// <summary>The drive exists only in the new file.</summary>
    Added,
    /// <summary>The drive exists only in the old file.</summary>
    Removed,
    /// <summary>The drive exists in both and differs.</summary>
    Changed,
}

/// <summary>A diagnostic (compared by code and message) present on one side only, with its 1-based line there.</summary>
public sealed record DiagnosticChange(bool Added, string Code, Severity Severity, string Message, int Line);
