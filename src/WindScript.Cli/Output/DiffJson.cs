using System.Text.Json;
using WindScript.Review;

namespace WindScript.Cli.Output;

/// <summary>
/// A <see cref="WindingDiff"/> for tools. Every figure has old, new (null where a side lacks it),
/// delta and changed; names of sections and fields are stable.
/// </summary>
public static class DiffJson
{
    public static void Write(TextWriter output, WindingDiff d) => output.WriteLine(DiagnosticJson.ToText(json => Write(json, d)));

    public static void Write(Utf8JsonWriter json, WindingDiff d)
    {
        json.WriteStartObject();
        json.WriteString("old", d.OldLabel);
        json.WriteString("new", d.NewLabel);
        json.WriteBoolean("oldAbsent", d.OldAbsent);
        json.WriteBoolean("newAbsent", d.NewAbsent);
        json.WriteBoolean("identical", d.Identical);
        json.WriteStartArray("changed");
        foreach (var s in d.ChangedSections) json.WriteStringValue(s);
        json.WriteEndArray();

        json.WriteStartArray("names");
        foreach (var r in d.Names) Text(json, r);
        json.WriteEndArray();
        Figures(json, "machine", d.Machine);
        json.WriteStartArray("machineChoices");
        foreach (var r in d.MachineChoices) Text(json, r);
        json.WriteEndArray();

        json.WriteStartObject("slots");
        json.WriteString("note", d.SlotNote);
        json.WriteStartArray("changes");
        foreach (var s in d.Slots)
        {
            json.WriteStartObject();
            json.WriteNumber("slot", s.Slot);
            json.WriteNumber("layer", s.Layer);
            json.WriteString("layerName", s.LayerName);
            json.WriteString("old", s.Old);
            json.WriteString("new", s.New);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();

        json.WriteStartArray("coils");
        foreach (var c in d.Coils)
        {
            json.WriteStartObject();
            json.WriteString("change", c.Added ? "added" : "removed");
            json.WriteString("phase", c.Phase);
            json.WriteNumber("goSlot", c.GoSlot);
            json.WriteNumber("returnSlot", c.ReturnSlot);
            json.WriteString("layers", c.Layers);
            json.WriteNumber("turns", c.Turns);
            json.WriteEndObject();
        }
        json.WriteEndArray();

        Figures(json, "seriesTurns", d.SeriesTurns);

        json.WriteStartArray("windingFactors");
        foreach (var phase in d.WindingFactors)
        {
            json.WriteStartObject();
            json.WriteString("phase", phase.Phase);
            json.WriteStartArray("orders");
            foreach (var r in phase.Rows)
            {
                json.WriteStartObject();
                json.WriteNumber("order", r.Order);
                Number(json, "oldElectricalOrder", r.OldElectricalOrder);
                Number(json, "newElectricalOrder", r.NewElectricalOrder);
                Number(json, "old", r.Old);
                Number(json, "new", r.New);
                Number(json, "delta", r.Delta);
                json.WriteBoolean("changed", r.Changed);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        json.WriteEndArray();

        json.WriteStartObject("mmf");
        Figures(json, "figures", d.MmfFigures);
        json.WriteStartArray("waves");
        foreach (var r in d.Mmf)
        {
            json.WriteStartObject();
            json.WriteNumber("order", r.Order);
            Number(json, "oldForward", r.OldForward);
            Number(json, "oldBackward", r.OldBackward);
            Number(json, "newForward", r.NewForward);
            Number(json, "newBackward", r.NewBackward);
            json.WriteBoolean("changed", r.Changed);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();

        Figures(json, "fieldAndInductance", d.FieldAndInductance);
        Figures(json, "conductors", d.Conductors);

        json.WriteStartArray("drives");
        foreach (var drive in d.Drives)
        {
            json.WriteStartObject();
            json.WriteString("name", drive.Name);
            json.WriteString("change", ChangeName(drive.Kind));
            json.WriteStartArray("details");
            foreach (var r in drive.Details) Text(json, r);
            json.WriteEndArray();
            json.WriteEndObject();
        }
        json.WriteEndArray();

        json.WriteStartArray("diagnostics");
        foreach (var x in d.Diagnostics)
        {
            json.WriteStartObject();
            json.WriteString("change", x.Added ? "appeared" : "disappeared");
            json.WriteString("code", x.Code);
            json.WriteString("severity", DiagnosticText.SeverityName(x.Severity));
            json.WriteString("message", x.Message);
            json.WriteNumber("line", x.Line);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    // Spelled out: renaming the enum member must not rename a public value.
    private static string ChangeName(DriveChangeKind kind) => kind switch
    {
        DriveChangeKind.Added => "added",
        DriveChangeKind.Removed => "removed",
        DriveChangeKind.Changed => "changed",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    private static void Figures(Utf8JsonWriter json, string name, IEnumerable<FigureRow> rows)
    {
        json.WriteStartArray(name);
        foreach (var r in rows)
        {
            json.WriteStartObject();
            json.WriteString("name", r.Name);
            json.WriteString("unit", r.Unit);
            Number(json, "old", r.Old);
            Number(json, "new", r.New);
            Number(json, "delta", r.Delta);
            json.WriteBoolean("changed", r.Changed);
            json.WriteEndObject();
        }
        json.WriteEndArray();
    }

    private static void Text(Utf8JsonWriter json, TextRow r)
    {
        json.WriteStartObject();
        json.WriteString("name", r.Name);
        json.WriteString("old", r.Old);
        json.WriteString("new", r.New);
        json.WriteBoolean("changed", r.Changed);
        json.WriteEndObject();
    }

    private static void Number(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v)) json.WriteNumber(name, v);
        else json.WriteNull(name);
    }
}
