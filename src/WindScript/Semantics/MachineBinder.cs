using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Text;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>What the machine block states, before defaults.</summary>
internal sealed record MachineFacts
{
    public string Name { get; init; } = "";
    public int? Slots { get; init; }
    public int? Poles { get; init; }
    public ImmutableArray<Phase> Phases { get; init; } = [];
    public double? PhaseShiftDegrees { get; init; }
    public Geometry Geometry { get; init; } = new();
    public TextSpan Span { get; init; }
    public TextSpan KeywordSpan { get; init; }
    public TextSpan SlotsSpan { get; init; }
    public TextSpan PolesSpan { get; init; }
    public TextSpan PhasesSpan { get; init; }
}

/// <summary>Reads a machine block: counts, phases and core dimensions, each with its unit checked.</summary>
internal sealed class MachineBinder(DiagnosticBag diagnostics, ExpressionEvaluator evaluator, SemanticModel model)
{
    public MachineFacts Bind(BlockSyntax block, Scope parent)
    {
        var scope = new Scope(parent);
        var facts = new MachineFacts { Name = block.Name.Text, Span = block.Span, KeywordSpan = block.Keyword.Span };
        var seen = new Dictionary<string, PropertySyntax>();
        var geometry = new Geometry();
        // Read in passes, so that statement order never changes meaning: the values first (in
        // source order among themselves), then the counts other properties depend on (skew in
        // degrees needs the slot count), then everything else.
        foreach (var let in block.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        foreach (var statement in block.Body)
        {
            switch (statement)
            {
                case PhasesSyntax phases:
                    if (!facts.Phases.IsDefaultOrEmpty)
                    {
                        diagnostics.Add(DiagnosticCatalog.RepeatedProperty, phases.Keyword.Span, $"'{Vocabulary.PhasesWord}' is already given in this block");
                        break;
                    }
                    facts = facts with { Phases = BindPhases(phases, scope), PhasesSpan = phases.Span };
                    break;
                case PropertySyntax p when IsCount(p):
                    if (!BlockRules.FirstTime(diagnostics, seen, p)) break;
                    (facts, geometry) = BindProperty(p, scope, facts, geometry);
                    break;
            }
        }
        foreach (var statement in block.Body)
        {
            switch (statement)
            {
                case LetSyntax or PhasesSyntax:
                case PropertySyntax p0 when IsCount(p0):
                    break; // read above
                case PropertySyntax p when p.Property.In(BlockKind.Machine):
                    if (!BlockRules.FirstTime(diagnostics, seen, p)) break;
                    (facts, geometry) = BindProperty(p, scope, facts, geometry);
                    break;
                default:
                    BlockRules.ReportMisplaced(diagnostics, statement, "a machine block");
                    break;
            }
        }
        return facts with { Geometry = geometry };
    }

    private static bool IsCount(PropertySyntax p) => p.Property.Name is PropertyName.Slots or PropertyName.Poles;

    private ImmutableArray<Phase> BindPhases(PhasesSyntax phases, Scope scope)
    {
        var list = ImmutableArray.CreateBuilder<Phase>();
        foreach (var name in phases.Names)
        {
            if (list.Count == InputLimits.MaxPhases)
            {
                diagnostics.Add(DiagnosticCatalog.BeyondLimit, name.Span, $"more than {InputLimits.MaxPhases} phases is beyond the limit ('windscript explain WS2040')");
                break;
            }
            if (list.Any(p => p.Name == name.Text))
            {
                diagnostics.Add(DiagnosticCatalog.DuplicateName, name.Span, $"phase '{name.Text}' is declared twice");
                continue;
            }
            list.Add(new Phase(name.Text, list.Count, name.Span));
            model.Define(name.Text, SymbolKind.Phase, name.Span);
        }
        return list.ToImmutable();
    }

    private (MachineFacts, Geometry) BindProperty(PropertySyntax p, Scope scope, MachineFacts facts, Geometry g)
    {
        double? Length(string what) => evaluator.EvaluateAs(p.Value, scope, Dimension.LengthDim, what);
        double? Positive(double? v, string what)
        {
            if (v is { } x && x <= 0)
            {
                diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span, $"{what} must be greater than zero");
                return null;
            }
            return v;
        }

        switch (p.Property.Name)
        {
            case PropertyName.Slots:
                return (facts with { Slots = evaluator.EvaluateInteger(p.Value, scope, "the slot count", 1, limit: InputLimits.MaxSlots), SlotsSpan = p.Span }, g);
            case PropertyName.Poles:
                var poles = evaluator.EvaluateInteger(p.Value, scope, "the pole count", 2, limit: InputLimits.MaxPoles);
                if (poles is { } n && n % 2 != 0)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span, $"the pole count must be even (north and south poles pair up), not {n}");
                    poles = null;
                }
                if (poles is { } pairsOf) evaluator.PolePairs = pairsOf / 2;
                return (facts with { Poles = poles, PolesSpan = p.Span }, g);
            case PropertyName.Bore: return (facts, g with { BoreDiameter = Positive(Length("the bore diameter"), "the bore diameter") });
            case PropertyName.Stack: return (facts, g with { StackLength = Positive(Length("the stack length"), "the stack length") });
            case PropertyName.Gap: return (facts, g with { Gap = Positive(Length("the air gap"), "the air gap") });
            case PropertyName.SlotOpening: return (facts, g with { SlotOpening = Positive(Length("the slot opening"), "the slot opening") });
            case PropertyName.BackDiameter: return (facts, g with { BackDiameter = Positive(Length("the back diameter"), "the back diameter") });
            case PropertyName.RotorRadius: return (facts, g with { RotorRadius = Positive(Length("the rotor radius"), "the rotor radius") });
            case PropertyName.Rotor:
                // `rotor outside` (hub and fan motors) or `rotor inside` (the default).
                if (p.Value is NameExpressionSyntax { Name.Text: "outside" or "inside" } word)
                    return (facts, g with { RotorOutside = word.Name.Text == "outside" });
                diagnostics.Add(DiagnosticCatalog.RotorPositionUnknown, p.Value.Span, "'rotor' takes 'inside' or 'outside'");
                return (facts, g);
            case PropertyName.GapFluxDensity:
                return (facts, g with { GapFluxDensity = evaluator.EvaluateAs(p.Value, scope, Dimension.FluxDensity, "the gap flux density") });
            case PropertyName.PhaseShift:
                // An electrical angle: the spacing of the phase axes in electrical degrees.
                return (facts with { PhaseShiftDegrees = evaluator.EvaluateAngle(p.Value, scope, AngleKind.Electrical, "the phase shift") * 180 / Math.PI }, g);
            case PropertyName.Skew:
                // In slot pitches, or as a mechanical angle around the bore (converted through the slot count).
                if (evaluator.EvaluateInAngleContext(p.Value, scope, AngleKind.Mechanical) is { } q)
                {
                    bool known = q.Dimension == Dimension.SlotDim || q.Dimension == Dimension.AngleDim && facts.Slots is not null;
                    if (known && evaluator.WithinMagnitude(p.Value, q.Value, "the skew") is null) return (facts, g);
                    if (q.Dimension == Dimension.SlotDim) return (facts, g with { SkewSlots = q.Value });
                    if (q.Dimension == Dimension.AngleDim && facts.Slots is { } slots) return (facts, g with { SkewSlots = q.Value * slots / (2 * Math.PI) });
                    if (q.Dimension.IsNone) evaluator.EvaluateAs(p.Value, scope, Dimension.SlotDim, "the skew");
                    else if (q.Dimension != Dimension.AngleDim)
                        diagnostics.Add(DiagnosticCatalog.WrongDimension, p.Value.Span, $"the skew must be a number of slots or a mechanical angle, but this is {q.Dimension.Describe()}");
                }
                return (facts, g);
        }
        return (facts, g);
    }
}
