using WindScript.Text;
using WindScript.Units;

namespace WindScript.Semantics;

internal enum SymbolKind
{
    Value,        // let
    LoopVariable,
    Phase,
    Machine,
    Winding,
    Group,
    Drive,
}

/// <summary>A named thing in a file: where it is defined, where it is used, and its value if it has one.</summary>
internal sealed class Symbol(string name, SymbolKind kind, TextSpan definition)
{
    private readonly List<TextSpan> _references = [];
    private readonly HashSet<TextSpan> _seen = [];

    public string Name { get; } = name;
    public SymbolKind Kind { get; } = kind;
    public TextSpan Definition { get; } = definition;

    /// <summary>The evaluated value of a 'let' (null for other kinds, or when it did not evaluate).</summary>
    public Quantity? Value { get; internal set; }

    /// <summary>The expression a 'let' was written with (null for other kinds): lets a check see the units it used.</summary>
    public Syntax.ExpressionSyntax? Expression { get; internal set; }

    public IReadOnlyList<TextSpan> References => _references;

    internal bool Used => _references.Count > 0;

    internal void AddReference(TextSpan span)
    {
        // Loop bodies evaluate many times; record each place once.
        if (_seen.Add(span)) _references.Add(span);
    }
}
