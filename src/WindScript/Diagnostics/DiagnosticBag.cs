using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>Collects diagnostics in the order they are found.</summary>
internal sealed class DiagnosticBag
{
    private readonly List<Diagnostic> _items = [];

    public IReadOnlyList<Diagnostic> Items => _items;

    public bool HasErrors => _items.Exists(d => d.Severity == Severity.Error);

    public Diagnostic Add(DiagnosticDescriptor descriptor, TextSpan span, string message)
    {
        var d = descriptor.At(span, message);
        _items.Add(d);
        return d;
    }

    public void Add(Diagnostic diagnostic) => _items.Add(diagnostic);

    public void AddRange(IEnumerable<Diagnostic> diagnostics) => _items.AddRange(diagnostics);
}
