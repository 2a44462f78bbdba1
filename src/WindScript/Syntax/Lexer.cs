using WindScript.Text;
using WindScript.Units;

namespace WindScript.Syntax;

/// <summary>
/// Turns text into tokens. Line breaks are significant (one fact per line), so they are tokens;
/// runs of blank or comment-only lines fold into one. Comments go to a side list. The lexer
/// never fails: an unknown character becomes a Bad token for the parser to report.
/// </summary>
internal static class Lexer
{
    public static (Token[] Tokens, Comment[] Comments) Lex(string text)
    {
        using var tokens = new TokenBuffer(text.Length / 3);
        // Files repeat the same few words ("coil", "U", "turns") thousands of times: share one string each.
        var pool = new Dictionary<string, string>(StringComparer.Ordinal).GetAlternateLookup<ReadOnlySpan<char>>();
        string Text(int start, int end)
        {
            var span = text.AsSpan(start, end - start);
            if (pool.TryGetValue(span, out var known)) return known;
            var created = span.ToString();
            pool[created] = created;
            return created;
        }
        var comments = new List<Comment>();
        int i = 0;
        bool lineHasCode = false;
        while (i < text.Length)
        {
            char c = text[i];
            if (c == ' ' || c == '\t' || c == '\f' || c == '\v' || c == '\uFEFF') { i++; continue; }
            if (c == '\r' || c == '\n')
            {
                int start = i;
                i += c == '\r' && i + 1 < text.Length && text[i + 1] == '\n' ? 2 : 1;
                // Only a line that had code ends a statement; the newline token is folded.
                if (tokens.Count > 0 && tokens.Last.Kind != TokenKind.NewLine && lineHasCode)
                    tokens.Add(new Token(TokenKind.NewLine, "\n", TextSpan.FromBounds(start, i)));
                lineHasCode = false;
                continue;
            }
            if (c == '#')
            {
                int start = i;
                while (i < text.Length && text[i] != '\r' && text[i] != '\n') i++;
                comments.Add(new Comment(text[start..i].TrimEnd(), TextSpan.FromBounds(start, i), !lineHasCode));
                continue;
            }
            lineHasCode = true;
            if (char.IsAsciiDigit(c) || (c == '.' && i + 1 < text.Length && char.IsAsciiDigit(text[i + 1])))
            {
                int start = i;
                i = ScanNumber(text, i);
                tokens.Add(new Token(TokenKind.Number, Text(start, i), TextSpan.FromBounds(start, i)));
                int unitStart = i;
                while (unitStart < text.Length && (text[unitStart] == ' ' || text[unitStart] == '\t')) unitStart++;
                if (MatchUnit(text, unitStart) is { } unit)
                {
                    tokens.Add(new Token(TokenKind.Unit, unit, new TextSpan(unitStart, unit.Length)));
                    i = unitStart + unit.Length;
                }
                continue;
            }
            if (IsWordStart(c))
            {
                int start = i;
                while (i < text.Length && IsWordPart(text[i])) i++;
                tokens.Add(new Token(TokenKind.Word, Text(start, i), TextSpan.FromBounds(start, i)));
                continue;
            }
            var (kind, length) = Punctuation(text, i);
            tokens.Add(new Token(kind, Text(i, i + length), new TextSpan(i, length)));
            i += length;
        }
        tokens.Add(new Token(TokenKind.End, "", new TextSpan(text.Length, 0)));
        return (tokens.ToArray(), comments.ToArray());
    }

    public static bool IsWordStart(char c) => char.IsLetter(c) || c == '_';

    public static bool IsWordPart(char c) => char.IsLetterOrDigit(c) || c == '_';

    private static int ScanNumber(string text, int i)
    {
        while (i < text.Length && char.IsAsciiDigit(text[i])) i++;
        // A '.' belongs to the number only if a digit follows: "0 .. 11" and "0..11" are ranges.
        if (i + 1 < text.Length && text[i] == '.' && char.IsAsciiDigit(text[i + 1]))
        {
            i++;
            while (i < text.Length && char.IsAsciiDigit(text[i])) i++;
        }
        if (i < text.Length && (text[i] == 'e' || text[i] == 'E'))
        {
            int j = i + 1;
            if (j < text.Length && (text[j] == '+' || text[j] == '-')) j++;
            if (j < text.Length && char.IsAsciiDigit(text[j]))
            {
                while (j < text.Length && char.IsAsciiDigit(text[j])) j++;
                i = j;
            }
        }
        return i;
    }

    private static string? MatchUnit(string text, int at)
    {
        if (at >= text.Length || !char.IsAsciiLetter(text[at])) return null; // every unit starts with a letter
        foreach (var symbol in UnitTable.SymbolsLongestFirst)
        {
            if (string.CompareOrdinal(text, at, symbol, 0, symbol.Length) != 0) continue;
            int end = at + symbol.Length;
            if (end < text.Length && IsWordPart(text[end])) continue;
            return symbol;
        }
        return null;
    }

    private static (TokenKind, int) Punctuation(string text, int i)
    {
        char c = text[i];
        char next = i + 1 < text.Length ? text[i + 1] : '\0';
        return c switch
        {
            '{' => (TokenKind.LBrace, 1),
            '}' => (TokenKind.RBrace, 1),
            '(' => (TokenKind.LParen, 1),
            ')' => (TokenKind.RParen, 1),
            ':' => (TokenKind.Colon, 1),
            ',' => (TokenKind.Comma, 1),
            '=' => (TokenKind.Equals, 1),
            '-' when next == '>' => (TokenKind.Arrow, 2),
            '.' when next == '.' => (TokenKind.DotDot, 2),
            '+' => (TokenKind.Plus, 1),
            '-' => (TokenKind.Minus, 1),
            '*' => (TokenKind.Star, 1),
            '/' => (TokenKind.Slash, 1),
            '%' => (TokenKind.Percent, 1),
            _ => (TokenKind.Bad, char.IsSurrogatePair(text, i) ? 2 : 1),
        };
    }
}
