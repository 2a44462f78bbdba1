using System.Text;
using System.Text.RegularExpressions;
using WindScript.Syntax;

namespace WindScript.Tests.Support;

/// <summary>
/// A small EBNF reader, independent of the parser: reads grammar/windscript.ebnf (ISO 14977:
/// ',' sequence, '|' choice, [ ] optional, { } repetition, ( ) grouping, (* *) comments) and
/// recognises token streams by its rules, exploring every alternative (a set of end positions
/// per rule and start, memoised), so it needs no lookahead tricks. The lexical rules the
/// grammar leaves to prose are token classes: name, number, unit, newline; end_of_statement is
/// a newline, or (without consuming it) a '}' or the end of the file, as its comment says.
/// </summary>
internal sealed class Ebnf
{
    public abstract record Node;
    public sealed record Literal(string Text) : Node;
    public sealed record RuleRef(string Name) : Node;
    public sealed record Sequence(IReadOnlyList<Node> Items) : Node;
    public sealed record Choice(IReadOnlyList<Node> Options) : Node;
    public sealed record Optional(Node Inner) : Node;
    public sealed record Repeat(Node Inner) : Node;

    public IReadOnlyDictionary<string, Node> Rules { get; }

    /// <summary>Words the grammar quotes outside the lexical rules: the reserved words, by the grammar's own account.</summary>
    public IReadOnlySet<string> QuotedWords { get; }

