using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>Identical diagnostics at one place are reported once, with how many times they occurred.</summary>
internal static class DiagnosticFlood
{
    /// <summary>The diagnostics with "(N times here)" added to each that occurred N &gt; 1 times.</summary>
    public static IReadOnlyList<Diagnostic> WithCounts(List<Diagnostic> items, List<int> counts)
    {
        var result = new List<Diagnostic>(items.Count);
        for (int i = 0; i < items.Count; i++)
            result.Add(counts[i] == 1 ? items[i] : items[i] with { Message = $"{items[i].Message} ({counts[i]:N0} times here)" });
        return result;
    }

    /// <summary>Collapses identical diagnostics (same code, place and message) anywhere in a list, keeping the first's position.</summary>
    public static List<Diagnostic> Collapse(IEnumerable<Diagnostic> diagnostics)
    {
        var items = new List<Diagnostic>();
        var counts = new List<int>();
        var index = new Dictionary<(string Code, TextSpan Span, string Message), int>();
        foreach (var d in diagnostics)
        {
            var key = (d.Code, d.Span, d.Message);
            if (index.TryGetValue(key, out int at))
            {
                counts[at]++;
                continue;
            }
            index[key] = items.Count;
            items.Add(d);
            counts.Add(1);
        }
        return [.. WithCounts(items, counts)];
    }
}
