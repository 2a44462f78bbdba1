using System.Text.Json;
using System.Text.Json.Nodes;
using WindScript.Analysis;
using WindScript.Cli.Output.Json;
using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Cli.Output;

/// <summary>
/// <c>eval --format json</c>: the analysis result in camelCase, with the file name, a schema
/// version and the diagnostics exactly as <c>check --format json</c> writes them. The shape is
/// documented in schemas/eval.schema.json and only grows (fields are added, never renamed).
/// </summary>
public static class EvalJson
{
    /// <summary>Version of the JSON shape; bumped only for an incompatible change.</summary>
    public const string SchemaVersion = "1";

    public static string Write(string file, SourceText source, IEnumerable<Diagnostic> diagnostics, AnalysisResult result)
    {
        var root = JsonSerializer.SerializeToNode(EvalAnalysisJson.From(result), EvalJsonContext.Default.EvalAnalysisJson)!.AsObject();
        var document = new JsonObject
        {
            ["schemaVersion"] = SchemaVersion,
            ["file"] = file,
        };
        foreach (var (name, value) in root.ToArray())
        {
            root.Remove(name);
            document[name] = value;
        }
        document["diagnostics"] = JsonNode.Parse(DiagnosticsArray(file, source, diagnostics));
        return document.ToJsonString(new JsonSerializerOptions(EvalJsonContext.Default.Options) { WriteIndented = true });
    }

    private static string DiagnosticsArray(string file, SourceText source, IEnumerable<Diagnostic> diagnostics) =>
        DiagnosticJson.ToText(json => DiagnosticJson.WriteArray(json, file, source, diagnostics));
}
