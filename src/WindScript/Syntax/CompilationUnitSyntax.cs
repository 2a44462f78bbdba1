using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>The whole file: its top-level statements.</summary>
internal sealed record CompilationUnitSyntax(IReadOnlyList<StatementSyntax> Statements, TextSpan Span) : SyntaxNode(Span);
