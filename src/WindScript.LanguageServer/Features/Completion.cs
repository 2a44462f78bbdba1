using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.Semantics;
using WindScript.Syntax;
using WindScript.Units;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// Completion: the keywords a statement may start with in the enclosing block, the words that
/// may follow inside a statement (coil options, waveform words), phase names, the units that
/// fit after a number, and the names in scope with their values.
/// </summary>
public static class Completion
{
    private static readonly string[] TopLevel = ["machine", "winding", "drive", "let"];
    private static readonly string[] MachineBody = ["slots", "poles", "phases", "bore", "stack", "gap", "slot_opening", "rotor_radius", "skew", "phase_shift", "gap_flux_density", "let"];
    private static readonly string[] WindingBody = ["layers", "turns", "pitch", "paths", "series_turns", "conductors_per_slot", "coil", "top:", "bottom:", "slots:", "for", "group", "let"];
    private static readonly string[] GroupBody = ["turns", "pitch", "coil", "top:", "bottom:", "slots:", "for", "let"];
    private static readonly string[] LoopBody = ["coil", "for", "let"];
    private static readonly string[] DriveBody = ["balanced", "neutral", "let"];
    private static readonly string[] Functions = ["wrap", "abs", "min", "max", "floor", "ceil", "round", "sqrt", "gcd", "lcm"];

    private static readonly string[] Lengths = ["mm", "cm", "m"];
    private static readonly string[] Currents = ["A", "kA"];
    private static readonly string[] Frequencies = ["Hz", "rad/s", "rpm"];
    private static readonly string[] Angles = ["deg", "rad"];

    public static JsonNode? Handle(Document document, JsonObject parameters)
    {
        var c = document.Compilation;
        int offset = Positions.ToOffset(c.Source, parameters["position"]);
        var context = CompletionContext.At(c.Syntax, offset);
        var items = new List<JsonObject>();
        if (!context.InComment) Suggest(context, c, offset, items);
        var replace = Positions.Range(c.Source, context.ReplaceSpan(offset));
        var result = new JsonArray();
        foreach (var item in items)
        {
            item["textEdit"] = new JsonObject { ["range"] = replace.DeepClone(), ["newText"] = (string?)item["insertText"] ?? (string)item["label"]! };
            item.Remove("insertText");
            result.Add((JsonNode)item);
        }
        return new JsonObject { ["isIncomplete"] = false, ["items"] = result };
    }

    private static void Suggest(CompletionContext x, Compilation c, int offset, List<JsonObject> items)
    {
        var phases = PhaseNames(c);
        if (x.AtStatementStart)
        {
            string[] keywords = x.Block switch
            {
                "" => TopLevel,
                "machine" => MachineBody,
                "winding" => WindingBody,
                "group" => GroupBody,
                "for" => LoopBody,
                "drive" => DriveBody,
                _ => [],
            };
            foreach (var k in keywords) items.Add(Keyword(k));
            if (x.Block == "drive")
                foreach (var p in phases) items.Add(Item($"{p} =", Lsp.CompletionItemKind.EnumMember, $"the current of phase {p}", insert: $"{p} = "));
            return;
        }

        var last = x.Last!.Value;
        bool afterNumber = last.Kind == TokenKind.Number;
        switch (x.First)
        {
            case "machine" or "winding" or "group" or "drive" or "phases" when x.Statement.Count == 1 || x.First == "phases":
                return; // a new name is being written
            case "let":
                if (x.Has(TokenKind.Equals)) Expression(x, c, offset, items, afterNumber ? UnitTable.All.Select(u => u.Symbol).ToArray() : []);
                return;
            case "bore" or "stack" or "gap" or "slot_opening" or "rotor_radius":
                Expression(x, c, offset, items, afterNumber ? Lengths : []);
                return;
            case "skew":
                Expression(x, c, offset, items, afterNumber ? ["slots", .. Angles] : []);
                return;
            case "phase_shift":
                Expression(x, c, offset, items, afterNumber ? Angles : []);
                return;
            case "gap_flux_density":
                Expression(x, c, offset, items, afterNumber ? ["T", "mT"] : []);
                return;
            case "pitch":
                Expression(x, c, offset, items, afterNumber ? ["slots"] : []);
                return;
            case "coil":
                Coil(x, c, offset, items, phases);
                return;
            case "top" or "bottom" or "slots" when x.Statement.Count >= 2 && x.Statement[1].Kind == TokenKind.Colon:
                if (last.Text == "repeat") { Expression(x, c, offset, items, []); return; }
                foreach (var p in phases)
                {
                    items.Add(Item(p, Lsp.CompletionItemKind.EnumMember, $"phase {p}, go side (+)"));
                    items.Add(Item("-" + p, Lsp.CompletionItemKind.EnumMember, $"phase {p}, return side (−)", filter: p));
                }
                items.Add(Item("_", Lsp.CompletionItemKind.Value, "an empty slot position"));
                items.Add(Keyword("repeat"));
                return;
            case "for":
                if (x.Statement.Count == 1) return;
                if (x.Statement.Count == 2) { items.Add(Keyword("in")); return; }
                if (x.Has(TokenKind.DotDot) && last.Kind != TokenKind.DotDot && last.Text != "step" && !x.Has("step")) items.Add(Keyword("step"));
                Expression(x, c, offset, items, []);
                return;
            case "balanced":
                if (x.Has("sequence")) { PhaseItems(phases, items); return; }
                if (!x.Has("sine")) { items.Add(Keyword("sine")); return; }
                Waveform(x, c, offset, items, balanced: true);
                return;
        }
        if (x.Statement.Count >= 2 && x.Statement[1].Kind == TokenKind.Equals && x.Block == "drive")
        {
            Waveform(x, c, offset, items, balanced: false);
            return;
        }
        Expression(x, c, offset, items, []);
    }

