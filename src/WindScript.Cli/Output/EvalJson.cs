using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;
using WindScript.Analysis;
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
        var root = JsonSerializer.SerializeToNode(result, EvalJsonContext.Default.AnalysisResult)!.AsObject();
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

/// <summary>Wave kinds as lower-case strings ("forward", "backward", "pulsating", "elliptic", "standing").</summary>
public sealed class WaveKindJsonConverter() : JsonStringEnumConverter<WaveKind>(JsonNamingPolicy.CamelCase);

[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
    Converters = [typeof(WaveKindJsonConverter)])]
[JsonSerializable(typeof(AnalysisResult))]
internal sealed partial class EvalJsonContext : JsonSerializerContext;
