using System.Text.Json;
using WindScript.Diagnostics;

namespace WindScript.Cli.Output;

/// <summary>
/// SARIF 2.1.0 (OASIS) for code-scanning in CI: one run, every catalogue entry as a rule with
/// its help text, and one result per diagnostic with a physical location (1-based lines and
/// columns in UTF-16 code units, the SARIF default) and fixes where the diagnostic has one.
/// </summary>
public static class SarifWriter
{
    public static void Write(Utf8JsonWriter json, IEnumerable<(string File, Compilation Compilation)> files, string version)
    {
        var rules = DiagnosticCatalog.All;
        var index = rules.Select((r, i) => (r.Code, i)).ToDictionary(x => x.Code, x => x.i);
        json.WriteStartObject();
        json.WriteString("$schema", "https://json.schemastore.org/sarif-2.1.0.json");
        json.WriteString("version", "2.1.0");
        json.WriteStartArray("runs");
        json.WriteStartObject();
        json.WriteStartObject("tool");
        json.WriteStartObject("driver");
        json.WriteString("name", "WindScript");
        json.WriteString("semanticVersion", version);
        json.WriteStartArray("rules");
        foreach (var rule in rules) WriteRule(json, rule);
        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndObject();
        json.WriteString("columnKind", "utf16CodeUnits");
        json.WriteStartArray("results");
        foreach (var (file, c) in files)
            foreach (var d in c.Diagnostics)
                WriteResult(json, file, c, d, index[d.Code]);
        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndArray();
        json.WriteEndObject();
    }

    public static string Level(Severity s) => s switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };

    private static void WriteRule(Utf8JsonWriter json, DiagnosticDescriptor rule)
    {
        json.WriteStartObject();
        json.WriteString("id", rule.Code);
        json.WriteString("name", string.Concat(rule.Title.Split(' ', '-', ',', ':').Where(w => w.Length > 0).Select(w => char.ToUpperInvariant(w[0]) + w[1..])));
        json.WriteStartObject("shortDescription");
        json.WriteString("text", rule.Title);
        json.WriteEndObject();
        json.WriteStartObject("fullDescription");
        json.WriteString("text", Flatten(rule.Explanation));
        json.WriteEndObject();
        json.WriteStartObject("help");
        json.WriteString("text", Flatten(rule.Explanation) + $" (windscript explain {rule.Code})");
        json.WriteEndObject();
        json.WriteStartObject("defaultConfiguration");
        json.WriteString("level", Level(rule.Severity));
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteResult(Utf8JsonWriter json, string file, Compilation c, Diagnostic d, int ruleIndex)
    {
        json.WriteStartObject();
        json.WriteString("ruleId", d.Code);
        json.WriteNumber("ruleIndex", ruleIndex);
        json.WriteString("level", Level(d.Severity));
        json.WriteStartObject("message");
        json.WriteString("text", d.Message);
        json.WriteEndObject();
        json.WriteStartArray("locations");
        WriteLocation(json, file, c, d.Span, null);
        json.WriteEndArray();
        if (d.Related.Count > 0)
        {
            json.WriteStartArray("relatedLocations");
            int id = 1;
            foreach (var related in d.Related) WriteLocation(json, file, c, related.Span, (id++, related.Message));
            json.WriteEndArray();
        }
        if (d.Fix is { } fix)
        {
            json.WriteStartArray("fixes");
            json.WriteStartObject();
            json.WriteStartObject("description");
            json.WriteString("text", fix.Title);
            json.WriteEndObject();
            json.WriteStartArray("artifactChanges");
            json.WriteStartObject();
            json.WriteStartObject("artifactLocation");
            json.WriteString("uri", ToUri(file));
            json.WriteEndObject();
            json.WriteStartArray("replacements");
            foreach (var edit in fix.Edits)
            {
                json.WriteStartObject();
                json.WritePropertyName("deletedRegion");
                WriteRegion(json, c, edit.Span);
                json.WriteStartObject("insertedContent");
                json.WriteString("text", edit.NewText);
                json.WriteEndObject();
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
            json.WriteEndArray();
            json.WriteEndObject();
            json.WriteEndArray();
        }
        json.WriteEndObject();
    }

    private static void WriteLocation(Utf8JsonWriter json, string file, Compilation c, Text.TextSpan span, (int Id, string Message)? related)
    {
        json.WriteStartObject();
        if (related is { } r)
        {
            json.WriteNumber("id", r.Id);
            json.WriteStartObject("message");
            json.WriteString("text", r.Message);
            json.WriteEndObject();
        }
        json.WriteStartObject("physicalLocation");
        json.WriteStartObject("artifactLocation");
        json.WriteString("uri", ToUri(file));
        json.WriteEndObject();
        json.WritePropertyName("region");
        WriteRegion(json, c, span);
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteRegion(Utf8JsonWriter json, Compilation c, Text.TextSpan span)
    {
        var start = c.Source.GetPosition(span.Start);
        var end = c.Source.GetPosition(span.End);
        json.WriteStartObject();
        json.WriteNumber("startLine", start.Line + 1);
        json.WriteNumber("startColumn", start.Character + 1);
        json.WriteNumber("endLine", end.Line + 1);
        json.WriteNumber("endColumn", end.Character + 1);
        json.WriteEndObject();
    }

    /// <summary>A relative path as a URI reference: forward slashes, spaces and the like escaped.</summary>
    public static string ToUri(string path) =>
        string.Join("/", path.Replace('\\', '/').Split('/').Select(Uri.EscapeDataString));

    private static string Flatten(string text) => string.Join(" ", text.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries).Select(l => l.Trim()));
}
