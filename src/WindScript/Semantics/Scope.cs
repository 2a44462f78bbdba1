namespace WindScript.Semantics;

/// <summary>Names visible in a block: its own and its parents'. Loop variables carry their current value.</summary>
internal sealed class Scope(Scope? parent)
{
    private readonly Dictionary<string, Symbol> _symbols = new(StringComparer.Ordinal);
    private readonly Dictionary<string, double> _loopValues = new(StringComparer.Ordinal);

    public Scope? Parent { get; } = parent;

    public bool TryDeclare(Symbol symbol) => _symbols.TryAdd(symbol.Name, symbol);

    public Symbol? LookupLocal(string name) => _symbols.GetValueOrDefault(name);

    public Symbol? Lookup(string name) => _symbols.GetValueOrDefault(name) ?? Parent?.Lookup(name);

    public void SetLoopValue(string name, double value) => _loopValues[name] = value;

    public bool TryGetLoopValue(string name, out double value)
    {
        for (var s = this; s is not null; s = s.Parent)
            if (s._symbols.ContainsKey(name)) return s._loopValues.TryGetValue(name, out value);
        value = 0;
        return false;
    }
}
