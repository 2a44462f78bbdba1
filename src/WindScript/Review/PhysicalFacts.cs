using System.Globalization;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// A canonical, line-per-fact dump of what a winding file means physically: machine figures,
/// every slot cell, every coil connection, drives, winding factors, MMF figures, inductances and
/// diagnostics. Comments, layout and the form of the source leave it unchanged, so as a git
/// textconv it makes <c>git log -p</c> and <c>git diff</c> show physical changes line by line.
/// </summary>
internal static class PhysicalFacts
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static IEnumerable<string> Of(ReviewSide side)
    {
        var d = side.Design;
        if (d is null)
        {
            yield return "no complete machine and winding";
        }
        else
        {
            yield return $"machine {d.Name}";
            yield return $"winding {d.Winding.Name}";
            yield return $"phases {string.Join(" ", d.Phases.Select(p => p.Name))}";
            foreach (var line in Figures(FigureTables.Machine(null, d))) yield return line;
            foreach (var choice in FigureTables.MachineChoices(null, d)) yield return $"{choice.Name} {choice.New}";
            var layout = SlotLayout.From(d);
            for (int slot = 1; slot <= d.Slots; slot++)
                for (int layer = 0; layer < layout.Layers; layer++)
                    yield return $"slot {slot} {SlotComparison.LayerName(layer, layout.Layers)}: {SlotComparison.Describe(layout[slot, layer], d.Phases)}";
            foreach (var c in CoilComparison.Connections(d))
                yield return $"coil {c.Phase}: {c.GoSlot} -> {c.ReturnSlot} ({c.Layers}) {c.Turns} turns";
            foreach (var line in Figures(FigureTables.SeriesTurns(null, d))) yield return "series turns " + line;
            foreach (var drive in d.Drives)
                foreach (var (key, value) in DriveComparison.Describe(drive, d))
                    yield return $"drive {drive.Name} {DriveComparison.Label(key, d)}: {value}";
        }
        foreach (var phase in FigureTables.WindingFactors(ReviewSide.Absent(""), side))
            foreach (var r in phase.Rows)
                yield return $"winding factor {phase.Phase} order {r.Order} (n = {Number(r.NewElectricalOrder)}): {r.New?.ToString("0.0000", Inv)}";
        foreach (var line in Figures(FigureTables.MmfFigures(null, side.Analysis))) yield return line;
        foreach (var line in Figures(FigureTables.FieldAndInductance(null, side.Analysis))) yield return line;
        foreach (var line in Figures(FigureTables.Conductors(null, side.Analysis))) yield return line;
        if (side.Compilation is { } compilation)
            foreach (var x in compilation.Diagnostics)
                yield return $"diagnostic {x.Severity.ToString().ToLowerInvariant()} {x.Code}: {x.Message}";
    }

    private static IEnumerable<string> Figures(IEnumerable<FigureRow> rows) =>
        rows.Where(r => r.New is not null).Select(r => $"{r.Name}: {Number(r.New)}{(r.Unit.Length > 0 ? " " + r.Unit : "")}");

    /// <summary>Six significant digits: enough to see a change, few enough that rounding noise never shows.</summary>
    private static string Number(double? x) => x is { } v ? double.Parse(v.ToString("G6", Inv), Inv).ToString("0.######", Inv) : "n/a";
}
