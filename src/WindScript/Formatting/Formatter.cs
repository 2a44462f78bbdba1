using System.Text;
using WindScript.Syntax;

namespace WindScript.Formatting;

/// <summary>
/// The canonical formatter. It re-spaces the token stream (one statement per line, two-space
/// indentation per block, one space between words, none inside parentheses or after a sign),
/// keeps every comment where it was (own line or end of line) and at most one blank line in a
/// row. Working on tokens, not the tree, makes it meaning-preserving by construction: the only
/// tokens it may add are line breaks after '{' and before '}', which end statements anyway.
/// </summary>
public static class Formatter
{
    /// <summary>One level of indentation in canonical text.</summary>
    public const string Indent = "  ";

    /// <summary>The canonical text, or null when the file has syntax errors (it is then left alone).</summary>
    internal static string? Format(SyntaxTree tree)
    {
        if (tree.Diagnostics.Count > 0) return null;
        return new Writer(tree).Run();
    }

    /// <summary>The canonical form of a text, or null if it has syntax errors (comments are kept).</summary>
    public static string? Format(string text) => Format(SyntaxTree.Parse(text));

    private sealed class Writer(SyntaxTree tree)
    {
        private readonly string _text = tree.Source.Text;
        private readonly StringBuilder _out = new();
        private readonly List<Token> _line = [];
        private Comment? _trailing;
        private int _depth;
        private int _lastEnd = -1;       // end offset of the last thing written (token or comment)
        private bool _lastLineOpenedBlock = true;

        public string Run()
        {
            var tokens = tree.Tokens;
            var comments = tree.Comments;
            int c = 0;
            foreach (var token in tokens)
            {
                while (c < comments.Length && comments[c].Span.Start < token.Span.Start) Comment(comments[c++]);
                switch (token.Kind)
                {
                    case TokenKind.End:
                        FlushLine();
                        break;
                    case TokenKind.NewLine:
                        FlushLine();
                        break;
                    case TokenKind.LBrace:
                        _line.Add(token);
                        FlushLine();
                        _depth++;
                        _lastLineOpenedBlock = true;
                        break;
                    case TokenKind.RBrace:
                        FlushLine();
                        _depth = Math.Max(0, _depth - 1);
                        _line.Add(token);
                        break;
                    default:
                        _line.Add(token);
                        break;
                }
            }
            while (c < comments.Length) Comment(comments[c++]);
            FlushLine();
            return _out.ToString().TrimEnd('\n') + "\n";
        }

        private void Comment(Comment comment)
        {
            if (!comment.OwnLine && _line.Count > 0)
            {
                _trailing = comment;
                return;
            }
            FlushLine();
            StartLine(comment.Span.Start, closesBlock: false);
            _out.Append(IndentText(_depth)).Append(comment.Text).Append('\n');
            _lastEnd = comment.Span.End;
            _lastLineOpenedBlock = false;
        }

        private void FlushLine()
        {
            if (_line.Count == 0)
            {
                if (_trailing is { } orphan) { _trailing = null; Comment(orphan with { OwnLine = true }); }
                return;
            }
            bool closes = _line[0].Kind == TokenKind.RBrace;
            StartLine(_line[0].Span.Start, closes);
            _out.Append(IndentText(_depth));
            bool pattern = _line.Count >= 2 && _line[0].Kind == TokenKind.Word && Vocabulary.LayerWords.Contains(_line[0].Text) && _line[1].Kind == TokenKind.Colon;
            for (int i = 0; i < _line.Count; i++)
            {
                if (i > 0 && SpaceBetween(i, pattern)) _out.Append(' ');
                _out.Append(_line[i].Text);
            }
            _lastEnd = _line[^1].Span.End;
            if (_trailing is { } comment)
            {
                _out.Append("  ").Append(comment.Text);
                _lastEnd = comment.Span.End;
                _trailing = null;
            }
            _out.Append('\n');
            _lastLineOpenedBlock = _line[^1].Kind == TokenKind.LBrace;
            _line.Clear();
        }

        // Keeps one blank line where the source had one or more, except just inside braces.
        private void StartLine(int start, bool closesBlock)
        {
            if (_lastEnd < 0 || _lastLineOpenedBlock || closesBlock) return;
            int newlines = 0;
            for (int i = _lastEnd; i < start && i < _text.Length; i++)
                if (_text[i] == '\n') newlines++;
            if (newlines >= 2) _out.Append('\n');
        }

        private bool SpaceBetween(int i, bool patternLine)
        {
            var prev = _line[i - 1];
            var cur = _line[i];
            if (cur.Kind is TokenKind.Colon or TokenKind.Comma or TokenKind.RParen) return false;
            if (prev.Kind == TokenKind.LParen) return false;
            if (cur.Kind == TokenKind.LParen && prev.Kind == TokenKind.Word && !Vocabulary.IsReserved(prev.Text)) return false; // call
            if (prev.Kind is TokenKind.Minus or TokenKind.Plus && IsSign(i - 1, patternLine)) return false;
            return true;
        }

        private bool IsSign(int index, bool patternLine)
        {
            if (patternLine) return true;
            if (index == 0) return true;
            var before = _line[index - 1];
            return before.Kind switch
            {
                TokenKind.Number or TokenKind.Unit or TokenKind.RParen => false,
                TokenKind.Word => Vocabulary.IsReserved(before.Text),
                _ => true,
            };
        }

        private static string IndentText(int depth) => depth switch
        {
            0 => "",
            1 => Indent,
            2 => Indent + Indent,
            _ => string.Concat(Enumerable.Repeat(Indent, depth)),
        };
    }
}
