using WindScript.Diagnostics;

namespace WindScript.Syntax;

/// <summary>Gathers the diagnostics the parser left in the tree (error statements, unnamed and unclosed blocks), with their messages.</summary>
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
                    bag.Add(DiagnosticCatalog.SyntaxError, error.ErrorSpan, SyntaxErrorMessages.Describe(error));
                    break;
                case BlockSyntax block:
                    if (block.Name.IsMissing)
                        bag.Add(DiagnosticCatalog.MissingBlockName, block.Name.Span,
                            $"this {block.Keyword.Text} block has no name: write one between '{block.Keyword.Text}' and '{{'");
                    Visit(block.Body, bag);
                    if (!block.Closed)
                        bag.Add(DiagnosticCatalog.UnclosedBlock, block.Keyword.Span, block.Name.IsMissing
                            ? $"this {block.Keyword.Text} block has no closing '}}'"
                            : $"the {block.Keyword.Text} block '{block.Name.Text}' has no closing '}}'");
                    break;
                case ForSyntax loop:
                    Visit(loop.Body, bag);
                    if (!loop.Closed)
                        bag.Add(DiagnosticCatalog.UnclosedBlock, loop.Keyword.Span, "this 'for' loop has no closing '}'");
                    break;
            }
        }
    }
}
