using System.Text.Json.Nodes;

namespace WindScript.LanguageServer;

/// <summary>The few client capabilities that change what this server sends.</summary>
public sealed record ClientCapabilities(bool Markdown, bool HierarchicalSymbols, bool Snippets)
{
    public static readonly ClientCapabilities Default = new(false, false, false);

    public static ClientCapabilities From(JsonNode? capabilities)
    {
        var text = capabilities?["textDocument"];
        bool markdown = text?["hover"]?["contentFormat"] is JsonArray formats && formats.Any(f => f?.GetValueKind() == System.Text.Json.JsonValueKind.String && f.GetValue<string>() == "markdown");
        bool hierarchical = IsTrue(text?["documentSymbol"]?["hierarchicalDocumentSymbolSupport"]);
        bool snippets = IsTrue(text?["completion"]?["completionItem"]?["snippetSupport"]);
        return new ClientCapabilities(markdown, hierarchical, snippets);
    }

    private static bool IsTrue(JsonNode? node) => node?.GetValueKind() == System.Text.Json.JsonValueKind.True;
}