    private Ebnf(Dictionary<string, Node> rules)
    {
        Rules = rules;
        var words = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (name, node) in rules)
            if (name is not ("unit" or "number")) Collect(node, words);
        QuotedWords = words;
    }

    private static void Collect(Node node, HashSet<string> words)
    {
        switch (node)
        {
            case Literal l when Regex.IsMatch(l.Text, "^[A-Za-z_][A-Za-z_0-9]*$"): words.Add(l.Text); break;
            case Sequence s: foreach (var i in s.Items) Collect(i, words); break;
            case Choice c: foreach (var o in c.Options) Collect(o, words); break;
            case Optional o: Collect(o.Inner, words); break;
            case Repeat r: Collect(r.Inner, words); break;
        }
    }

    // ---- reading the grammar ---------------------------------------------------------------------

    public static Ebnf Read(string text)
    {
        text = Regex.Replace(text, @"\(\*.*?\*\)", " ", RegexOptions.Singleline);
        var tokens = Regex.Matches(text, @"'[^']*'|[A-Za-z_][A-Za-z_0-9]*|[=,|\[\]{}();]").Select(m => m.Value).ToList();
        var rules = new Dictionary<string, Node>(StringComparer.Ordinal);
        int i = 0;
        while (i < tokens.Count)
        {
            string name = tokens[i++];
            if (tokens[i++] != "=") throw new FormatException($"rule {name}: expected '='");
            rules[name] = ReadChoice(tokens, ref i);
            if (tokens[i++] != ";") throw new FormatException($"rule {name}: expected ';'");
        }
        return new Ebnf(rules);
    }

    private static Node ReadChoice(List<string> t, ref int i)
    {
        var options = new List<Node> { ReadSequence(t, ref i) };
        while (t[i] == "|") { i++; options.Add(ReadSequence(t, ref i)); }
        return options.Count == 1 ? options[0] : new Choice(options);
    }

    private static Node ReadSequence(List<string> t, ref int i)
    {
        var items = new List<Node> { ReadItem(t, ref i) };
        while (t[i] == ",") { i++; items.Add(ReadItem(t, ref i)); }
        return items.Count == 1 ? items[0] : new Sequence(items);
    }

    private static Node ReadItem(List<string> t, ref int i)
    {
        string s = t[i++];
        Node Group(string close, Func<Node, Node> wrap, ref int j)
        {
            var inner = ReadChoice(t, ref j);
            if (t[j++] != close) throw new FormatException($"expected '{close}'");
            return wrap(inner);
        }
        return s switch
        {
            "[" => Group("]", n => new Optional(n), ref i),
            "{" => Group("}", n => new Repeat(n), ref i),
            "(" => Group(")", n => n, ref i),
            _ when s.StartsWith('\'') => new Literal(s[1..^1]),
            _ => new RuleRef(s),
        };
    }

    // ---- recognising tokens ------------------------------------------------------------------------

    /// <summary>True if the tokens (ending with the end-of-file token) form a <paramref name="start"/> of the grammar.</summary>
    public bool Accepts(IReadOnlyList<Token> tokens, string start = "file")
    {
        var memo = new Dictionary<(string, int), HashSet<int>>();
        var ends = Match(new RuleRef(start), 0, tokens, memo);
        return ends.Contains(tokens.Count - 1);
    }

    private HashSet<int> Match(Node node, int at, IReadOnlyList<Token> t, Dictionary<(string, int), HashSet<int>> memo)
    {
        switch (node)
        {
            case Literal l:
                return at < t.Count && t[at].Kind is not (TokenKind.Number or TokenKind.Unit or TokenKind.End) && t[at].Text == l.Text ? [at + 1] : [];
            case RuleRef r:
                if (memo.TryGetValue((r.Name, at), out var known)) return known;
                memo[(r.Name, at)] = []; // no left recursion in the grammar; guards against it anyway
                var result = r.Name switch
                {
                    "name" => Is(t, at, TokenKind.Word) && !QuotedWords.Contains(t[at].Text) ? [at + 1] : [],
                    "number" => Is(t, at, TokenKind.Number) ? [at + 1] : [],
                    "unit" => Is(t, at, TokenKind.Unit) ? [at + 1] : [],
                    "newline" => Is(t, at, TokenKind.NewLine) ? [at + 1] : [],
                    "end_of_statement" => Is(t, at, TokenKind.NewLine) ? [at + 1] : Is(t, at, TokenKind.RBrace) || Is(t, at, TokenKind.End) ? [at] : [],
                    _ => Match(Rules[r.Name], at, t, memo),
                };
                memo[(r.Name, at)] = result;
                return result;
            case Sequence s:
                var positions = new HashSet<int> { at };
                foreach (var item in s.Items)
                {
                    var next = new HashSet<int>();
                    foreach (var p in positions) next.UnionWith(Match(item, p, t, memo));
                    positions = next;
                    if (positions.Count == 0) break;
                }
                return positions;
            case Choice c:
                var any = new HashSet<int>();
                foreach (var o in c.Options) any.UnionWith(Match(o, at, t, memo));
                return any;
            case Optional o:
                var maybe = Match(o.Inner, at, t, memo);
                maybe.Add(at);
                return maybe;
            case Repeat rep:
                var all = new HashSet<int> { at };
                var frontier = new HashSet<int> { at };
                while (frontier.Count > 0)
                {
                    var grown = new HashSet<int>();
                    foreach (var p in frontier)
                        foreach (var e in Match(rep.Inner, p, t, memo))
                            if (e > p && all.Add(e)) grown.Add(e);
                    frontier = grown;
                }
                return all;
        }
        throw new InvalidOperationException(node.ToString());
    }

    private static bool Is(IReadOnlyList<Token> t, int at, TokenKind kind) => at < t.Count && t[at].Kind == kind;

    /// <summary>A lexical rule whose terminals are characters (such as number) as a regular expression; 'digits' is one or more digits.</summary>
    public string LexicalRegex(string rule)
    {
        var sb = new StringBuilder();
        void Write(Node n)
        {
            switch (n)
            {
                case Literal l: sb.Append(Regex.Escape(l.Text)); break;
                case RuleRef { Name: "digits" }: sb.Append("[0-9]+"); break;
                case RuleRef r: Write(Rules[r.Name]); break;
                case Sequence s: sb.Append("(?:"); foreach (var i in s.Items) Write(i); sb.Append(')'); break;
                case Choice c: sb.Append("(?:"); for (int k = 0; k < c.Options.Count; k++) { if (k > 0) sb.Append('|'); Write(c.Options[k]); } sb.Append(')'); break;
                case Optional o: sb.Append("(?:"); Write(o.Inner); sb.Append(")?"); break;
                case Repeat r: sb.Append("(?:"); Write(r.Inner); sb.Append(")*"); break;
            }
        }
        Write(Rules[rule]);
        return "^" + sb + "$";
    }
}
