using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>The result of reading one file: tokens, comments, the tree and the syntax diagnostics.</summary>
internal sealed class SyntaxTree
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

    /// <summary>
    /// Deepest bracket nesting read. The parser recurses once per level, and a stack overflow
    /// cannot be caught in .NET, so a deeper file is refused with one diagnostic instead.
    /// Real winding files nest a handful of levels.
    /// </summary>
    public const int MaxNesting = 100;

    /// <summary>True when the file was refused for nesting deeper than <see cref="MaxNesting"/>.</summary>
    public bool TooDeep { get; private init; }

    public static SyntaxTree Parse(SourceText source)
    {
        var (tokens, comments) = Lexer.Lex(source.Text);
        if (FirstTooDeep(tokens) is { } bracket)
        {
            var span = new TextSpan(0, source.Length);
            var diagnostic = DiagnosticCatalog.NestingTooDeep.At(bracket.Span, $"brackets are nested more than {MaxNesting} levels deep here; the file is not read");
            return new SyntaxTree(source, tokens, comments, new CompilationUnitSyntax([], span), [diagnostic]) { TooDeep = true };
        }
        var root = Parser.ParseTokens(tokens);
        var diagnostics = SyntaxDiagnostics.Collect(root);
        return new SyntaxTree(source, tokens, comments, root, diagnostics);
    }

    private static Token? FirstTooDeep(Token[] tokens)
    {
        int depth = 0;
        foreach (var t in tokens)
        {
            if (t.Kind is TokenKind.LParen or TokenKind.LBrace && ++depth > MaxNesting) return t;
            if (t.Kind is TokenKind.RParen or TokenKind.RBrace) depth = Math.Max(0, depth - 1);
        }
        return null;
    }
}
