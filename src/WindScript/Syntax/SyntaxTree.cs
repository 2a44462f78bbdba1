using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>The result of reading one file: tokens, comments, the tree and the syntax diagnostics.</summary>
public sealed class SyntaxTree
{
    private SyntaxTree(SourceText source, Token[] tokens, Comment[] comments, CompilationUnitSyntax root, IReadOnlyList<Diagnostic> diagnostics)
    {
        Source = source;
        Tokens = tokens;
        Comments = comments;
        Root = root;
        Diagnostics = diagnostics;
    }

    public SourceText Source { get; }
    public Token[] Tokens { get; }
    public Comment[] Comments { get; }
    public CompilationUnitSyntax Root { get; }
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);

    public static SyntaxTree Parse(string text, string path = "") => Parse(new SourceText(text, path));

    public static SyntaxTree Parse(SourceText source)
    {
        var (tokens, comments) = Lexer.Lex(source.Text);
        var root = Parser.ParseTokens(tokens);
        var diagnostics = SyntaxDiagnostics.Collect(root);
        return new SyntaxTree(source, tokens, comments, root, diagnostics);
    }
}
