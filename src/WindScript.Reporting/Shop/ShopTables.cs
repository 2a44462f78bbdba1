using System.Globalization;

namespace WindScript.Reporting.Shop;

/// <summary>A table of the sheet: an id (the CSV file's name and the HTML table's id), a title, column headers and text cells.</summary>
public sealed record ShopTable(string Id, string Title, IReadOnlyList<string> Columns, IReadOnlyList<IReadOnlyList<string>> Rows);

/// <summary>
/// The sheet's tables, defined once: the HTML page and the CSV files show the same columns with
/// the same words and numbers.
/// </summary>
public static class ShopTables
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The table ids, in page order (the browser test checks the page has every one).</summary>
    public static readonly IReadOnlyList<string> Ids = ["phases", "leads", "points", "coils", "groups", "connections"];

    /// <summary>Every table in page order: what the shop needs first (phases, terminals, star/delta points), then coils, groups and jumpers.</summary>
    public static IReadOnlyList<ShopTable> All(ShopSheet s) => [Phases(s), Leads(s), Points(s), Coils(s), Groups(s), Connections(s)];

    public static ShopTable Phases(ShopSheet s) => new("phases", "Phases: groups, paths and turns",
        ["phase", "coils", "groups", "coils per group", "parallel paths", "groups per path", "series turns per path"],
        [.. s.Phases.Select((name, k) =>
        {
            var groups = s.Groups.Where(g => g.Phase == k).ToList();
            var paths = s.PathsOf(k).ToList();
            var turnsPerPath = paths.Select(p => p.Groups.Sum(g => s.Groups[g - 1].Coils.Sum(c => s.Coils[c - 1].Turns))).Distinct().ToList();
            return (IReadOnlyList<string>)[name, I(s.Coils.Count(c => c.Phase == k)), I(groups.Count),
                Distinct(groups.Select(g => g.Coils.Count)), I(paths.Count), Distinct(paths.Select(p => p.Groups.Count)),
                string.Join(" / ", turnsPerPath.Select(I))];
        })]);

    public static ShopTable Coils(ShopSheet s) => new("coils", "Coils",
        ["coil", "phase", "group", "pitch", "start slot", "start layer", "finish slot", "finish layer", "turns", "strands in hand"],
        [.. s.Coils.Select(c => (IReadOnlyList<string>)[I(c.Number), s.Phases[c.Phase], c.Group == 0 ? "" : I(c.Group), c.Pitch,
            I(c.StartSlot), Layer(s, c.StartLayer), I(c.FinishSlot), Layer(s, c.FinishLayer), I(c.Turns), I(c.Strands)])]);

    public static ShopTable Groups(ShopSheet s) => new("groups", "Coil groups",
        ["group", "phase", "group of phase", "coils", "coil numbers", "connected", "start slot", "finish slot", "path"],
        [.. s.Groups.Select(g => (IReadOnlyList<string>)[I(g.Number), s.Phases[g.Phase], I(g.IndexInPhase), I(g.Coils.Count),
            string.Join(" ", g.Coils.Select(I)), g.Polarity >= 0 ? "normal (enter at start)" : "reversed (enter at finish)",
            I(g.StartSlot), I(g.FinishSlot), g.Path == 0 ? "" : I(g.Path)])]);

    public static ShopTable Connections(ShopSheet s) => new("connections", "Connection list (jumpers, per path)",
        ["jumper", "phase", "path", "from group", "from end", "from slot", "to group", "to end", "to slot"],
        [.. s.Jumpers.Select(j => (IReadOnlyList<string>)[I(j.Number), s.Phases[j.Phase], I(j.Path), I(j.FromGroup), End(j.FromEnd), I(j.FromSlot),
            I(j.ToGroup), End(j.ToEnd), I(j.ToSlot)])]);

    public static ShopTable Leads(ShopSheet s) => new("leads", "Leads and terminal marks",
        ["lead", "terminal mark", "phase", "path", "group", "group end", "exit slot", "exit angle (° mech. from slot 1)", "joined at"],
        [.. s.Leads.Select(l => (IReadOnlyList<string>)[I(l.Number), l.Mark, s.Phases[l.Phase], I(l.Path), I(l.Group), End(l.End), I(l.Slot),
            ((l.Slot - 1) * 360.0 / s.Slots).ToString("0.#", Inv), JoinedAt(s, l.Mark)])]);

    public static ShopTable Points(ShopSheet s) => new("points", "Star, delta and neutral points",
        ["point", "kind", "terminal marks joined", "brought out"],
        [.. s.Joints.Select(j => (IReadOnlyList<string>)[j.Name, j.Kind == JointKind.Star ? "star (neutral)" : "delta corner", string.Join(" ", j.Marks), j.BroughtOut ? "yes" : "no"])]);

    public static string End(GroupEnd end) => end == GroupEnd.Start ? "start" : "finish";

    private static string JoinedAt(ShopSheet s, string mark) =>
        s.Joints.FirstOrDefault(j => j.Marks.Contains(mark)) is { } joint
            ? (joint.Kind == JointKind.Star ? $"star point {joint.Name}" : $"delta corner {joint.Name}")
            : "terminal board";

    private static string Layer(ShopSheet s, int layer) => s.Layers == 1 ? "single" : layer == 0 ? "top" : layer == 1 ? "bottom" : I(layer + 1);

    private static string Distinct(IEnumerable<int> values) => string.Join(" / ", values.Distinct().Order().Select(I));

    private static string I(int x) => x.ToString(Inv);
}
