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

    /// <summary>
    /// True when the file was refused unread: larger than <see cref="InputLimits.MaxFileBytes"/>,
    /// nested deeper than <see cref="MaxNesting"/>, or with a line of more than
    /// <see cref="InputLimits.MaxOperatorsPerLine"/> operators. Its one diagnostic says which.
    /// </summary>
    public bool Refused { get; private init; }

    public static SyntaxTree Parse(SourceText source)
    {
        if (source.Length > InputLimits.MaxFileBytes)
            return RefusedTree(source, [], [], DiagnosticCatalog.FileTooLarge.At(new TextSpan(0, 0),
                $"the file has {source.Length:N0} characters, more than the limit of {InputLimits.MaxFileBytes:N0}; it is not read"));
        var (tokens, comments) = Lexer.Lex(source.Text);
        if (FirstTooDeep(tokens) is { } bracket)
            return RefusedTree(source, tokens, comments, DiagnosticCatalog.NestingTooDeep.At(bracket.Span,
                $"brackets are nested more than {MaxNesting} levels deep here; the file is not read"));
        // The evaluator and every tree walk recurse once per operand of a chain like 1 + 1 + ...;
        // the parser itself reads chains in a loop, but nothing after it must overflow the stack.
        if (FirstOperatorPastLimit(tokens) is { } op)
            return RefusedTree(source, tokens, comments, DiagnosticCatalog.ExpressionTooLong.At(op.Span,
                $"this line has more than {InputLimits.MaxOperatorsPerLine} operators; the file is not read"));
        var root = Parser.ParseTokens(tokens);
        var diagnostics = SyntaxDiagnostics.Collect(root);
        return new SyntaxTree(source, tokens, comments, root, diagnostics);
    }

    private static SyntaxTree RefusedTree(SourceText source, Token[] tokens, Comment[] comments, Diagnostic diagnostic) =>
        new(source, tokens, comments, new CompilationUnitSyntax([], new TextSpan(0, source.Length)), [diagnostic]) { Refused = true };

    private static Token? FirstOperatorPastLimit(Token[] tokens)
    {
        int operators = 0;
        foreach (var t in tokens)
        {
            if (t.Kind == TokenKind.NewLine) operators = 0;
            else if (t.Kind is TokenKind.Plus or TokenKind.Minus or TokenKind.Star or TokenKind.Slash or TokenKind.Percent
                && ++operators > InputLimits.MaxOperatorsPerLine) return t;
        }
        return null;
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
