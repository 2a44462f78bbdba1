using System.Text.Json;
using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Cli.Output;

/// <summary>Diagnostics as JSON objects with 1-based lines and columns (columns in UTF-16 units).</summary>
public static class DiagnosticJson
{
    public static void WriteArray(Utf8JsonWriter json, string file, SourceText source, IEnumerable<Diagnostic> diagnostics)
    {
        json.WriteStartArray();
        foreach (var d in diagnostics) WriteOne(json, file, source, d);
        json.WriteEndArray();
    }

    public static void WriteOne(Utf8JsonWriter json, string file, SourceText source, Diagnostic d)
    {
        var start = source.GetPosition(d.Span.Start);
        var end = source.GetPosition(d.Span.End);
        json.WriteStartObject();
        json.WriteString("file", file);
        json.WriteNumber("line", start.Line + 1);
        json.WriteNumber("column", start.Character + 1);
        json.WriteNumber("endLine", end.Line + 1);
        json.WriteNumber("endColumn", end.Character + 1);
        json.WriteString("severity", DiagnosticText.SeverityName(d.Severity));
        json.WriteString("code", d.Code);
        json.WriteString("message", d.Message);
        if (d.Related.Count > 0)
        {
            json.WriteStartArray("related");
            foreach (var related in d.Related)
            {
                json.WriteStartObject();
                WriteRange(json, source, related.Span);
                json.WriteString("message", related.Message);
                json.WriteEndObject();
            }
            json.WriteEndArray();
        }
        if (d.Fix is { } fix)
        {
            json.WriteStartObject("fix");
            json.WriteString("title", fix.Title);
            json.WriteStartArray("edits");
            foreach (var edit in fix.Edits)
            {
                var s = source.GetPosition(edit.Span.Start);
                var e = source.GetPosition(edit.Span.End);
                json.WriteStartObject();
                json.WriteNumber("line", s.Line + 1);
                json.WriteNumber("column", s.Character + 1);
                json.WriteNumber("endLine", e.Line + 1);
                json.WriteNumber("endColumn", e.Character + 1);
                json.WriteString("newText", edit.NewText);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        json.WriteEndObject();
    }

    private static void WriteRange(Utf8JsonWriter json, SourceText source, TextSpan span)
    {
        var s = source.GetPosition(span.Start);
        var e = source.GetPosition(span.End);
        json.WriteNumber("line", s.Line + 1);
        json.WriteNumber("column", s.Character + 1);
        json.WriteNumber("endLine", e.Line + 1);
        json.WriteNumber("endColumn", e.Character + 1);
    }

    /// <summary>Runs <paramref name="write"/> on an indented writer and returns the JSON text.</summary>
    public static string ToText(Action<Utf8JsonWriter> write)
    {
        using var stream = new MemoryStream();
        using (var json = CreateWriter(stream)) write(json);
        return System.Text.Encoding.UTF8.GetString(stream.ToArray());
    }

    public static Utf8JsonWriter CreateWriter(Stream stream) =>
        new(stream, new JsonWriterOptions { Indented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
}
