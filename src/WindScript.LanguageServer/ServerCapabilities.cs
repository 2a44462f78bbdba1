using System.Reflection;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Features;
using WindScript.LanguageServer.Protocol;

namespace WindScript.LanguageServer;

/// <summary>What this server tells the client it can do, in the initialize result.</summary>
public static class ServerCapabilities
{
    public static string Version =>
        typeof(ServerCapabilities).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0.0.0";

    public static JsonObject InitializeResult() => new()
    {
        ["capabilities"] = new JsonObject
        {
            ["positionEncoding"] = "utf-16",
            ["textDocumentSync"] = new JsonObject
            {
                ["openClose"] = true,
                ["change"] = Lsp.TextDocumentSyncKind.Incremental,
                ["save"] = false,
            },
            ["hoverProvider"] = true,
            ["definitionProvider"] = true,
            ["referencesProvider"] = true,
            ["documentHighlightProvider"] = true,
            ["documentSymbolProvider"] = true,
            ["documentFormattingProvider"] = true,
            ["renameProvider"] = new JsonObject { ["prepareProvider"] = true },
            ["completionProvider"] = new JsonObject
            {
                ["triggerCharacters"] = new JsonArray(":"), // after "top:" come the phases
                ["resolveProvider"] = false,
            },
            ["codeActionProvider"] = new JsonObject { ["codeActionKinds"] = new JsonArray("quickfix") },
            ["semanticTokensProvider"] = new JsonObject
            {
                ["legend"] = SemanticTokens.Legend(),
                ["full"] = true,
            },
        },
        ["serverInfo"] = new JsonObject { ["name"] = "windscript", ["version"] = Version },
    };
}
