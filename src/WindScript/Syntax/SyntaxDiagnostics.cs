using WindScript.Diagnostics;

namespace WindScript.Syntax;

/// <summary>Gathers the diagnostics the parser left in the tree (error statements, unclosed blocks).</summary>
internal static class SyntaxDiagnostics
{
    public static IReadOnlyList<Diagnostic> Collect(CompilationUnitSyntax root)
    {
        var bag = new DiagnosticBag();
        Visit(root.Statements, bag);
        return bag.Items;
    }

    private static void Visit(IReadOnlyList<StatementSyntax> statements, DiagnosticBag bag)
    {
        foreach (var statement in statements)
        {
            switch (statement)
            {
                case ErrorStatementSyntax error:
                    bag.Add(DiagnosticCatalog.SyntaxError, error.ErrorSpan, error.Message);
                    break;
                case BlockSyntax block:
                    Visit(block.Body, bag);
                    if (!block.Closed)
                        bag.Add(DiagnosticCatalog.UnclosedBlock, block.Keyword.Span,
                            $"the {block.Keyword.Text} block '{block.Name?.Text}' has no closing '}}'");
                    break;
                case ForSyntax loop:
                    Visit(loop.Body, bag);
                    if (!loop.Closed)
                        bag.Add(DiagnosticCatalog.UnclosedBlock, loop.Span with { Length = 3 }, "this 'for' loop has no closing '}'");
                    break;
            }
        }
    }
}
