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
    // What may start a statement, per enclosing block: all from the vocabulary table.
    private static readonly string[] TopLevel = [.. Vocabulary.Blocks.Where(b => b.TopLevel).Select(b => b.Word), Vocabulary.Let];
    private static readonly Dictionary<BlockKind, string[]> BlockBodies = Vocabulary.Blocks.ToDictionary(
        b => b.Kind, b => Vocabulary.PropertiesOf(b.Kind).Select(p => p.Word).Concat(b.OtherStatements).ToArray());
    private static readonly string Turns = Vocabulary.Word(PropertyName.Turns);
    private static readonly string[] LoopBody = [Vocabulary.Coil, Vocabulary.For, Vocabulary.Let];

    private static readonly string[] Currents = [.. Vocabulary.UnitsFor(Dimension.CurrentDim)];
    private static readonly string[] Frequencies = [.. Vocabulary.UnitsFor(Dimension.AngularFrequency)];
    private static readonly string[] Angles = [.. Vocabulary.UnitsFor(Dimension.AngleDim)];

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
                Vocabulary.For => LoopBody,
                var word when Vocabulary.Block(word) is { } block => BlockBodies[block.Kind],
                _ => [],
            };
            foreach (var k in keywords) items.Add(Keyword(k));
            if (x.Block == Vocabulary.Word(BlockKind.Drive))
                foreach (var p in phases) items.Add(Item($"{p} =", Lsp.CompletionItemKind.EnumMember, $"the current of phase {p}", insert: $"{p} = "));
            return;
        }

        var last = x.Last!.Value;
        bool afterNumber = last.Kind == TokenKind.Number;
        if (x.Statement.Count >= 2 && x.Statement[1].Kind == TokenKind.Colon && Vocabulary.LayerOf(x.First) is not null)
        {
            PatternLine(x, c, offset, items, phases);
            return;
        }
        if ((Vocabulary.Block(x.First) is not null && x.Statement.Count == 1) || x.First == Vocabulary.PhasesWord)
            return; // a new name is being written
        if (Vocabulary.Property(x.First) is { Value: ValueKind.Quantity } property)
        {
            string[] units = afterNumber ? [.. Vocabulary.UnitsFor(property.Dimension), .. property.AlsoAccepts is { } also ? Vocabulary.UnitsFor(also) : []] : [];
            Expression(x, c, offset, items, units);
            return;
        }
        if (Vocabulary.Property(x.First) is { Value: ValueKind.Word, Words: { } words } wordProperty)
        {
            // A property that takes a word (rotor inside|outside): offer the words, once.
            if (x.Statement.Count == 1 || (x.Statement.Count == 2 && last.Kind == TokenKind.Word && last.Span.End >= offset))
                foreach (var w in words) items.Add(Item(w, Lsp.CompletionItemKind.EnumMember, $"{wordProperty.Word} {w}"));
            return;
        }
        switch (x.First)
        {
            case Vocabulary.Let:
                if (x.Has(TokenKind.Equals)) Expression(x, c, offset, items, afterNumber ? Vocabulary.Units.Select(u => u.Symbol).ToArray() : []);
                return;
            case Vocabulary.Coil:
                Coil(x, c, offset, items, phases);
                return;
            case Vocabulary.For:
                if (x.Statement.Count == 1) return;
                if (x.Statement.Count == 2) { items.Add(Keyword(Vocabulary.In)); return; }
                if (x.Has(TokenKind.DotDot) && last.Kind != TokenKind.DotDot && last.Text != Vocabulary.Step && !x.Has(Vocabulary.Step)) items.Add(Keyword(Vocabulary.Step));
                Expression(x, c, offset, items, []);
                return;
            case Vocabulary.Balanced:
                if (x.Has(Vocabulary.Sequence)) { PhaseItems(phases, items); return; }
                if (!x.Has(Vocabulary.Sine)) { items.Add(Keyword(Vocabulary.Sine)); return; }
                Waveform(x, c, offset, items, balanced: true);
                return;
        }
        if (x.Statement.Count >= 2 && x.Statement[1].Kind == TokenKind.Equals && x.Block == Vocabulary.Word(BlockKind.Drive))
        {
            Waveform(x, c, offset, items, balanced: false);
            return;
        }
        Expression(x, c, offset, items, []);
    }

    private static void PatternLine(CompletionContext x, Compilation c, int offset, List<JsonObject> items, IReadOnlyList<string> phases)
    {
        if (x.Last!.Value.Text == Vocabulary.Repeat) { Expression(x, c, offset, items, []); return; }
        foreach (var p in phases)
        {
            items.Add(Item(p, Lsp.CompletionItemKind.EnumMember, $"phase {p}, go side (+)"));
            items.Add(Item("-" + p, Lsp.CompletionItemKind.EnumMember, $"phase {p}, return side (−)", filter: p));
        }
        items.Add(Item(Vocabulary.EmptySlot, Lsp.CompletionItemKind.Value, "an empty slot position"));
        items.Add(Keyword(Vocabulary.Repeat));
    }

    private static void Coil(CompletionContext x, Compilation c, int offset, List<JsonObject> items, IReadOnlyList<string> phases)
    {
        var last = x.Last!.Value;
        if (x.Statement.Count == 1 || (x.Statement.Count == 2 && last.Kind == TokenKind.Minus))
        {
            PhaseItems(phases, items);
            return;
        }
        if (last.Text == Vocabulary.Layer) { items.Add(Keyword(Vocabulary.Word(LayerName.Top))); items.Add(Keyword(Vocabulary.Word(LayerName.Bottom))); return; }
        int arrow = IndexOf(x, TokenKind.Arrow);
        if (arrow >= 0 && x.Statement.Count > arrow + 1 && last.Kind is TokenKind.Number or TokenKind.Word or TokenKind.RParen && last.Text != Turns && last.Text != Vocabulary.Layer)
        {
            if (!x.Has(Turns)) items.Add(Keyword(Turns));
            if (!x.Has(Vocabulary.Layer)) items.Add(Keyword(Vocabulary.Layer));
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
            items.Add(Keyword(Vocabulary.Sine));
            items.Add(Keyword(Vocabulary.Dc));
            return;
        }
        string keyword = x.LastKeyword([Vocabulary.Sine, Vocabulary.Dc, .. Vocabulary.MeasureWords, Vocabulary.At, Vocabulary.Phase]);
        bool afterUnit = last.Kind == TokenKind.Unit;
        switch (keyword)
        {
            case Vocabulary.Sine:
                if (last.Kind == TokenKind.Number) { Units(Currents, items); return; }
                if (afterUnit) { foreach (var m in Vocabulary.Measures) items.Add(Keyword(m.Word)); return; }
                Expression(x, c, offset, items, []);
                return;
            case var measure when Vocabulary.Measure(measure) is not null:
                if (Vocabulary.Measure(last.Text) is not null) items.Add(Keyword(Vocabulary.At));
                return;
            case Vocabulary.At or Vocabulary.Phase:
                if (last.Kind == TokenKind.Number) { Units(keyword == Vocabulary.At ? Frequencies : Angles, items); return; }
                if (afterUnit || last.Kind == TokenKind.Word && last.Text != keyword)
                {
                    if (keyword == Vocabulary.At) items.Add(Keyword(Vocabulary.Phase));
                    if (balanced) items.Add(Keyword(Vocabulary.Sequence));
                    return;
                }
                Expression(x, c, offset, items, []);
                return;
            case Vocabulary.Dc:
                if (last.Kind == TokenKind.Number) { Units(Currents, items); return; }
                Expression(x, c, offset, items, []);
                return;
        }
    }

    /// <summary>True when the token before the last one ends a waveform term (a value, not a keyword awaiting one).</summary>
    private static bool EndsTerm(CompletionContext x) =>
        x.Statement.Count >= 2 && x.Statement[^2].Kind is TokenKind.Unit or TokenKind.Number or TokenKind.Word or TokenKind.RParen && x.Statement[^2].Text is not (Vocabulary.Sine or Vocabulary.Dc or Vocabulary.At or Vocabulary.Phase);

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
        foreach (var f in Vocabulary.Functions)
            items.Add(Item(f.Name, Lsp.CompletionItemKind.Function, f.Help, insert: f.Name + "("));
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
        return Item(word, Lsp.CompletionItemKind.Keyword, Vocabulary.Help(bare) ?? "keyword", insert: word.EndsWith(':') ? word + " " : null, filter: bare);
    }

    private static JsonObject Item(string label, int kind, string detail, string? insert = null, string? filter = null)
    {
        var item = new JsonObject { ["label"] = label, ["kind"] = kind, ["detail"] = detail };
        if (insert is not null) item["insertText"] = insert;
        if (filter is not null) item["filterText"] = filter;
        return item;
    }
}
