using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.Semantics;

namespace WindScript.LanguageServer.Features;

/// <summary>Go to definition, find references and highlight: position -> offset -> symbol -> places.</summary>
public static class Navigation
{
    public static JsonNode? Definition(Document document, JsonObject parameters)
    {
        var (c, symbol) = SymbolAt(document, parameters);
        return symbol is null ? null : Positions.Location(document.Uri, c.Source, symbol.Definition);
    }

    public static JsonNode? References(Document document, JsonObject parameters)
    {
        var (c, symbol) = SymbolAt(document, parameters);
        if (symbol is null) return new JsonArray();
        bool includeDeclaration = parameters["context"] is JsonObject context && Json.Bool(context, "includeDeclaration");
        var result = new JsonArray();
        if (includeDeclaration) result.Add((JsonNode)Positions.Location(document.Uri, c.Source, symbol.Definition));
        foreach (var span in symbol.References.OrderBy(s => s.Start)) result.Add((JsonNode)Positions.Location(document.Uri, c.Source, span));
        return result;
    }

    public static JsonNode? Highlights(Document document, JsonObject parameters)
    {
        var (c, symbol) = SymbolAt(document, parameters);
        if (symbol is null) return new JsonArray();
        var result = new JsonArray(new JsonObject { ["range"] = Positions.Range(c.Source, symbol.Definition), ["kind"] = 3 }); // Write
        foreach (var span in symbol.References.OrderBy(s => s.Start))
            result.Add((JsonNode)new JsonObject { ["range"] = Positions.Range(c.Source, span), ["kind"] = 2 }); // Read
        return result;
    }

    private static (Compilation Compilation, Symbol? Symbol) SymbolAt(Document document, JsonObject parameters)
    {
        var c = document.Compilation;
        int offset = Positions.ToOffset(c.Source, parameters["position"]);
        return (c, c.Semantics.SymbolAt(offset));
    }
}
