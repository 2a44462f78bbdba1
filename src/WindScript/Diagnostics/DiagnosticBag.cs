using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>
/// Collects diagnostics in the order they are found. The same diagnostic at the same place
/// (a mistake inside a loop, met on every iteration) is kept once, with the count in its
/// message, so a small file cannot flood the output or the memory.
/// </summary>
internal sealed class DiagnosticBag
{
    private readonly List<Diagnostic> _items = [];
    private readonly Dictionary<(string Code, TextSpan Span, string Message), int> _index = [];
    private readonly List<int> _counts = [];
    private IReadOnlyList<Diagnostic>? _view;

    public IReadOnlyList<Diagnostic> Items => _view ??= DiagnosticFlood.WithCounts(_items, _counts);

    public bool HasErrors => _items.Exists(d => d.Severity == Severity.Error);

    public Diagnostic Add(DiagnosticDescriptor descriptor, TextSpan span, string message)
    {
        var d = descriptor.At(span, message);
        Add(d);
        return d;
    }

    public void Add(Diagnostic diagnostic)
    {
        _view = null;
        var key = (diagnostic.Code, diagnostic.Span, diagnostic.Message);
        if (_index.TryGetValue(key, out int at))
        {
            _counts[at]++;
            return;
        }
        _index[key] = _items.Count;
        _items.Add(diagnostic);
        _counts.Add(1);
    }

    public void AddRange(IEnumerable<Diagnostic> diagnostics)
    {
        foreach (var d in diagnostics) Add(d);
    }
}
