using WindScript.Diagnostics;
using WindScript.Syntax;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// The value of one expression of an evaluated file, for tools that show values (the language
/// server's hover). Each name resolves to the symbol the evaluation recorded at that very
/// place, so scoping is exactly the evaluator's. Returns null when the value depends on a loop
/// variable (it has many values) or did not evaluate (its diagnostic was reported already).
/// </summary>
internal static class ExpressionProbe
{
    public static Quantity? Evaluate(SemanticModel model, ExpressionSyntax expression, int slots = 0)
    {
        var scope = new Scope(null);
        foreach (var name in SyntaxNavigation.DescendantsAndSelf(expression).OfType<NameExpressionSyntax>())
        {
            var symbol = model.Symbols.FirstOrDefault(s => s.References.Contains(name.Name.Span));
            if (symbol is not { Kind: SymbolKind.Value }) return null;
            if (scope.LookupLocal(symbol.Name) is { } other && !ReferenceEquals(other, symbol)) return null;
            scope.TryDeclare(symbol);
        }
        var evaluator = new ExpressionEvaluator(new DiagnosticBag()) { Slots = slots };
        return evaluator.Evaluate(expression, scope);
    }
}
