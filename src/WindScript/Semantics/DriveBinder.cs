using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// Reads a drive block into one current waveform per phase. A sinusoid is i = Î·cos(ωt + φ);
/// an rms amplitude is converted to the peak (Î = √2·I_rms); a balanced set gives the phases
/// in the stated sequence time shifts of 0, -δ, -2δ, ... where δ is the machine's phase shift.
/// </summary>
internal sealed class DriveBinder(DiagnosticBag diagnostics, ExpressionEvaluator evaluator, SemanticModel model, PhaseTable phases, double phaseShiftDegrees,
    int? polePairs = null)
{
    // Phases driven by a balanced line so far (another balanced line may add to them).
    private readonly HashSet<int> _byBalanced = [];

    public Drive Bind(BlockSyntax block, Scope parent)
    {
        _byBalanced.Clear();
        var scope = new Scope(parent);
        int m = phases.Phases.Count;
        var components = new List<CurrentComponent>[m];
        var assigned = new Syntax.NameSyntax?[m];
        var spans = new Text.TextSpan[m];
        for (int k = 0; k < m; k++) components[k] = [];
        bool neutral = false, incomplete = false;
        ImmutableArray<int> sequence = [];
        double? currentAngle = null;
        var seen = new Dictionary<string, PropertySyntax>();

        // Values first (statement order never changes meaning), then the currents.
        foreach (var let in block.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        foreach (var statement in block.Body)
        {
            switch (statement)
            {
                case LetSyntax:
                    break;
                case FlagSyntax { Keyword.Text: Vocabulary.Neutral }:
                    neutral = true;
                    break;
                case PropertySyntax { Property.Name: PropertyName.CurrentAngle } angle:
                    if (BlockRules.FirstTime(diagnostics, seen, angle))
                        currentAngle = evaluator.EvaluateAngle(angle.Value, scope, AngleKind.Electrical, "the current angle");
                    break;
                case PhaseCurrentSyntax current:
                    if (phases.Resolve(current.Phase) is not { } k) break;
                    if (!MarkAssigned(k, current.Phase, assigned)) break;
                    spans[k] = current.Span;
                    foreach (var term in current.Terms)
                        if (BindTerm(term.Term, scope) is { } c)
                            components[k].Add(term.Negated ? c with { Peak = -c.Peak } : c);
                        else
                            incomplete = true;
                    break;
                case BalancedSyntax balanced:
                    var (order, bound) = BindBalanced(balanced, scope, components, assigned, spans);
                    if (!bound) incomplete = true;
                    // Several balanced lines (a fundamental set and a harmonic set) share one drive; the first names the sequence.
                    if (sequence.IsDefaultOrEmpty) sequence = order;
                    break;
                default:
                    BlockRules.ReportMisplaced(diagnostics, statement, "a drive block");
                    break;
            }
        }

        return new Drive
        {
            Name = block.Name.Text,
            Currents = [.. Enumerable.Range(0, m).Select(k => new PhaseCurrent(k, [.. components[k]], spans[k]))],
            Neutral = neutral,
            CurrentAngle = currentAngle,
            Sequence = sequence,
            Incomplete = incomplete,
            Span = block.Span,
            NameSpan = block.Name.IsMissing ? block.Keyword.Span : block.Name.Span,
        };
    }

    private bool MarkAssigned(int phase, Syntax.NameSyntax at, Syntax.NameSyntax?[] assigned)
    {
        if (assigned[phase] is { } first)
        {
            diagnostics.Add(DiagnosticCatalog.DuplicateName.At(at.Span, $"phase '{at.Text}' is already driven in this drive")
                with { Related = [new RelatedSpan(first.Span, "first driven here")] });
            return false;
        }
        assigned[phase] = at;
        return true;
    }

    /// <summary>
    /// A balanced set adds one component to every phase. Several balanced lines add up (an
    /// inverter drive: the fundamental set plus a harmonic set in its own sequence); a phase
    /// driven by its own line as well is a duplicate. Returns the order and whether the wave bound.
    /// </summary>
    private (ImmutableArray<int> Order, bool Bound) BindBalanced(BalancedSyntax balanced, Scope scope, List<CurrentComponent>[] components,
        Syntax.NameSyntax?[] assigned, Text.TextSpan[] spans)
    {
        var order = new List<int>();
        foreach (var name in balanced.Sequence)
        {
            if (phases.Resolve(name) is not { } k) return ([], false);
            if (order.Contains(k))
            {
                diagnostics.Add(DiagnosticCatalog.InvalidSequence, name.Span, $"phase '{name.Text}' appears twice in the sequence");
                return ([], false);
            }
            order.Add(k);
        }
        if (order.Count != phases.Phases.Count)
        {
            var missing = phases.Phases.Where(p => !order.Contains(p.Index)).Select(p => p.Name);
            diagnostics.Add(DiagnosticCatalog.InvalidSequence, balanced.SequenceKeyword.Span.Cover(balanced.Sequence[^1].Span),
                $"the sequence must name every phase once; missing: {string.Join(" ", missing)}");
            return ([], false);
        }
        if (BindTerm(balanced.Wave, scope) is not { } wave) return ([.. order], false);
        double delta = phaseShiftDegrees * Math.PI / 180;
        for (int j = 0; j < order.Count; j++)
        {
            int k = order[j];
            if (_byBalanced.Contains(k)) { }
            else if (!MarkAssigned(k, balanced.Sequence[j], assigned)) continue;
            else _byBalanced.Add(k);
            if (spans[k] == default) spans[k] = balanced.Span;
            components[k].Add(wave with { PhaseAngle = wave.PhaseAngle - j * delta });
        }
        return ([.. order], true);
    }

    /// <summary>
    /// 'rpm' measures a rotor speed, not how often a current alternates: "at 750 rpm" is refused,
    /// with the synchronous frequency f = n·p/60 at the machine's pole pairs (common practice).
    /// </summary>
    private bool SpeedWrittenAsFrequency(ExpressionSyntax frequency, Scope scope)
    {
        var literal = frequency as NumberSyntax ?? (frequency as ParenthesizedExpressionSyntax)?.Inner as NumberSyntax;
        bool hasRpm = literal is { Unit.Text: "rpm" } || Mentions(frequency, "rpm", scope, 0);
        if (!hasRpm) return false;
        if (literal is { Unit.Text: "rpm" } n && polePairs is { } p and > 0)
        {
            double hz = n.Value * p / 60;
            string written = ExpressionEvaluator.Format(hz) + " Hz";
            diagnostics.Add(DiagnosticCatalog.SpeedAsFrequency.At(frequency.Span,
                    $"{n.Literal} rpm is a speed; at {2 * p} poles the synchronous frequency is {written}: write `at {written}`")
                with { Fix = new CodeFix($"Write {written}", [new TextEdit(frequency.Span, written)]) });
        }
        else
        {
            diagnostics.Add(DiagnosticCatalog.SpeedAsFrequency, frequency.Span,
                "rpm is a speed, not the frequency of a current: write the current's frequency in Hz (the synchronous frequency is speed x pole pairs / 60)");
        }
        return true;
    }

    // Follows names to the 'let' they were written with, so `let n = 750 rpm` then `at n` is
    // caught too (a let refers only to lets above it, so this ends; the depth bound is a guard).
    private static bool Mentions(ExpressionSyntax e, string unit, Scope scope, int depth) => depth < 100 && e switch
    {
        NumberSyntax n => n.Unit?.Text == unit,
        NameExpressionSyntax name => scope.Lookup(name.Name.Text) is { Kind: SymbolKind.Value, Expression: { } written }
            && Mentions(written, unit, scope, depth + 1),
        ParenthesizedExpressionSyntax paren => Mentions(paren.Inner, unit, scope, depth + 1),
        UnaryExpressionSyntax u => Mentions(u.Operand, unit, scope, depth + 1),
        BinaryExpressionSyntax b => Mentions(b.Left, unit, scope, depth + 1) || Mentions(b.Right, unit, scope, depth + 1),
        CallExpressionSyntax call => call.Arguments.Any(a => Mentions(a, unit, scope, depth + 1)),
        _ => false,
    };

    private CurrentComponent? BindTerm(WaveTermSyntax term, Scope scope)
    {
        switch (term)
        {
            case DcTermSyntax dc:
                return evaluator.EvaluateAs(dc.Current, scope, Dimension.CurrentDim, "a current") is { } i
                    ? new CurrentComponent(i, 0, 0, dc.Span) : null;
            case SineTermSyntax sine:
                var amplitude = evaluator.EvaluateAs(sine.Amplitude, scope, Dimension.CurrentDim, "a current amplitude");
                if (SpeedWrittenAsFrequency(sine.Frequency, scope)) return null;
                var omega = evaluator.EvaluateAs(sine.Frequency, scope, Dimension.AngularFrequency, "a frequency");
                double phase = 0;
                if (sine.Phase is { } p)
                {
                    // The time phase of the current, an electrical angle.
                    if (evaluator.EvaluateAngle(p, scope, AngleKind.Electrical, "a phase angle") is not { } ph) return null;
                    phase = ph;
                }
                if (omega is { } w && w <= 0)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidCount, sine.Frequency.Span, "a sinusoid's frequency must be greater than zero (use 'dc' for direct current)");
                    return null;
                }
                if (amplitude is not { } a || omega is not { } o) return null;
                double peak = sine.MeasureKind == AmplitudeMeasure.Rms ? a * Math.Sqrt(2) : a;
                return new CurrentComponent(peak, o, phase, sine.Span);
            default:
                return null;
        }
    }
}
