using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.Semantics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// Semantic highlighting: the lexer's tokens coloured by what the evaluator knows (a phase, a
/// value, a loop variable, a block name), on top of the TextMate grammar's guesses.
/// </summary>
public static class SemanticTokens
{
    private static readonly string[] Types = ["keyword", "number", "type", "variable", "enumMember", "function", "comment", "class", "parameter"];
    private const int Keyword = 0, Number = 1, Unit = 2, Variable = 3, Phase = 4, Function = 5, Comment = 6, BlockName = 7, LoopVariable = 8;

    private static readonly string[] Modifiers = ["declaration", "readonly"];
    private const int Declaration = 1, Readonly = 2;

    public static JsonObject Legend() => new()
    {
        ["tokenTypes"] = new JsonArray([.. Types.Select(t => (JsonNode)t)]),
        ["tokenModifiers"] = new JsonArray([.. Modifiers.Select(m => (JsonNode)m)]),
    };

    public static JsonNode? Handle(Document document)
    {
        var c = document.Compilation;
        var names = new Dictionary<int, (int Type, int Modifiers)>();
        foreach (var symbol in c.Semantics.Symbols)
        {
            int type = symbol.Kind switch
            {
                SymbolKind.Value => Variable,
                SymbolKind.LoopVariable => LoopVariable,
                SymbolKind.Phase => Phase,
                _ => BlockName,
            };
            int modifiers = symbol.Kind == SymbolKind.Value ? Readonly : 0;
            names[symbol.Definition.Start] = (type, modifiers | Declaration);
            foreach (var r in symbol.References) names[r.Start] = (type, modifiers);
        }
        foreach (var call in SyntaxNavigation.DescendantsAndSelf(c.Syntax.Root).OfType<CallExpressionSyntax>())
            names[call.Function.Span.Start] = (Function, 0);

        var items = new List<(TextSpan Span, int Type, int Modifiers)>();
        foreach (var token in c.Syntax.Tokens)
        {
            switch (token.Kind)
            {
                case TokenKind.Number: items.Add((token.Span, Number, 0)); break;
                case TokenKind.Unit: items.Add((token.Span, Unit, 0)); break;
                case TokenKind.Word when names.TryGetValue(token.Span.Start, out var n): items.Add((token.Span, n.Type, n.Modifiers)); break;
                case TokenKind.Word when Vocabulary.IsReserved(token.Text): items.Add((token.Span, Keyword, 0)); break;
            }
        }
        foreach (var comment in c.Syntax.Comments) items.Add((comment.Span, Comment, 0));
        items.Sort((a, b) => a.Span.Start.CompareTo(b.Span.Start));
        return new JsonObject { ["data"] = Encode(c.Source, items) };
    }

    /// <summary>LSP's relative encoding: five integers per token (delta line, delta start, length, type, modifiers).</summary>
    private static JsonArray Encode(SourceText source, List<(TextSpan Span, int Type, int Modifiers)> items)
    {
        var data = new List<int>(items.Count * 5);
        int lastLine = 0, lastChar = 0;
        foreach (var (span, type, modifiers) in items)
        {
            if (span.Length == 0) continue;
            var start = source.GetPosition(span.Start);
            // Tokens never cross lines (comments end at the line break), but stay safe.
            int length = Math.Min(span.Length, Protocol.Positions.LineContentEnd(source, start.Line) - span.Start);
            if (length <= 0) continue;
            data.Add(start.Line - lastLine);
            data.Add(start.Line == lastLine ? start.Character - lastChar : start.Character);
            data.Add(length);
            data.Add(type);
            data.Add(modifiers);
            lastLine = start.Line;
            lastChar = start.Character;
        }
        return new JsonArray([.. data.Select(i => (JsonNode)i)]);
    }
}