    private static void Coil(CompletionContext x, Compilation c, int offset, List<JsonObject> items, IReadOnlyList<string> phases)
    {
        var last = x.Last!.Value;
        if (x.Statement.Count == 1 || (x.Statement.Count == 2 && last.Kind == TokenKind.Minus))
        {
            PhaseItems(phases, items);
            return;
        }
        if (last.Text == "layer") { items.Add(Keyword("top")); items.Add(Keyword("bottom")); return; }
        int arrow = IndexOf(x, TokenKind.Arrow);
        if (arrow >= 0 && x.Statement.Count > arrow + 1 && last.Kind is TokenKind.Number or TokenKind.Word or TokenKind.RParen && last.Text is not ("turns" or "layer"))
        {
            if (!x.Has("turns")) items.Add(Keyword("turns"));
            if (!x.Has("layer")) items.Add(Keyword("layer"));
        }
        if (x.Has(TokenKind.Colon)) Expression(x, c, offset, items, []);
    }

    /// <summary>Inside a waveform: sine/dc, then amplitude and its unit, peak/rms, at, frequency, phase, sequence.</summary>
    private static void Waveform(CompletionContext x, Compilation c, int offset, List<JsonObject> items, bool balanced)
    {
        var last = x.Last!.Value;
        // A new term starts after '=' or after a '+' or '-' that follows a finished term.
        if (!balanced && (last.Kind == TokenKind.Equals || last.Kind is TokenKind.Plus or TokenKind.Minus && EndsTerm(x)))
        {
            items.Add(Keyword("sine"));
            items.Add(Keyword("dc"));
            return;
        }
        string keyword = x.LastKeyword("sine", "dc", "peak", "rms", "at", "phase");
        bool afterUnit = last.Kind == TokenKind.Unit;
        switch (keyword)
        {
            case "sine":
                if (last.Kind == TokenKind.Number) { Units(Currents, items); return; }
                if (afterUnit) { items.Add(Keyword("peak")); items.Add(Keyword("rms")); return; }
                Expression(x, c, offset, items, []);
                return;
            case "peak" or "rms":
                if (last.Text is "peak" or "rms") items.Add(Keyword("at"));
                return;
            case "at" or "phase":
                if (last.Kind == TokenKind.Number) { Units(keyword == "at" ? Frequencies : Angles, items); return; }
                if (afterUnit || last.Kind == TokenKind.Word && last.Text != keyword)
                {
                    if (keyword == "at") items.Add(Keyword("phase"));
                    if (balanced) items.Add(Keyword("sequence"));
                    return;
                }
                Expression(x, c, offset, items, []);
                return;
            case "dc":
                if (last.Kind == TokenKind.Number) { Units(Currents, items); return; }
                Expression(x, c, offset, items, []);
                return;
        }
    }

