using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// Where the cursor is, read from the tokens rather than the tree so that it works on the
/// half-typed line the user is editing: the enclosing blocks, the tokens of the current
/// statement before the cursor, and the word being typed.
/// </summary>
public sealed class CompletionContext
{
    private CompletionContext(IReadOnlyList<string> blocks, IReadOnlyList<Token> statement, Token? partial, bool inComment)
    {
        Blocks = blocks;
        Statement = statement;
        Partial = partial;
        InComment = inComment;
    }

    /// <summary>The keywords of the enclosing blocks, outermost first ("winding", "group", "for").</summary>
    public IReadOnlyList<string> Blocks { get; }

    /// <summary>The innermost enclosing block keyword, or "" at top level.</summary>
    public string Block => Blocks.Count > 0 ? Blocks[^1] : "";

    /// <summary>The tokens of the current statement before the cursor, without the word being typed.</summary>
    internal IReadOnlyList<Token> Statement { get; }

    /// <summary>The word (or unit) the cursor is in or just after, if any.</summary>
    internal Token? Partial { get; }

    public bool InComment { get; }

    public bool AtStatementStart => Statement.Count == 0;

    internal Token? Last => Statement.Count > 0 ? Statement[^1] : null;

    public string First => Statement.Count > 0 ? Statement[0].Text : "";

    public bool Has(string word) => Statement.Any(t => t.Kind == TokenKind.Word && t.Text == word);

    internal bool Has(TokenKind kind) => Statement.Any(t => t.Kind == kind);

    /// <summary>The last reserved word of the statement, or "" if none.</summary>
    public string LastKeyword(params string[] among) =>
        Statement.LastOrDefault(t => t.Kind == TokenKind.Word && among.Contains(t.Text)).Text ?? "";

    internal static CompletionContext At(SyntaxTree tree, int offset)
    {
        bool inComment = tree.Comments.Any(c => c.Span.Start < offset && offset <= c.Span.End);
        var tokens = tree.Tokens;
        var blocks = new List<string>();
        var statement = new List<Token>();
        Token? partial = null;
        foreach (var token in tokens)
        {
            if (token.Kind == TokenKind.End || token.Span.Start >= offset) break;
            if (token.Span.End >= offset && token.Kind is TokenKind.Word or TokenKind.Unit)
            {
                partial = token; // the cursor is inside or right after this word
                break;
            }
            switch (token.Kind)
            {
                case TokenKind.NewLine:
                    statement.Clear();
                    break;
                case TokenKind.LBrace:
                    blocks.Add(statement.Count > 0 && statement[0].Kind == TokenKind.Word ? statement[0].Text : "");
                    statement.Clear();
                    break;
                case TokenKind.RBrace:
                    if (blocks.Count > 0) blocks.RemoveAt(blocks.Count - 1);
                    statement.Clear();
                    break;
                default:
                    statement.Add(token);
                    break;
            }
        }
        return new CompletionContext(blocks, statement, partial, inComment);
    }

    /// <summary>The range the chosen item replaces: the word being typed, or an empty range at the cursor.</summary>
    public TextSpan ReplaceSpan(int offset) => Partial is { } p ? TextSpan.FromBounds(p.Span.Start, offset) : new TextSpan(offset, 0);
}
