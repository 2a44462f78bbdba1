using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>
/// Expands the slot patterns of one coil group into coils: <c>top:</c> entries are go sides
/// that return one pitch on in the bottom layer (checked against <c>bottom:</c> when written);
/// <c>slots:</c> (single layer) pairs each <c>+</c> entry with the <c>-</c> entry one pitch on.
/// Lines of one layer continue one another; the coils are built once the whole group is read.
/// </summary>
internal sealed class SlotPatternBinder(
    DiagnosticBag diagnostics, ExpressionEvaluator evaluator, MachineFacts machine,
    PhaseTable phases, ExpansionBudget budget, List<string> defaults, int layers)
{
    private readonly PatternCollector _collector = new();
    private readonly List<Coil> _coils = [];
    private readonly int _layers = layers;

    /// <summary>One pattern position after repeats: the phase (null for '_'), its sign, and the entry that wrote it.</summary>
    private readonly record struct PatternCell(int? Phase, int Sign, PatternEntrySyntax Entry);

    private sealed class PatternCollector
    {
        public readonly Dictionary<LayerName, List<PatternCell>> Layers = [];
        public readonly Dictionary<LayerName, PatternSyntax> LastLine = [];
        public readonly HashSet<LayerName> Broken = [];
    }

    /// <summary>Adds one pattern line (several lines of one layer continue one another).</summary>
    public void Collect(PatternSyntax pattern, Scope scope)
    {
        var collector = _collector;
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

    /// <summary>The coils the collected lines make, once every line of the group is read; every mismatch is reported.</summary>
    public List<Coil> BuildCoils(CoilGroupSettings settings)
    {
        var collector = _collector;
        if (collector.Layers.Count == 0 || machine.Slots is not { } q) return _coils;
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
        if (collector.Broken.Count > 0) return _coils;
        if (settings.Turns is not { } turns)
        {
            if (settings.TurnsStated) return _coils;   // the refused value was reported where it was written
            var line = collector.LastLine.Values.First();
            diagnostics.Add(DiagnosticCatalog.CoilWithoutTurns, line.Layer.Span, "the coils of this pattern have no turns: add a 'turns' statement to the group or winding");
            return _coils;
        }
        int y = settings.Pitch ?? DefaultPitch(q);
        if (settings.Pitch is null && y > 0)
            defaults.Add($"coil pitch {y} slots (no 'pitch' given: the longest pitch not exceeding the pole pitch)");
        if (y <= 0) return _coils;
        int Wrap(int s) => (s - 1) % q + 1;

        var unbalanced = UnbalancedPhases(collector);
        if (collector.Layers.TryGetValue(LayerName.Slots, out var single))
        {
            BuildSingleLayer(single, q, y, turns, settings.Name, Wrap, unbalanced);
            return _coils;
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
                _coils.Add(new Coil { Phase = phase, GoSlot = s, ReturnSlot = ret, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = cell.Sign, Group = settings.Name, Span = cell.Entry.Span });
            }
        }
        else if (bottom is not null)
        {
            for (int s = 1; s <= q; s++)
            {
                var cell = bottom[s - 1];
                if (cell.Phase is not { } phase) continue;
                int go = Wrap(s - y + q);
                _coils.Add(new Coil { Phase = phase, GoSlot = go, ReturnSlot = s, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = -cell.Sign, Group = settings.Name, Span = cell.Entry.Span });
            }
        }
        return _coils;
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
            _coils.Add(new Coil { Phase = phase, GoSlot = s, ReturnSlot = ret, GoLayer = 0, ReturnLayer = 0, Turns = turns, Polarity = 1, Group = group, Span = cell.Entry.Span.Cover(other.Entry.Span) });
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

    private string Signed(int sign, int phase) => (sign < 0 ? "-" : "") + Name(phase);}
