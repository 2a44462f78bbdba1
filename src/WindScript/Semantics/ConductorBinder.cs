using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>
/// Reads a conductor block: round wire (bare diameter with grade, or overall diameter) or strip,
/// strands in hand, material, temperature, end windings and the limits of the checks.
/// </summary>
internal sealed class ConductorBinder(DiagnosticBag diagnostics, ExpressionEvaluator evaluator, SemanticModel model)
{
    public ConductorSpec Bind(BlockSyntax block, Scope parent)
    {
        var scope = new Scope(parent);
        foreach (var let in block.Body.OfType<LetSyntax>())
            LetBinder.Bind(let, scope, evaluator, diagnostics, model);
        var read = new PropertyReader(diagnostics, evaluator, scope);
        var seen = new Dictionary<string, PropertySyntax>();
        var c = new ConductorSpec { Name = block.Name.Text, Span = block.Span, KeywordSpan = block.Keyword.Span };
        foreach (var statement in block.Body)
        {
            if (statement is LetSyntax) continue;
            if (statement is not PropertySyntax p || !p.Property.In(BlockKind.Conductor))
            {
                BlockRules.ReportMisplaced(diagnostics, statement, "a conductor block");
                continue;
            }
            if (!BlockRules.FirstTime(diagnostics, seen, p)) continue;
            switch (p.Property.Name)
            {
                case PropertyName.BareDiameter: c = c with { BareDiameter = read.Length(p, "the bare diameter") }; break;
                case PropertyName.Grade: c = c with { Grade = read.Whole(p, "the enamel grade", 1, 3) }; break;
                case PropertyName.OverallDiameter: c = c with { OverallDiameter = read.Length(p, "the overall diameter") }; break;
                case PropertyName.StripWidth: c = c with { StripWidth = read.Length(p, "the strip width") }; break;
                case PropertyName.StripHeight: c = c with { StripHeight = read.Length(p, "the strip height") }; break;
                case PropertyName.CornerRadius: c = c with { CornerRadius = read.Length(p, "the corner radius", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.Insulation: c = c with { Insulation = read.Length(p, "the insulation thickness", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.Strands: c = c with { Strands = read.Whole(p, "strands in hand", 1, 1000) ?? 1 }; break;
                case PropertyName.Material: c = c with { Material = read.Choice(p) is 1 ? ConductorMaterial.Aluminium : ConductorMaterial.Copper }; break;
                case PropertyName.Temperature:
                    if (evaluator.EvaluateAs(p.Value, scope, Units.Dimension.TemperatureDim, "the temperature") is { } t)
                    {
                        if (t is < -60 or > 300)
                            diagnostics.Add(DiagnosticCatalog.InvalidCount, p.Value.Span, $"the operating temperature must lie between -60 and 300 degC (where the linear temperature coefficient holds), not {ExpressionEvaluator.Format(t)}");
                        else c = c with { Temperature = t };
                    }
                    break;
                case PropertyName.EndExtension: c = c with { EndExtension = read.Length(p, "the straight extension", zeroAllowed: true) ?? 0 }; break;
                case PropertyName.EndShape: c = c with { EndShape = read.Choice(p) is { } i ? (EndWindingShape)i : null }; break;
                case PropertyName.EndOverhang: c = c with { EndOverhang = read.Length(p, "the end overhang", zeroAllowed: true) }; break;
                case PropertyName.EndLength: c = c with { EndLength = read.Length(p, "the length of a coil end") }; break;
                case PropertyName.FillLimit: c = c with { FillLimit = read.Number(p, "the fill limit", 0, 1) }; break;
                case PropertyName.DensityLimit: c = c with { DensityLimit = read.Quantity(p, Units.Dimension.CurrentDensity, "the current-density limit") }; break;
            }
        }
        Validate(block, seen, c);
        return c;
    }

    private void Validate(BlockSyntax block, Dictionary<string, PropertySyntax> seen, ConductorSpec c)
    {
        string name = $"conductor '{block.Name.Text}'";
        bool Has(PropertyName p) => seen.ContainsKey(Vocabulary.Word(p));
        PropertySyntax? At(PropertyName p) => seen.GetValueOrDefault(Vocabulary.Word(p));
        void Report(Text.TextSpan span, string message) => diagnostics.Add(DiagnosticCatalog.ConductorDescription, span, message);
        bool round = Has(PropertyName.BareDiameter) || Has(PropertyName.OverallDiameter) || Has(PropertyName.Grade);
        bool strip = Has(PropertyName.StripWidth) || Has(PropertyName.StripHeight);
        if (round && strip)
            Report(block.Keyword.Span, $"{name} describes both round wire (diameters, grade) and strip (width, height): keep one");
        else if (!round && !strip)
            Report(block.Keyword.Span, $"{name} gives no wire: add 'bare_diameter' and 'grade', 'overall_diameter', or 'strip_width' and 'strip_height'");
        else if (round)
        {
            if (!Has(PropertyName.OverallDiameter) && !(Has(PropertyName.BareDiameter) && Has(PropertyName.Grade)))
                Report(block.Keyword.Span, Has(PropertyName.BareDiameter)
                    ? $"{name} gives a bare diameter but neither an enamel 'grade' (1, 2 or 3) nor an 'overall_diameter'"
                    : $"{name} gives an enamel grade but no 'bare_diameter'");
            if (Has(PropertyName.Grade) && Has(PropertyName.OverallDiameter))
                Report(At(PropertyName.Grade)!.Keyword.Span, $"{name} gives both a grade and an overall diameter: the grade would set the overall diameter, so keep one");
            if (c.BareDiameter is { } d && c.OverallDiameter is { } o && o <= d)
                Report(At(PropertyName.OverallDiameter)!.Value.Span, $"the overall diameter ({Mm(o)}) must be larger than the bare diameter ({Mm(d)})");
            foreach (var p in new[] { PropertyName.CornerRadius, PropertyName.Insulation })
                if (At(p) is { } stray) Report(stray.Keyword.Span, $"'{stray.Keyword.Text}' belongs to strip; {name} is round wire");
        }
        else
        {
            if (!Has(PropertyName.StripWidth) || !Has(PropertyName.StripHeight))
                Report(block.Keyword.Span, $"{name} is strip and needs both 'strip_width' and 'strip_height'");
            if (c.StripWidth is { } w && c.StripHeight is { } h && c.CornerRadius * 2 > Math.Min(w, h))
                Report(At(PropertyName.CornerRadius)!.Value.Span, $"the corner radius ({Mm(c.CornerRadius)}) is more than half the strip's smaller side ({Mm(Math.Min(w, h))})");
        }
        if (Has(PropertyName.EndLength) && Has(PropertyName.EndShape))
            Report(At(PropertyName.EndLength)!.Keyword.Span, $"{name} gives both an end shape and the length of a coil end: keep one");
        if (Has(PropertyName.EndOverhang) && c.EndShape is not EndWindingShape.Lap)
            Report(At(PropertyName.EndOverhang)!.Keyword.Span, "'end_overhang' belongs to lap coil ends ('end_shape lap')");
    }

    private static string Mm(double metres) => (metres * 1000).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + " mm";
}
