using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Semantics;

/// <summary>
/// Bounds the work one file can ask for (loop iterations plus pattern positions), so evaluation
/// always ends quickly however the ranges are written.
/// </summary>
internal sealed class ExpansionBudget(DiagnosticBag diagnostics)
{
    public const long Limit = 1_000_000;

    private long _used;
    private bool _reported;

    /// <summary>Takes <paramref name="amount"/> units, or reports (once) and returns false.</summary>
    public bool Take(long amount, TextSpan at)
    {
        if (_used + amount <= Limit)
        {
            _used += amount;
            return true;
        }
        if (!_reported)
            diagnostics.Add(DiagnosticCatalog.ExpansionLimit, at,
                $"this would expand to {amount:N0} more iterations or pattern positions; a file may expand to at most {Limit:N0}");
        _reported = true;
        return false;
    }
}
