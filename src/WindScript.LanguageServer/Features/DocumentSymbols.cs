using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// The outline: machine, winding, its groups, drives and named values, read from the syntax tree
/// (so it works while the file is broken). Clients without hierarchical support get a flat list.
/// </summary>
public static class DocumentSymbols
{
    private sealed record Item(string Name, string Detail, int Kind, TextSpan Range, TextSpan Selection, List<Item> Children);

    public static JsonNode? Handle(Document document, ClientCapabilities client)
    {
        var c = document.Compilation;
        var items = Collect(c.Syntax.Root.Statements, c);
        var result = new JsonArray();
        if (client.HierarchicalSymbols)
            foreach (var item in items) result.Add((JsonNode)Hierarchical(item, c.Source));
        else
            foreach (var item in items) AddFlat(result, item, null, document.Uri, c.Source);
        return result;
    }

    private static List<Item> Collect(IReadOnlyList<StatementSyntax> statements, Compilation c)
    {
        var items = new List<Item>();
        foreach (var statement in statements)
        {
            switch (statement)
            {
                case BlockSyntax block:
                    var name = block.Name.IsMissing ? "(unnamed)" : block.Name.Text;
                    var selection = block.Name.IsMissing ? block.Keyword.Span : block.Name.Span;
                    items.Add(new Item(name, Detail(block, c), Kind(block.Kind), block.Span, selection, Collect(block.Body, c)));
                    break;
                case LetSyntax let:
                    var value = c.Semantics.Symbols.FirstOrDefault(s => s.Definition == let.Name.Span)?.Value;
                    items.Add(new Item(let.Name.Text, value?.ToString() ?? "", Lsp.SymbolKind.Constant, let.Span, let.Name.Span, []));
                    break;
                case ForSyntax loop:
                    // A loop is not named, but the coils and values it holds belong to its block's outline.
                    items.AddRange(Collect(loop.Body, c));
                    break;
            }
        }
        return items;
    }

    private static string Detail(BlockSyntax block, Compilation c)
    {
        var design = c.Design;
        return block.Kind switch
        {
            BlockKind.Machine when design is not null => $"machine · {design.Slots} slots, {design.Poles} poles, {design.Phases.Length} phases",
            BlockKind.Winding when design is not null => $"winding · {design.Winding.Layers} layer{(design.Winding.Layers == 1 ? "" : "s")}, {design.Winding.Coils.Length} coils",
            BlockKind.Group when design is not null => $"group · {design.Winding.Coils.Count(k => k.Group == block.Name.Text)} coils",
            _ => block.Keyword.Text,
        };
    }

    private static int Kind(BlockKind kind) => kind switch
    {
        BlockKind.Machine => Lsp.SymbolKind.Class,
        BlockKind.Winding => Lsp.SymbolKind.Module,
        BlockKind.Group => Lsp.SymbolKind.Struct,
        BlockKind.Drive => Lsp.SymbolKind.Event,
        _ => Lsp.SymbolKind.Namespace,
    };

    private static JsonObject Hierarchical(Item item, SourceText source)
    {
        var symbol = new JsonObject
        {
            ["name"] = item.Name,
            ["detail"] = item.Detail,
            ["kind"] = item.Kind,
            ["range"] = Positions.Range(source, item.Range),
            ["selectionRange"] = Positions.Range(source, item.Selection),
        };
        if (item.Children.Count > 0)
        {
            var children = new JsonArray();
            foreach (var child in item.Children) children.Add((JsonNode)Hierarchical(child, source));
            symbol["children"] = children;
        }
        return symbol;
    }

    private static void AddFlat(JsonArray result, Item item, string? container, string uri, SourceText source)
    {
        var symbol = new JsonObject
        {
            ["name"] = item.Name,
            ["kind"] = item.Kind,
            ["location"] = Positions.Location(uri, source, item.Range),
        };
        if (container is not null) symbol["containerName"] = container;
        result.Add((JsonNode)symbol);
        foreach (var child in item.Children) AddFlat(result, child, item.Name, uri, source);
    }
}
