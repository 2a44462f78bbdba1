using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Text;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// Binds a winding block into coils. Each coil group (the winding body itself, or a named
/// 'group') may mix the three forms: explicit coils, loops, and slot patterns (expanded by
/// <see cref="SlotPatternBinder"/>).
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

    public Winding? Bind(BlockSyntax block, Scope parent)
    {
        var scope = new Scope(parent);
        var seen = new Dictionary<string, PropertySyntax>();
        int? layers = null, turns = null, pitch = null, paths = null, seriesTurns = null, conductors = null;
        TextSpan pathsSpan = default, seriesSpan = default, conductorsSpan = default, layersSpan = default, pitchSpan = default;

        // Read in passes, so that statement order never changes meaning: the values (in source
        // order among themselves), then the properties, then the coils, patterns, loops and groups.
        foreach (var let in block.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        foreach (var statement in block.Body)
        {
            switch (statement)
            {
                case PropertySyntax p when p.Property.In(BlockKind.Winding):
                    if (!BlockRules.FirstTime(diagnostics, seen, p)) break;
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

        // Coils, in source order.
        var settings = new CoilGroupSettings("", turns, pitch, pitchSpan, TurnsStated: seen.ContainsKey(Vocabulary.Word(PropertyName.Turns)));
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
        if (Math.Abs(y - Math.Round(y)) > 1e-9 || y < 1 || y >= (machine.Slots ?? InputLimits.MaxSlots))
        {
            diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span,
                $"the coil pitch must be a whole number of slots from 1 to {(machine.Slots is { } q2 ? q2 - 1 : "Q - 1")}, not {ExpressionEvaluator.FormatExact(y)}");
            return null;
        }
        return (int)Math.Round(y);
    }

    private void BindCoilStatements(IReadOnlyList<StatementSyntax> body, Scope scope, CoilGroupSettings settings, bool allowGroups,
        Dictionary<string, TextSpan> groupNames, bool isWinding)
    {
        var patterns = new SlotPatternBinder(diagnostics, evaluator, machine, phases, budget, defaults, _layers);
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
                    patterns.Collect(pattern, scope);
                    break;
                case ForSyntax loop:
                    BindLoop(loop, scope, settings, allowGroups ? groupNames : null);
                    break;
                case BlockSyntax { Kind: BlockKind.Group } group when allowGroups:
                    BindGroup(group, scope, settings, groupNames);
                    break;
                default:
                    BlockRules.ReportMisplaced(diagnostics, statement, isWinding ? "a winding block" : "a group");
                    break;
            }
        }
        foreach (var coil in patterns.BuildCoils(settings)) AddCoil(coil);
    }

    private void BindGroup(BlockSyntax group, Scope parent, CoilGroupSettings inherited, Dictionary<string, TextSpan> groupNames)
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
        // Values first, then the group's settings, then its coils (statement order does not matter).
        foreach (var let in group.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        foreach (var statement in group.Body)
        {
            switch (statement)
            {
                case LetSyntax:
                    break;
                case PropertySyntax { Property.Name: PropertyName.Turns } p when BlockRules.FirstTime(diagnostics, seen, p):
                    settings = settings with { Turns = evaluator.EvaluateInteger(p.Value, scope, "turns per coil", 1, limit: InputLimits.MaxTurns), TurnsStated = true };
                    break;
                case PropertySyntax { Property.Name: PropertyName.Pitch } p when BlockRules.FirstTime(diagnostics, seen, p):
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

    private void BindLoop(ForSyntax loop, Scope parent, CoilGroupSettings settings, Dictionary<string, TextSpan>? groupNames)
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
                    case BlockSyntax { Kind: BlockKind.Group } group when groupNames is not null: BindGroup(group, bodyScope, settings, groupNames); break;
                    default:
                        if (i == 0) BlockRules.ReportMisplaced(diagnostics, statement, "a 'for' loop");
                        break;
                }
            }
        }
    }

    private void BindCoil(CoilSyntax coil, Scope scope, CoilGroupSettings settings)
    {
        ReportRepeatedOptions(coil);
        var phase = phases.Resolve(coil.Phase);
        int? go = BindSlot(coil.Go, scope);
        int? ret = BindSlot(coil.Return, scope);
        int? turns = coil.Turns is { } t ? evaluator.EvaluateInteger(t, scope, "turns per coil", 1, limit: InputLimits.MaxTurns) : settings.Turns;
        if (coil.Turns is null && !settings.TurnsStated)
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
}
