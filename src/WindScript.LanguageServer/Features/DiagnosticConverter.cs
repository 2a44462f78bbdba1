using System.Text.Json.Nodes;
using WindScript.Diagnostics;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>The one place where core diagnostics become LSP diagnostics.</summary>
public static class DiagnosticConverter
{
    public const string Source = "windscript";

    /// <summary>The publishDiagnostics parameters for a document's current version (an empty list clears old ones).</summary>
    public static JsonObject Publication(Document document)
    {
        var compilation = document.Compilation;
        var list = new JsonArray();
        foreach (var d in compilation.Diagnostics) list.Add((JsonNode)ToLsp(document.Uri, compilation.Source, d));
        return new JsonObject { ["uri"] = document.Uri, ["version"] = document.Version, ["diagnostics"] = list };
    }

    /// <summary>What the client sees when checking itself failed: one diagnostic saying so, at the top of the file.</summary>
    public static JsonObject Failure(Document document, Exception e) => new()
    {
        ["uri"] = document.Uri,
        ["version"] = document.Version,
        ["diagnostics"] = new JsonArray(new JsonObject
        {
            ["range"] = new JsonObject
            {
                ["start"] = new JsonObject { ["line"] = 0, ["character"] = 0 },
                ["end"] = new JsonObject { ["line"] = 0, ["character"] = 0 },
            },
            ["severity"] = Lsp.DiagnosticSeverity.Error,
            ["source"] = Source,
            ["message"] = e is Rpc.RpcException ? e.Message : $"internal error while checking this file ({e.GetType().Name}); please report it",
        }),
    };

    public static JsonObject ToLsp(string uri, SourceText source, Diagnostic d)
    {
        var result = new JsonObject
        {
            ["range"] = Positions.Range(source, d.Span),
            ["severity"] = Severity(d.Severity),
            ["code"] = d.Code,
            ["source"] = Source,
            ["message"] = d.Message,
        };
        if (d.Related.Count > 0)
        {
            var related = new JsonArray();
            foreach (var r in d.Related)
                related.Add((JsonNode)new JsonObject { ["location"] = Positions.Location(uri, source, r.Span), ["message"] = r.Message });
            result["relatedInformation"] = related;
        }
        if (d.Descriptor == DiagnosticCatalog.UnusedName) result["tags"] = new JsonArray(1); // Unnecessary: editors fade unused names
        return result;
    }

    public static int Severity(Severity severity) => severity switch
    {
        Diagnostics.Severity.Error => Lsp.DiagnosticSeverity.Error,
        Diagnostics.Severity.Warning => Lsp.DiagnosticSeverity.Warning,
        _ => Lsp.DiagnosticSeverity.Information,
    };
}