    /// <summary>True when the token before the last one ends a waveform term (a value, not a keyword awaiting one).</summary>
    private static bool EndsTerm(CompletionContext x) =>
        x.Statement.Count >= 2 && x.Statement[^2].Kind is TokenKind.Unit or TokenKind.Number or TokenKind.Word or TokenKind.RParen && x.Statement[^2].Text is not ("sine" or "dc" or "at" or "phase");

    private static void Expression(CompletionContext x, Compilation c, int offset, List<JsonObject> items, string[] units)
    {
        if (units.Length > 0)
        {
            Units(units, items);
            return;
        }
        foreach (var symbol in NamesInScope(c, offset))
        {
            bool loop = symbol.Kind == SymbolKind.LoopVariable;
            items.Add(Item(symbol.Name, loop ? Lsp.CompletionItemKind.Variable : Lsp.CompletionItemKind.Constant,
                loop ? "loop variable" : symbol.Value is { } v ? $"= {v}" : "value"));
        }
        foreach (var f in Functions)
            items.Add(Item(f, Lsp.CompletionItemKind.Function, f == "wrap" ? "wrap(n): slot number brought into 1..Q" : $"{f}(…)", insert: f + "("));
    }

    /// <summary>Values and loop variables defined above the cursor in a block that encloses it.</summary>
    internal static IEnumerable<Symbol> NamesInScope(Compilation c, int offset)
    {
        var root = c.Syntax.Root;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var symbol in c.Semantics.Symbols.Where(s => s.Kind is SymbolKind.Value or SymbolKind.LoopVariable).OrderByDescending(s => s.Definition.Start))
        {
            if (symbol.Definition.End > offset) continue;
            var container = SyntaxNavigation.PathAt(root, symbol.Definition.Start)
                .LastOrDefault(n => n is BlockSyntax or ForSyntax);
            bool visible = container is null || container.Span.Contains(offset) || container.Span.End == offset
                || container is BlockSyntax { Closed: false } or ForSyntax { Closed: false };
            if (visible && seen.Add(symbol.Name)) yield return symbol;
        }
    }

    private static void Units(IEnumerable<string> symbols, List<JsonObject> items)
    {
        foreach (var s in symbols)
        {
            var unit = UnitTable.Find(s);
            items.Add(Item(s, Lsp.CompletionItemKind.Unit, unit is null ? "unit" : $"unit of {unit.Dimension.Describe().Replace("a ", "").Replace("an ", "")}"));
        }
    }

    private static void PhaseItems(IReadOnlyList<string> phases, List<JsonObject> items)
    {
        foreach (var p in phases) items.Add(Item(p, Lsp.CompletionItemKind.EnumMember, $"phase {p}"));
    }

    private static IReadOnlyList<string> PhaseNames(Compilation c)
    {
        if (c.Design is { } d) return d.Phases.Select(p => p.Name).ToArray();
        var statement = SyntaxNavigation.DescendantsAndSelf(c.Syntax.Root).OfType<PhasesSyntax>().FirstOrDefault();
        return statement?.Names.Select(n => n.Text).Distinct().ToArray() ?? [];
    }

    private static int IndexOf(CompletionContext x, TokenKind kind)
    {
        for (int i = 0; i < x.Statement.Count; i++) if (x.Statement[i].Kind == kind) return i;
        return -1;
    }

    private static JsonObject Keyword(string word)
    {
        string bare = word.TrimEnd(':');
        return Item(word, Lsp.CompletionItemKind.Keyword, KeywordHelp.For(bare) ?? "keyword", insert: word.EndsWith(':') ? word + " " : null, filter: bare);
    }

    private static JsonObject Item(string label, int kind, string detail, string? insert = null, string? filter = null)
    {
        var item = new JsonObject { ["label"] = label, ["kind"] = kind, ["detail"] = detail };
        if (insert is not null) item["insertText"] = insert;
        if (filter is not null) item["filterText"] = filter;
        return item;
    }
}
