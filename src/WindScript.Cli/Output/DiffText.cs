using System.Globalization;
using WindScript.Review;

namespace WindScript.Cli.Output;

/// <summary>
/// A <see cref="WindingDiff"/> for people: a one-line verdict, then each section as an aligned
/// table with the changed rows marked "~" (and "+"/"-" for things added or removed).
/// </summary>
public static class DiffText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Write(TextWriter o, WindingDiff d)
    {
        o.WriteLine($"windscript diff {d.OldLabel} {d.NewLabel}");
        if (d.OldAbsent && !d.NewAbsent) o.WriteLine("new file");
        if (d.NewAbsent && !d.OldAbsent) o.WriteLine("deleted file");
        var renamed = d.Names.Where(n => n.Changed && n.Old is not null && n.New is not null).ToArray();
        if (d.Identical)
        {
            o.WriteLine("no physical change (only comments, formatting, names or the form of the source differ)");
            WriteNames(o, renamed);
            return;
        }
        o.WriteLine($"physically different: {string.Join(", ", d.ChangedSections)}");
        WriteNames(o, renamed);
        WriteMachine(o, d);
        WriteSlots(o, d);
        WriteCoils(o, d);
        WriteFigures(o, "series turns per phase", d.SeriesTurns, all: true);
        WriteFactors(o, d);
        WriteMmf(o, d);
        WriteFigures(o, "air-gap field, inductances and EMF", d.FieldAndInductance, all: true);
        WriteFigures(o, "conductors: fill, resistance, losses and complete inductances", d.Conductors, all: true);
        WriteDrives(o, d);
        WriteDiagnostics(o, d);
    }

    private static void WriteNames(TextWriter o, TextRow[] renamed)
    {
        if (renamed.Length == 0) return;
        o.WriteLine();
        var table = new TextTable("names (not physical)", "old", "new");
        foreach (var r in renamed) table.Add("~", r.Name, r.Old!, r.New!);
        table.Write(o);
    }

    private static void WriteMachine(TextWriter o, WindingDiff d)
    {
        var changed = d.Machine.Where(r => r.Changed).ToList();
        var choices = d.MachineChoices.Where(r => r.Changed).ToList();
        if (changed.Count > 0) WriteFigures(o, "machine", changed, all: false);
        if (choices.Count > 0)
        {
            o.WriteLine();
            var table = new TextTable(changed.Count > 0 ? "machine (arrangement)" : "machine", "old", "new");
            foreach (var r in choices) table.Add("~", r.Name, r.Old ?? "-", r.New ?? "-");
            table.Write(o);
        }
        if (changed.Count == 0 && choices.Count == 0) { o.WriteLine(); o.WriteLine("  machine: unchanged"); }
    }

    private static void WriteSlots(TextWriter o, WindingDiff d)
    {
        o.WriteLine();
        if (d.SlotNote is { } note) { o.WriteLine($"  slots: {note}"); return; }
        if (d.Slots.IsEmpty) { o.WriteLine("  slots: unchanged"); return; }
        var table = new TextTable($"slots ({d.Slots.Length} cell{(d.Slots.Length == 1 ? "" : "s")} changed: phase, polarity, conductors)", "layer", "old", "new");
        foreach (var s in d.Slots) table.Add("~", $"slot {s.Slot}", s.LayerName, s.Old, s.New);
        table.Write(o);
    }

    private static void WriteCoils(TextWriter o, WindingDiff d)
    {
        if (d.Coils.IsEmpty) return;
        o.WriteLine();
        o.WriteLine("  coil connections (same slot contents, different coils)");
        foreach (var c in d.Coils)
            o.WriteLine($"{(c.Added ? "+" : "-")} coil {c.Phase}: {c.GoSlot} -> {c.ReturnSlot} ({c.Layers}), {c.Turns} turns");
    }

    private static void WriteFactors(TextWriter o, WindingDiff d)
    {
        if (d.WindingFactors.IsEmpty) return;
        bool alike = d.WindingFactors.All(p => p.Rows.SequenceEqual(d.WindingFactors[0].Rows, FactorRowComparer.Instance));
        var blocks = alike ? [d.WindingFactors[0]] : d.WindingFactors;
        foreach (var phase in blocks)
        {
            o.WriteLine();
            string title = alike ? $"winding factors (phases {string.Join(" ", d.WindingFactors.Select(p => p.Phase))} alike)" : $"winding factors, phase {phase.Phase}";
            var table = new TextTable(title, "n = order/p", "old", "new", "delta");
            foreach (var r in phase.Rows)
                table.Add(r.Changed ? "~" : " ", $"order {r.Order}", Electrical(r.OldElectricalOrder, r.NewElectricalOrder),
                    Factor(r.Old), Factor(r.New), r.Changed && r.Delta is { } delta ? delta.ToString("+0.0000;-0.0000;0.0000", Inv) : "");
            table.Write(o);
        }
    }

    private static void WriteMmf(TextWriter o, WindingDiff d)
    {
        WriteFigures(o, "MMF under balanced currents", d.MmfFigures, all: true);
        if (d.Mmf.IsEmpty) return;
        o.WriteLine();
        var table = new TextTable("MMF waves (% of the working wave)", "n = order/p", "old fwd", "old bwd", "new fwd", "new bwd");
        var electrical = d.WindingFactors.FirstOrDefault()?.Rows.ToDictionary(r => r.Order) ?? [];
        foreach (var r in d.Mmf)
            table.Add(r.Changed ? "~" : " ", $"order {r.Order}",
                electrical.TryGetValue(r.Order, out var f) ? Electrical(f.OldElectricalOrder, f.NewElectricalOrder) : "",
                Percent(r.OldForward), Percent(r.OldBackward), Percent(r.NewForward), Percent(r.NewBackward));
        table.Write(o);
    }

    private static void WriteDrives(TextWriter o, WindingDiff d)
    {
        if (d.Drives.IsEmpty) return;
        o.WriteLine();
        o.WriteLine("  drives");
        foreach (var drive in d.Drives)
        {
            string marker = drive.Kind switch { DriveChangeKind.Added => "+", DriveChangeKind.Removed => "-", _ => "~" };
            o.WriteLine($"{marker} drive {drive.Name} ({drive.Kind.ToString().ToLowerInvariant()})");
            foreach (var r in drive.Details)
            {
                if (r.Old is not null) o.WriteLine($"-     {r.Name}: {r.Old}");
                if (r.New is not null) o.WriteLine($"+     {r.Name}: {r.New}");
            }
        }
    }

    private static void WriteDiagnostics(TextWriter o, WindingDiff d)
    {
        if (d.Diagnostics.IsEmpty) return;
        o.WriteLine();
        o.WriteLine("  diagnostics (+ appeared, - disappeared)");
        foreach (var x in d.Diagnostics)
            o.WriteLine($"{(x.Added ? "+" : "-")} {DiagnosticText.SeverityName(x.Severity)} {x.Code} ({(x.Added ? "new" : "old")} line {x.Line}): {x.Message}");
    }

    private static void WriteFigures(TextWriter o, string title, IEnumerable<FigureRow> rows, bool all)
    {
        var table = new TextTable(title, "old", "new", "delta", "unit");
        foreach (var r in rows)
        {
            if (!all && !r.Changed) continue;
            if (r.Old is null && r.New is null) continue;
            table.Add(r.Changed ? "~" : " ", r.Name, Number(r.Old), Number(r.New), r.Changed && r.Delta is { } delta ? Signed(delta) : "", r.Unit);
        }
        if (table.Count == 0) return;
        o.WriteLine();
        table.Write(o);
    }

    public static string Number(double? x) => FigureFormat.Number(x);

    private static string Signed(double x) => (x > 0 ? "+" : "") + Number(x);

    private static string Factor(double? x) => FigureFormat.Factor(x);

    private static string Percent(double? x) => x is { } v ? (v * 100).ToString("0.00", Inv) : "n/a";

    private static string Electrical(double? old, double? @new)
    {
        string Show(double n) => Number(n);
        if (@new is { } b && (old is null || Tolerance.Same(old.Value, b))) return Show(b);
        if (old is { } a && @new is null) return Show(a);
        return old is { } x && @new is { } y ? $"{Show(x)} -> {Show(y)}" : "";
    }

    private sealed class FactorRowComparer : IEqualityComparer<FactorRow>
    {
        public static readonly FactorRowComparer Instance = new();

        public bool Equals(FactorRow? x, FactorRow? y) =>
            x is not null && y is not null && x.Order == y.Order && Tolerance.Same(x.Old, y.Old) && Tolerance.Same(x.New, y.New);

        public int GetHashCode(FactorRow r) => r.Order;
    }
}
