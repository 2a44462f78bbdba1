using WindScript.Diagnostics;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>Binds 'let' statements and reports the ones never used.</summary>
internal static class LetBinder
{
    public static void Bind(LetSyntax let, Scope scope, ExpressionEvaluator evaluator, DiagnosticBag diagnostics, SemanticModel model)
    {
        var value = evaluator.Evaluate(let.Value, scope);
        if (scope.LookupLocal(let.Name.Text) is { } earlier)
        {
            diagnostics.Add(DiagnosticCatalog.DuplicateName.At(let.Name.Span, $"'{let.Name.Text}' is already defined in this block")
                with { Related = [new RelatedSpan(earlier.Definition, "first defined here")] });
            return;
        }
        // Inside a loop the same 'let' binds once per pass: keep one symbol per definition.
        var symbol = model.Define(let.Name.Text, SymbolKind.Value, let.Name.Span);
        symbol.Value = value;
        symbol.Expression = let.Value;
        scope.TryDeclare(symbol);
    }
}
