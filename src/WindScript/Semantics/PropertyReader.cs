using WindScript.Diagnostics;
using WindScript.Syntax;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// Typed reading of one property's value for the slot and conductor blocks: a length that must
/// be positive (or not negative), a plain number in a range, one of the property's words.
/// </summary>
internal sealed class PropertyReader(DiagnosticBag diagnostics, ExpressionEvaluator evaluator, Scope scope)
{
    public double? Quantity(PropertySyntax p, Dimension dimension, string what, bool zeroAllowed = false)
    {
        if (evaluator.EvaluateAs(p.Value, scope, dimension, what) is not { } v) return null;
        if (v < 0 || (v == 0 && !zeroAllowed))
        {
            diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span, $"{what} must be {(zeroAllowed ? "zero or more" : "greater than zero")}");
            return null;
        }
        return v;
    }

    public double? Length(PropertySyntax p, string what, bool zeroAllowed = false) => Quantity(p, Dimension.LengthDim, what, zeroAllowed);

    /// <summary>A plain number strictly between <paramref name="low"/> and <paramref name="high"/> (inclusive of high).</summary>
    public double? Number(PropertySyntax p, string what, double low, double high)
    {
        if (evaluator.EvaluateAs(p.Value, scope, Dimension.None, what) is not { } v) return null;
        if (!(v > low && v <= high))
        {
            diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span, $"{what} must be more than {low} and at most {high}, not {ExpressionEvaluator.Format(v)}");
            return null;
        }
        return v;
    }

    public int? Whole(PropertySyntax p, string what, int min, int max) => evaluator.EvaluateInteger(p.Value, scope, what, min, max, limit: max);

    /// <summary>The index of the property's word in its <see cref="PropertyWord.Words"/>, or null (WS2080).</summary>
    public int? Choice(PropertySyntax p)
    {
        var words = p.Property.Words;
        if (p.Value is NameExpressionSyntax name)
            for (int i = 0; i < words.Count; i++)
                if (words[i] == name.Name.Text) return i;
        diagnostics.Add(DiagnosticCatalog.UnknownChoice, p.Value.Span,
            $"'{p.Keyword.Text}' takes {string.Join(", ", words.Take(words.Count - 1))} or {words[^1]}");
        return null;
    }
}
