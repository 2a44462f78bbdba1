using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.LanguageServer.Rpc;
using WindScript.Semantics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>Renaming a value, loop variable, phase, group, drive, winding or machine at its definition and every use.</summary>
public static class Rename
{
    public static JsonNode? Prepare(Document document, JsonObject parameters)
    {
        var (c, symbol, span) = SymbolAt(document, parameters);
        if (symbol is null) return null;
        return new JsonObject { ["range"] = Positions.Range(c.Source, span), ["placeholder"] = symbol.Name };
    }

    public static JsonNode? Handle(Document document, JsonObject parameters)
    {
        var (c, symbol, _) = SymbolAt(document, parameters);
        if (symbol is null) return null;
        var newName = Json.String(parameters, "newName");
        if (newName.Length == 0 || !Lexer.IsWordStart(newName[0]) || !newName.All(Lexer.IsWordPart))
            throw new RpcException(RpcErrorCodes.RequestFailed, $"'{newName}' is not a name: use letters, digits and '_', starting with a letter or '_'");
        if (Vocabulary.IsReserved(newName))
            throw new RpcException(RpcErrorCodes.RequestFailed, $"'{newName}' is a reserved word of the language");
        if (newName != symbol.Name && c.Semantics.Symbols.Any(s => s.Name == newName && SameNamespace(s.Kind, symbol.Kind)))
            throw new RpcException(RpcErrorCodes.RequestFailed, $"'{newName}' is already the name of something else in this file");
        var edits = new JsonArray();
        foreach (var span in symbol.References.Prepend(symbol.Definition).Distinct().OrderBy(s => s.Start))
            edits.Add((JsonNode)new JsonObject { ["range"] = Positions.Range(c.Source, span), ["newText"] = newName });
        return new JsonObject { ["changes"] = new JsonObject { [document.Uri] = edits } };
    }

    // Values, loop variables and phases share the names used in expressions and patterns; blocks are named apart.
    private static bool SameNamespace(SymbolKind a, SymbolKind b) =>
        IsValueLike(a) == IsValueLike(b) && (IsValueLike(a) || a == b);

    private static bool IsValueLike(SymbolKind k) => k is SymbolKind.Value or SymbolKind.LoopVariable or SymbolKind.Phase;

    private static (Compilation, Symbol?, TextSpan) SymbolAt(Document document, JsonObject parameters)
    {
        var c = document.Compilation;
        int offset = Positions.ToOffset(c.Source, parameters["position"]);
        var symbol = c.Semantics.SymbolAt(offset);
        if (symbol is null) return (c, null, default);
        bool Touches(TextSpan s) => s.Contains(offset) || s.End == offset;
        var span = Touches(symbol.Definition) ? symbol.Definition : symbol.References.First(Touches);
        return (c, symbol, span);
    }
}
