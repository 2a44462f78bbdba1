using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>
/// What statement recovery leaves in the tree while parsing: where the parse stopped (a token
/// index), where the skipped line ended, and what the grammar expected. Replaced by an
/// <see cref="ErrorStatementSyntax"/> before the tree leaves the parser.
/// </summary>
internal sealed record PendingErrorSyntax(int ErrorIndex, int EndIndex, IReadOnlyList<string> Expected) : StatementSyntax(default(TextSpan));

/// <summary>
/// Turns each <see cref="PendingErrorSyntax"/> into an <see cref="ErrorStatementSyntax"/> that
/// holds its line's tokens and the place of the mistake, and fixes the spans of unclosed
/// blocks that end on such a line. Runs once per parse on the token array of that parse, so
/// the parsers themselves stay free of per-parse state.
/// </summary>
internal static class ErrorStatements
{
    public static CompilationUnitSyntax Resolve(CompilationUnitSyntax unit, Token[] tokens)
    {
        var statements = Resolve(unit.Statements, tokens);
        return ReferenceEquals(statements, unit.Statements) ? unit : unit with { Statements = statements };
    }

    private static IReadOnlyList<StatementSyntax> Resolve(IReadOnlyList<StatementSyntax> statements, Token[] tokens)
    {
        StatementSyntax[]? changed = null;
        for (int i = 0; i < statements.Count; i++)
        {
            var statement = statements[i];
            var resolved = statement switch
            {
                PendingErrorSyntax pending => Build(pending, tokens),
                BlockSyntax block => WithBody(block, Resolve(block.Body, tokens)),
                ForSyntax loop => WithBody(loop, Resolve(loop.Body, tokens)),
                _ => statement,
            };
            if (ReferenceEquals(resolved, statement)) continue;
            changed ??= [.. statements];
            changed[i] = resolved;
        }
        return changed ?? statements;
    }

    private static StatementSyntax WithBody(BlockSyntax block, IReadOnlyList<StatementSyntax> body) =>
        ReferenceEquals(body, block.Body) ? block
            : block with { Body = body, Span = block.Closed || body.Count == 0 ? block.Span : block.Keyword.Span.Cover(body[^1].Span) };

    private static StatementSyntax WithBody(ForSyntax loop, IReadOnlyList<StatementSyntax> body) =>
        ReferenceEquals(body, loop.Body) ? loop
            : loop with { Body = body, Span = loop.Closed || body.Count == 0 ? loop.Span : loop.Keyword.Span.Cover(body[^1].Span) };

    private static ErrorStatementSyntax Build(PendingErrorSyntax pending, Token[] tokens)
    {
        int at = Math.Clamp(pending.ErrorIndex, 0, tokens.Length - 1);
        int start = StatementStart(tokens, at);
        var kind = SyntaxErrorKind.Unexpected;
        // An unknown word at the start of a line is the mistake, whatever follows it.
        if (tokens[start].Kind == TokenKind.Word && !Vocabulary.IsReserved(tokens[start].Text)
            && (start + 1 >= tokens.Length || tokens[start + 1].Kind != TokenKind.Equals))
        {
            at = start;
            kind = SyntaxErrorKind.UnknownStatement;
        }
        else if (tokens[at].Kind == TokenKind.Bad)
        {
            kind = SyntaxErrorKind.BadCharacter;
        }
        var found = tokens[at];
        // Point at the offending token; at an end of line, point just after the last word so
        // the caret sits where something is missing.
        var errorSpan = found.Kind is TokenKind.NewLine or TokenKind.End && at > 0
            ? new TextSpan(tokens[at - 1].Span.End, 0)
            : found.Span;
        int last = Math.Clamp(pending.EndIndex - 1, start, tokens.Length - 1);
        var span = TextSpan.FromBounds(tokens[start].Span.Start, Math.Max(tokens[last].Span.End, errorSpan.End));
        int count = Math.Max(last, at) - start + 1;
        return new ErrorStatementSyntax(kind, new ArraySegment<Token>(tokens, start, count), at - start, pending.Expected, errorSpan, span);
    }

    private static int StatementStart(Token[] tokens, int at)
    {
        int i = Math.Min(at, tokens.Length - 1);
        while (i > 0 && tokens[i - 1].Kind is not (TokenKind.NewLine or TokenKind.LBrace or TokenKind.RBrace)) i--;
        return i;
    }
}
