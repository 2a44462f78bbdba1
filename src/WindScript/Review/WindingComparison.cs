using System.Collections.Immutable;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// Compares two winding files in physical terms: the machine, the slot layout cell by cell,
/// the coil connections, series turns, winding factors, MMF harmonics, leakage, field and
/// inductances, drives and diagnostics. The two sides are compiled and analysed independently;
/// nothing depends on how the source was written, so a file that was only reformatted,
/// re-commented or rewritten in another coil form compares as identical.
/// </summary>
public static class WindingComparison
{
    /// <summary>Compiles, analyses and compares two source texts.</summary>
    public static WindingDiff Compare(string oldText, string oldLabel, string newText, string newLabel) =>
        Compare(ReviewSide.FromText(oldText, oldLabel), ReviewSide.FromText(newText, newLabel));

    /// <summary>What changed physically from <paramref name="old"/> to <paramref name="new"/>.</summary>
    public static WindingDiff Compare(ReviewSide old, ReviewSide @new)
    {
        var (slotNote, slots) = SlotComparison.Compare(old.Design, @new.Design);
        return new WindingDiff(
            old.Label, @new.Label, old.IsAbsent, @new.IsAbsent,
            Names(old.Design, @new.Design),
            FigureTables.Machine(old.Design, @new.Design),
            FigureTables.MachineChoices(old.Design, @new.Design),
            slotNote,
            slots,
            slots.IsEmpty ? CoilComparison.Compare(old.Design, @new.Design) : [],
            FigureTables.SeriesTurns(old.Design, @new.Design),
            FigureTables.WindingFactors(old, @new),
            FigureTables.MmfWaves(old.Analysis, @new.Analysis),
            FigureTables.MmfFigures(old.Analysis, @new.Analysis),
            FigureTables.FieldAndInductance(old.Analysis, @new.Analysis),
            FigureTables.Conductors(old.Analysis, @new.Analysis),
            DriveComparison.Compare(old.Design, @new.Design),
            DiagnosticComparison.Compare(old.Compilation, @new.Compilation));
    }

    /// <summary>Names are shown but are not physical.</summary>
    private static ImmutableArray<TextRow> Names(WindingDesign? a, WindingDesign? b) =>
    [
        new("machine", a?.Name, b?.Name),
        new("winding", a?.Winding.Name, b?.Winding.Name),
        new("phases", a is null ? null : string.Join(" ", a.Phases.Select(p => p.Name)), b is null ? null : string.Join(" ", b.Phases.Select(p => p.Name))),
    ];
}
