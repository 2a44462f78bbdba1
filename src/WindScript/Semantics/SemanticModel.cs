using WindScript.Text;

namespace WindScript.Semantics;

/// <summary>
/// What the evaluator learned about names and places in a file, for hover, go-to-definition,
/// references and document symbols.
/// </summary>
internal sealed class SemanticModel
{
    internal List<Symbol> SymbolList { get; } = [];

    private readonly Dictionary<TextSpan, Symbol> _byDefinition = [];

    /// <summary>The symbol defined at a place, created on first sight.</summary>
    internal Symbol Define(string name, SymbolKind kind, TextSpan definition)
    {
        if (_byDefinition.TryGetValue(definition, out var existing)) return existing;
        var symbol = new Symbol(name, kind, definition);
        _byDefinition[definition] = symbol;
        SymbolList.Add(symbol);
        return symbol;
    }

    public IReadOnlyList<Symbol> Symbols => SymbolList;

    /// <summary>The symbol defined or referenced at an offset, if any.</summary>
    public Symbol? SymbolAt(int offset) =>
        SymbolList.FirstOrDefault(s => s.Definition.Contains(offset) || s.Definition.End == offset)
        ?? SymbolList.FirstOrDefault(s => s.References.Any(r => r.Contains(offset) || r.End == offset));
}
