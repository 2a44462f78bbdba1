using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>Reads a slot block: the shape, its dimensions, liner, separator and wedge, each with its unit checked.</summary>
internal sealed class SlotBinder(DiagnosticBag diagnostics, ExpressionEvaluator evaluator, SemanticModel model)
{
    public SlotGeometry Bind(BlockSyntax block, Scope parent)
    {
        var scope = new Scope(parent);
        foreach (var let in block.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        var read = new PropertyReader(diagnostics, evaluator, scope);
        var seen = new Dictionary<string, PropertySyntax>();
        var slot = new SlotGeometry { Name = block.Name.Text, Span = block.Span, KeywordSpan = block.Keyword.Span };
        SlotShape? shape = null;
        foreach (var statement in block.Body)
        {
            if (statement is LetSyntax) continue;
            if (statement is not PropertySyntax p || !p.Property.In(BlockKind.Slot))
            {
                BlockRules.ReportMisplaced(diagnostics, statement, "a slot block");
                continue;
            }
            if (!BlockRules.FirstTime(diagnostics, seen, p)) continue;
            switch (p.Property.Name)
            {
                case PropertyName.SlotShape:
                    if (read.Choice(p) is { } i) shape = (SlotShape)(i + 1); // words in enum order after AreaOnly
                    else shape = SlotShape.AreaOnly; // reported; read no shape
                    break;
                case PropertyName.SlotWidth: slot = slot with { Width = read.Length(p, "the slot width") }; break;
                case PropertyName.SlotBottomWidth: slot = slot with { BottomWidth = read.Length(p, "the slot's bottom width") }; break;
                case PropertyName.SlotDepth: slot = slot with { Depth = read.Length(p, "the slot depth") }; break;
                case PropertyName.TipHeight: slot = slot with { TipHeight = read.Length(p, "the tooth-tip height", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.TipTaper: slot = slot with { TipTaper = read.Length(p, "the tip taper", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.SlotArea: slot = slot with { Area = read.Quantity(p, Units.Dimension.Area, "the slot area") }; break;
                case PropertyName.Liner: slot = slot with { Liner = read.Length(p, "the liner thickness", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.Separator: slot = slot with { Separator = read.Length(p, "the separator thickness", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.Wedge: slot = slot with { Wedge = read.Length(p, "the wedge thickness", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.DrawnStrands: slot = slot with { DrawnStrands = read.Whole(p, "the strands drawn in the slot", 1, InputLimits.MaxTurns * 1000) }; break;
            }
        }
        string name = $"slot '{block.Name.Text}'";
        void Need(bool present, PropertyName property, string why)
        {
            string word = Vocabulary.Word(property);
            if (!present && !seen.ContainsKey(word))
                diagnostics.Add(DiagnosticCatalog.SlotDimensionMissing, block.Keyword.Span, $"{name} {why}: add '{word}'");
        }
        if (shape is null)
        {
            Need(slot.Area is not null, PropertyName.SlotArea, "gives neither a shape nor an area");
            return slot with { Shape = SlotShape.AreaOnly };
        }
        if (shape != SlotShape.AreaOnly)
        {
            Need(slot.Width is not null, PropertyName.SlotWidth, "has no width");
            Need(slot.Depth is not null, PropertyName.SlotDepth, "has no depth");
            if (seen.TryGetValue(Vocabulary.Word(PropertyName.SlotArea), out var area))
                diagnostics.Add(DiagnosticCatalog.SlotDimensionMissing, area.Keyword.Span, $"{name} has a shape, so its area follows from the dimensions: remove 'area' or 'shape'");
            if (shape != SlotShape.Trapezoid && seen.TryGetValue(Vocabulary.Word(PropertyName.SlotBottomWidth), out var bottom))
                diagnostics.Add(DiagnosticCatalog.SlotDimensionMissing, bottom.Keyword.Span, $"'bottom_width' belongs to a trapezoid slot; {name} is not one");
        }
        return slot with { Shape = shape.Value };
    }
}
