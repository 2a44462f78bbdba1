using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Text;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// Reads a winding block into coils. Each coil group (the winding body itself, or a named
/// 'group') may mix the three forms: explicit coils, slot patterns and loops.
/// </summary>
internal sealed class WindingBinder(
    DiagnosticBag diagnostics, ExpressionEvaluator evaluator, SemanticModel model, MachineFacts machine,
    PhaseTable phases, ExpansionBudget budget, List<string> defaults)
{
    private readonly List<Coil> _coils = [];
    private bool _coilLimitReported;

    /// <summary>Adds a coil, up to <see cref="InputLimits.MaxCoils"/> (one WS2041 at the first past it).</summary>
    private void AddCoil(Coil coil)
    {
        if (_coils.Count < InputLimits.MaxCoils)
        {
            _coils.Add(coil);
            return;
        }
        if (_coilLimitReported) return;
        _coilLimitReported = true;
        diagnostics.Add(DiagnosticCatalog.TooManyCoils, coil.Span, $"a winding may have at most {InputLimits.MaxCoils:N0} coils; this one and the rest are not read");
    }
    private int _layers = 2;

    /// <summary>Settings a group inherits from its winding and may override.</summary>
    private sealed record GroupSettings(string Name, int? Turns, int? Pitch, TextSpan PitchSpan);

    public Winding? Bind(BlockSyntax block, Scope parent)
    {
        var scope = new Scope(parent);
        var seen = new Dictionary<string, PropertySyntax>();
        int? layers = null, turns = null, pitch = null, paths = null, seriesTurns = null, conductors = null;
        TextSpan pathsSpan = default, seriesSpan = default, conductorsSpan = default, layersSpan = default, pitchSpan = default;

        // Pass 1: values and properties, wherever they stand in the block.
        foreach (var statement in block.Body)
        {
            switch (statement)
            {
                case LetSyntax let:
                    LetBinder.Bind(let, scope, evaluator, diagnostics, model);
                    break;
                case PropertySyntax p when p.Property.In(BlockKind.Winding):
                    if (!BlockReader.FirstTime(diagnostics, seen, p)) break;
                    switch (p.Property.Name)
                    {
                        case PropertyName.Layers: layers = evaluator.EvaluateInteger(p.Value, scope, "the number of layers", 1, 2); layersSpan = p.Span; break;
                        case PropertyName.Turns: turns = evaluator.EvaluateInteger(p.Value, scope, "turns per coil", 1, limit: InputLimits.MaxTurns); break;
                        case PropertyName.Pitch: pitch = BindPitch(p, scope); pitchSpan = p.Span; break;
                        case PropertyName.Paths: paths = evaluator.EvaluateInteger(p.Value, scope, "the number of parallel paths", 1, limit: InputLimits.MaxPaths); pathsSpan = p.Span; break;
                        case PropertyName.SeriesTurns: seriesTurns = evaluator.EvaluateInteger(p.Value, scope, "series turns per phase", 1, limit: InputLimits.MaxTurns * 1000); seriesSpan = p.Span; break;
                        case PropertyName.ConductorsPerSlot: conductors = evaluator.EvaluateInteger(p.Value, scope, "conductors per slot", 1, limit: InputLimits.MaxTurns * 1000); conductorsSpan = p.Span; break;
                    }
                    break;
            }
        }

        if (layers is null && !seen.ContainsKey(Vocabulary.Word(PropertyName.Layers)))
            diagnostics.Add(DiagnosticCatalog.MissingDeclaration, block.Keyword.Span, $"winding '{block.Name.Text}' does not say how many layers it has (add 'layers 1' or 'layers 2')");
        // Without a (valid) 'layers', read the patterns as their form says, so one omission stays one error.
        _layers = layers ?? (block.Body.OfType<PatternSyntax>().Any(p => p.Layer.Text == "slots") ? 1 : 2);

        // Pass 2: coils, in source order.
        var settings = new GroupSettings("", turns, pitch, pitchSpan);
        var groupNames = new Dictionary<string, TextSpan>();
        BindCoilStatements(block.Body, scope, settings, allowGroups: true, groupNames, isWinding: true);

        return new Winding
        {
            Name = block.Name.Text,
            Layers = _layers,
            Paths = paths ?? 1,
            Coils = [.. _coils],
            DeclaredPitch = pitch,
            DeclaredSeriesTurns = seriesTurns,
            DeclaredConductorsPerSlot = conductors,
            Span = block.Span,
            KeywordSpan = block.Keyword.Span,
            PathsSpan = pathsSpan,
            SeriesTurnsSpan = seriesSpan,
            ConductorsPerSlotSpan = conductorsSpan,
            LayersSpan = layersSpan,
            PitchSpan = pitchSpan,
        };
    }

    private int? BindPitch(PropertySyntax p, Scope scope)
    {
        if (evaluator.EvaluateAs(p.Value, scope, Dimension.SlotDim, "the coil pitch") is not { } y) return null;
        if (Math.Abs(y - Math.Round(y)) > 1e-9 || y < 1 || (machine.Slots is { } q && y >= q))
        {
            diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span,
                $"the coil pitch must be a whole number of slots from 1 to {(machine.Slots is { } q2 ? q2 - 1 : "Q - 1")}, not {ExpressionEvaluator.Format(y)}");
            return null;
        }
        return (int)Math.Round(y);
    }

    private void BindCoilStatements(IReadOnlyList<StatementSyntax> body, Scope scope, GroupSettings settings, bool allowGroups,
        Dictionary<string, TextSpan> groupNames, bool isWinding)
    {
        var patterns = new PatternCollector();
        foreach (var statement in body)
        {
            switch (statement)
            {
                case LetSyntax when isWinding:
                case PropertySyntax p when isWinding && p.Property.In(BlockKind.Winding):
                    break; // bound in pass 1
                case CoilSyntax coil:
                    BindCoil(coil, scope, settings);
                    break;
                case PatternSyntax pattern:
                    CollectPattern(pattern, scope, patterns);
                    break;
                case ForSyntax loop:
                    BindLoop(loop, scope, settings, allowGroups ? groupNames : null);
                    break;
                case BlockSyntax { Kind: BlockKind.Group } group when allowGroups:
                    BindGroup(group, scope, settings, groupNames);
                    break;
                default:
                    BlockReader.ReportMisplaced(diagnostics, statement, isWinding ? "a winding block" : "a group");
                    break;
            }
        }
        BuildPatternCoils(patterns, settings);
    }

    private void BindGroup(BlockSyntax group, Scope parent, GroupSettings inherited, Dictionary<string, TextSpan> groupNames)
    {
        string name = group.Name.Text;
        if (!group.Name.IsMissing)
        {
            var n = group.Name;
            // A group inside a loop is bound once per pass: the same group again, not a duplicate.
            if (groupNames.TryGetValue(name, out var first))
            {
                if (first != n.Span)
                    diagnostics.Add(DiagnosticCatalog.DuplicateName.At(n.Span, $"group '{name}' is already defined in this winding")
                        with { Related = [new RelatedSpan(first, "first defined here")] });
            }
            else
            {
                groupNames[name] = n.Span;
                model.Define(name, SymbolKind.Group, n.Span);
            }
        }
        var scope = new Scope(parent);
        var seen = new Dictionary<string, PropertySyntax>();
        var settings = inherited with { Name = name };
        var rest = new List<StatementSyntax>();
        foreach (var statement in group.Body)
        {
            switch (statement)
            {
                case LetSyntax let:
                    LetBinder.Bind(let, scope, evaluator, diagnostics, model);
                    break;
                case PropertySyntax { Property.Name: PropertyName.Turns } p when BlockReader.FirstTime(diagnostics, seen, p):
                    settings = settings with { Turns = evaluator.EvaluateInteger(p.Value, scope, "turns per coil", 1, limit: InputLimits.MaxTurns) };
                    break;
                case PropertySyntax { Property.Name: PropertyName.Pitch } p when BlockReader.FirstTime(diagnostics, seen, p):
                    settings = settings with { Pitch = BindPitch(p, scope), PitchSpan = p.Span };
                    break;
                case PropertySyntax { Property.Name: PropertyName.Turns or PropertyName.Pitch }:
                    break; // repeated, reported above
                default:
                    rest.Add(statement);
                    break;
            }
        }
        BindCoilStatements(rest, scope, settings, allowGroups: false, groupNames, isWinding: false);
    }

    private void BindLoop(ForSyntax loop, Scope parent, GroupSettings settings, Dictionary<string, TextSpan>? groupNames)
    {
        var from = evaluator.EvaluateInteger(loop.From, parent, "the start of a range");
        var to = evaluator.EvaluateInteger(loop.To, parent, "the end of a range");
        int step = 1;
        if (loop.Step is { } stepSyntax)
        {
            if (evaluator.EvaluateInteger(stepSyntax, parent, "the step of a range") is not { } s) return;
            if (s == 0)
            {
                diagnostics.Add(DiagnosticCatalog.InvalidCount, stepSyntax.Span, "the step of a range cannot be 0 (the loop would never end)");
                return;
            }
            step = s;
        }
        var loopScope = new Scope(parent);
        var variable = model.Define(loop.Variable.Text, SymbolKind.LoopVariable, loop.Variable.Span);
        loopScope.TryDeclare(variable);
        if (from is not { } a || to is not { } b) return;
        long count = (long)b - a;
        count = count / step >= 0 ? count / step + 1 : 0;
        if (!budget.Take(count, loop.Keyword.Span)) return;
        for (long i = 0; i < count; i++)
        {
            loopScope.SetLoopValue(loop.Variable.Text, a + i * step);
            var bodyScope = new Scope(loopScope);
            foreach (var statement in loop.Body)
            {
                switch (statement)
                {
                    case LetSyntax let: LetBinder.Bind(let, bodyScope, evaluator, diagnostics, model); break;
                    case CoilSyntax coil: BindCoil(coil, bodyScope, settings); break;
                    case ForSyntax inner: BindLoop(inner, bodyScope, settings, groupNames); break;
                    case BlockSyntax { Keyword.Text: "group" } group when groupNames is not null: BindGroup(group, bodyScope, settings, groupNames); break;
                    default:
                        if (i == 0) BlockReader.ReportMisplaced(diagnostics, statement, "a 'for' loop");
                        break;
                }
            }
        }
    }

    private void BindCoil(CoilSyntax coil, Scope scope, GroupSettings settings)
    {
        ReportRepeatedOptions(coil);
        var phase = phases.Resolve(coil.Phase);
        int? go = BindSlot(coil.Go, scope);
        int? ret = BindSlot(coil.Return, scope);
        int? turns = coil.Turns is { } t ? evaluator.EvaluateInteger(t, scope, "turns per coil", 1, limit: InputLimits.MaxTurns) : settings.Turns;
        if (coil.Turns is null && settings.Turns is null)
            diagnostics.Add(DiagnosticCatalog.CoilWithoutTurns, coil.Span,
                "this coil has no turns: add 'turns N' to it, or a 'turns' statement to its group or winding");
        var (goLayer, returnLayer) = (0, _layers == 2 ? 1 : 0);
        if (coil.GoLayer == LayerName.Bottom && coil.Layer is { } layer)
        {
            if (_layers == 1)
                diagnostics.Add(DiagnosticCatalog.InvalidCount, layer.Span, "a single-layer winding has no bottom layer");
            else
                (goLayer, returnLayer) = (1, 0);
        }
        if (go == ret && go is { } same)
        {
            diagnostics.Add(DiagnosticCatalog.CoilSidesCoincide, coil.Return.Span, $"this coil goes and returns in slot {same}");
            return;
        }
        if (phase is null || go is null || ret is null || turns is null) return;
        AddCoil(new Coil { Phase = phase.Value, GoSlot = go.Value, ReturnSlot = ret.Value, GoLayer = goLayer, ReturnLayer = returnLayer, Turns = turns.Value, Polarity = coil.Reversed ? -1 : 1, Group = settings.Name, Span = coil.Span });
    }

    // Each option once: with two turn counts (or layers) one is a mistake, and which one is not ours to guess.
    private void ReportRepeatedOptions(CoilSyntax coil)
    {
        for (int i = 1; i < coil.Options.Count; i++)
        {
            var option = coil.Options[i];
            if (coil.Options.Take(i).FirstOrDefault(o => o.Keyword.Text == option.Keyword.Text) is not { } first) continue;
            diagnostics.Add(DiagnosticCatalog.RepeatedCoilOption.At(option.Keyword.Span, $"this coil already gives '{option.Keyword.Text}'")
                with { Related = [new RelatedSpan(first.Span, "first given here")] });
        }
    }

    private int? BindSlot(ExpressionSyntax expression, Scope scope)
    {
        if (evaluator.EvaluateInteger(expression, scope, "a slot number") is not { } slot) return null;
        if (machine.Slots is { } q && (slot < 1 || slot > q))
        {
            diagnostics.Add(DiagnosticCatalog.SlotOutOfRange, expression.Span, $"slot {slot} is out of range: the machine has slots 1 to {q}");
            return null;
        }
        return slot;
    }

    // ---- slot patterns -------------------------------------------------------------------------

    /// <summary>One pattern position after repeats: the phase (null for '_'), its sign, and the entry that wrote it.</summary>
    private readonly record struct PatternCell(int? Phase, int Sign, PatternEntrySyntax Entry);

    private sealed class PatternCollector
    {
        public readonly Dictionary<LayerName, List<PatternCell>> Layers = [];
        public readonly Dictionary<LayerName, PatternSyntax> LastLine = [];
        public readonly HashSet<LayerName> Broken = [];
    }

    private void CollectPattern(PatternSyntax pattern, Scope scope, PatternCollector collector)
    {
        var layer = pattern.LayerKind;
        if (_layers == 1 && layer == LayerName.Bottom)
        {
            diagnostics.Add(DiagnosticCatalog.MisplacedStatement, pattern.Layer.Span, "a single-layer winding has no bottom layer; list its slots with 'slots:'");
            return;
        }
        if (_layers == 2 && layer == LayerName.Slots)
        {
            diagnostics.Add(DiagnosticCatalog.MisplacedStatement, pattern.Layer.Span, "a double-layer winding lists its layers with 'top:' (and optionally 'bottom:')");
            return;
        }
        if (_layers == 1) layer = LayerName.Slots; // 'top:' in a single-layer winding means its one layer
        int repeat = 1;
        if (pattern.Repeat is { } r)
        {
            if (evaluator.EvaluateInteger(r, scope, "a repeat count", 1, limit: (int)ExpansionBudget.Limit) is not { } count)
            {
                collector.Broken.Add(layer);
                return;
            }
            repeat = count;
        }
        if (!budget.Take((long)pattern.Entries.Count * repeat, pattern.Span)) return;
        var cells = new List<PatternCell>(pattern.Entries.Count);
        foreach (var entry in pattern.Entries)
        {
            int? phase = entry.Phase is { } name ? phases.Resolve(name) : null;
            if (entry.Phase is not null && phase is null) collector.Broken.Add(layer);
            cells.Add(new PatternCell(phase, entry.Reversed ? -1 : 1, entry));
        }
        if (!collector.Layers.TryGetValue(layer, out var list)) collector.Layers[layer] = list = [];
        for (int k = 0; k < repeat; k++) list.AddRange(cells);
        collector.LastLine[layer] = pattern;
    }

    private void BuildPatternCoils(PatternCollector collector, GroupSettings settings)
    {
        if (collector.Layers.Count == 0 || machine.Slots is not { } q) return;
        foreach (var (layer, cells) in collector.Layers)
        {
            if (cells.Count != q)
            {
                var line = collector.LastLine[layer];
                diagnostics.Add(DiagnosticCatalog.PatternLength, line.Layer.Span,
                    $"the {Vocabulary.Word(layer)} pattern covers {cells.Count} slot{(cells.Count == 1 ? "" : "s")}, but the machine has {q}");
                collector.Broken.Add(layer);
            }
        }
        if (collector.Broken.Count > 0) return;
        if (settings.Turns is not { } turns)
        {
            var line = collector.LastLine.Values.First();
            diagnostics.Add(DiagnosticCatalog.CoilWithoutTurns, line.Layer.Span, "the coils of this pattern have no turns: add a 'turns' statement to the group or winding");
            return;
        }
        int y = settings.Pitch ?? DefaultPitch(q);
        if (settings.Pitch is null && y > 0)
            defaults.Add($"coil pitch {y} slots (no 'pitch' given: the longest pitch not exceeding the pole pitch)");
        if (y <= 0) return;
        int Wrap(int s) => (s - 1) % q + 1;

        var unbalanced = UnbalancedPhases(collector);
        if (collector.Layers.TryGetValue(LayerName.Slots, out var single))
        {
            BuildSingleLayer(single, q, y, turns, settings.Name, Wrap, unbalanced);
            return;
        }
        collector.Layers.TryGetValue(LayerName.Top, out var top);
        collector.Layers.TryGetValue(LayerName.Bottom, out var bottom);
        if (top is not null)
        {
            for (int s = 1; s <= q; s++)
            {
                var cell = top[s - 1];
                if (cell.Phase is not { } phase) continue;
                int ret = Wrap(s + y);
                if (bottom is not null && (bottom[ret - 1].Phase != phase || bottom[ret - 1].Sign != -cell.Sign))
                {
                    if (unbalanced.Contains(phase)) continue; // reported once for the whole phase
                    diagnostics.Add(DiagnosticCatalog.PatternMismatch, bottom[ret - 1].Entry.Span,
                        $"the bottom layer of slot {ret} should hold {Signed(-cell.Sign, phase)} to close the coil from top slot {s} (pitch {y})");
                    continue;
                }
                AddCoil(new Coil { Phase = phase, GoSlot = s, ReturnSlot = ret, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = cell.Sign, Group = settings.Name, Span = cell.Entry.Span });
            }
        }
        else if (bottom is not null)
        {
            for (int s = 1; s <= q; s++)
            {
                var cell = bottom[s - 1];
                if (cell.Phase is not { } phase) continue;
                int go = Wrap(s - y + q);
                AddCoil(new Coil { Phase = phase, GoSlot = go, ReturnSlot = s, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = -cell.Sign, Group = settings.Name, Span = cell.Entry.Span });
            }
        }
    }

    // A phase whose '+' and '-' entries do not balance cannot be made of coils: say so once,
    // for the phase, instead of once per unpaired entry.
    private HashSet<int> UnbalancedPhases(PatternCollector collector)
    {
        var result = new HashSet<int>();
        bool bothLayers = collector.Layers.ContainsKey(LayerName.Top) && collector.Layers.ContainsKey(LayerName.Bottom);
        if (!collector.Layers.ContainsKey(LayerName.Slots) && !bothLayers) return result; // one derived layer always balances
        var sums = new Dictionary<int, (int Plus, int Minus)>();
        foreach (var cells in collector.Layers.Values)
            foreach (var cell in cells)
                if (cell.Phase is { } phase)
                {
                    var (plus, minus) = sums.GetValueOrDefault(phase);
                    sums[phase] = cell.Sign > 0 ? (plus + 1, minus) : (plus, minus + 1);
                }
        var line = collector.LastLine.Values.Last();
        foreach (var (phase, (plus, minus)) in sums.OrderBy(x => x.Key))
        {
            if (plus == minus) continue;
            result.Add(phase);
            diagnostics.Add(DiagnosticCatalog.PhaseSidesDoNotCancel, line.Layer.Span,
                $"phase {Name(phase)} has {plus} '+' side{(plus == 1 ? "" : "s")} and {minus} '-' side{(minus == 1 ? "" : "s")} in this pattern; every coil needs one of each");
        }
        return result;
    }

    private void BuildSingleLayer(List<PatternCell> cells, int q, int y, int turns, string group, Func<int, int> wrap, HashSet<int> unbalanced)
    {
        var claimed = new bool[q];
        var reported = new bool[q]; // entries already named as wrong are not read as go sides too
        for (int s = 1; s <= q; s++)
        {
            var cell = cells[s - 1];
            if (cell.Phase is not { } phase || cell.Sign < 0 || reported[s - 1]) continue;
            int ret = wrap(s + y);
            var other = cells[ret - 1];
            if (other.Phase != phase || other.Sign != -1 || claimed[ret - 1])
            {
                if (unbalanced.Contains(phase) || other.Phase is { } o && unbalanced.Contains(o)) continue;
                diagnostics.Add(DiagnosticCatalog.PatternMismatch, other.Entry.Span,
                    $"slot {ret} should hold -{Name(phase)} to close the coil from slot {s} (pitch {y})");
                reported[ret - 1] = true;
                continue;
            }
            claimed[ret - 1] = true;
            AddCoil(new Coil { Phase = phase, GoSlot = s, ReturnSlot = ret, GoLayer = 0, ReturnLayer = 0, Turns = turns, Polarity = 1, Group = group, Span = cell.Entry.Span.Cover(other.Entry.Span) });
        }
        for (int s = 1; s <= q; s++)
        {
            var cell = cells[s - 1];
            if (cell.Phase is { } phase && cell.Sign < 0 && !claimed[s - 1] && !unbalanced.Contains(phase) && !Claimable(cells, s, y, q, wrap))
                diagnostics.Add(DiagnosticCatalog.PatternMismatch, cell.Entry.Span,
                    $"no coil returns in slot {s}: slot {wrap(s - y + q)} should hold {Name(phase)} (pitch {y})");
        }
    }

    // A return side whose go side was itself wrong has been reported already.
    private static bool Claimable(List<PatternCell> cells, int s, int y, int q, Func<int, int> wrap)
    {
        var go = cells[wrap(s - y + q) - 1];
        return go.Sign > 0 && go.Phase is not null;
    }

    private int DefaultPitch(int q) => machine.Poles is { } poles ? Math.Max(1, q / poles) : 0;

    private string Name(int phase) => phases.Phases[phase].Name;

    private string Signed(int sign, int phase) => (sign < 0 ? "-" : "") + Name(phase);
}
