using WindScript.Text;

namespace WindScript.Model;

/// <summary>The parametric slot shapes: how the slot's width varies with depth.</summary>
public enum SlotShape
{
    /// <summary>Only the slot's area is known (<c>area</c>): no drawing, no slot leakage.</summary>
    AreaOnly,
    /// <summary>Parallel sides, open over the full width (formed coils pushed in radially).</summary>
    Open,
    /// <summary>Parallel sides under tooth tips: a narrow opening, a taper, then the full width.</summary>
    SemiClosed,
    /// <summary>Parallel teeth: the slot widens with radius, under tooth tips.</summary>
    Trapezoid,
    /// <summary>Parallel teeth with a semicircular bottom, under tooth tips.</summary>
    RoundBottom,
}

/// <summary>
/// The stator slot's cross-section, in metres, measured from the gap surface into the core:
/// the opening (<see cref="Geometry.SlotOpening"/>) of height <see cref="TipHeight"/>, a taper of
/// height <see cref="TipTaper"/>, the wedge, then the conductor region down to the slot bottom.
/// </summary>
public sealed record SlotGeometry
{
    /// <summary>The block's name, as written after <c>slot</c>.</summary>
    public string Name { get; init; } = "";

    /// <summary>The shape.</summary>
    public SlotShape Shape { get; init; }

    /// <summary>Width at the top of the conductor region (under the wedge).</summary>
    public double? Width { get; init; }

    /// <summary>Trapezoid: width at the slot bottom, if given (else parallel teeth).</summary>
    public double? BottomWidth { get; init; }

    /// <summary>Depth from the gap surface to the slot bottom.</summary>
    public double? Depth { get; init; }

    /// <summary>Height of the tooth tips at the opening.</summary>
    public double TipHeight { get; init; }

    /// <summary>Height over which the slot widens from the opening to its width.</summary>
    public double TipTaper { get; init; }

    /// <summary>The slot's area under the wedge (m²), when given directly.</summary>
    public double? Area { get; init; }

    /// <summary>Liner (ground insulation) thickness.</summary>
    public double Liner { get; init; }

    /// <summary>Separator thickness between the layers.</summary>
    public double Separator { get; init; }

    /// <summary>Wedge thickness.</summary>
    public double Wedge { get; init; }

    /// <summary>Strands the slot drawing holds, if stated (checked against the coils).</summary>
    public int? DrawnStrands { get; init; }

    /// <summary>Where the slot block is.</summary>
    public TextSpan Span { get; init; }

    /// <summary>The span of the <c>slot</c> keyword.</summary>
    public TextSpan KeywordSpan { get; init; }
}
