using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// The slot's cross-section as the analyses use it (metres, depth d measured from the gap surface
/// into the core): the opening b1 over the tip height h1, the taper h2, the wedge h3, then the
/// conductor region (height h4) whose width b(d) the shape gives: constant (open, semi_closed),
/// growing by 2π/Q per unit depth (parallel teeth: trapezoid, round_bottom; shrinking when the rotor
/// is outside and the slots point inward), or as stated by a bottom width; a round bottom ends in a
/// semicircle as wide as the slot there. Null parts: not drawable (area only).
/// </summary>
internal sealed record SlotSection
{
    private const int Steps = 2000;

    public required SlotShape Shape { get; init; }
    /// <summary>Opening width b1 (for an open slot the slot width); null when unknown.</summary>
    public double? Opening { get; init; }
    public double TipHeight { get; init; }
    public double TipTaper { get; init; }
    public double Wedge { get; init; }
    public double Liner { get; init; }
    public double Separator { get; init; }
    public int Layers { get; init; } = 1;
    /// <summary>Total slot depth (null for area only).</summary>
    public double? Depth { get; init; }
    /// <summary>Width b4 at the top of the conductor region.</summary>
    public double? TopWidth { get; init; }
    /// <summary>Width at the slot bottom (for a round bottom: where the semicircle starts).</summary>
    public double? BottomWidth { get; init; }
    /// <summary>Round bottom: depth where the semicircle starts.</summary>
    public double? ArcStart { get; init; }
    /// <summary>Radius of the slot's gap surface (null without a bore), and +1 when slots point outward (rotor inside), −1 inward.</summary>
    public double? GapRadius { get; init; }
    public int Outward { get; init; } = 1;
    public int Slots { get; init; }
    /// <summary>Area under the wedge given directly.</summary>
    public double? GivenArea { get; init; }

    /// <summary>Depth where the conductor region starts: h1 + h2 + h3.</summary>
    public double ConductorTop => TipHeight + TipTaper + Wedge;

    /// <summary>Height of the conductor region h4 (liner included); null for area only.</summary>
    public double? ConductorHeight => Depth - ConductorTop;

    public bool Drawable => Shape != SlotShape.AreaOnly && Depth is not null && TopWidth is not null && ConductorHeight > 0;

    public static SlotSection Of(WindingDesign design)
    {
        var slot = design.Slot!;
        var g = design.Geometry;
        double? opening = slot.Shape == SlotShape.Open ? slot.Width : g.SlotOpening;
        var section = new SlotSection
        {
            Shape = slot.Shape, Opening = opening, TipHeight = slot.Shape == SlotShape.Open ? 0 : slot.TipHeight,
            TipTaper = slot.Shape == SlotShape.Open ? 0 : slot.TipTaper, Wedge = slot.Wedge, Liner = slot.Liner, Separator = design.Winding.Layers == 2 ? slot.Separator : 0,
            Layers = design.Winding.Layers, Depth = slot.Depth, TopWidth = slot.Width, GapRadius = g.BoreRadius,
            Outward = g.RotorOutside ? -1 : 1, Slots = design.Slots, GivenArea = slot.Area,
        };
        if (slot.Shape == SlotShape.AreaOnly || slot.Width is not { } b4 || slot.Depth is not { } depth) return section;
        double h4 = depth - section.ConductorTop;
        double k = section.Outward * 2 * Math.PI / design.Slots; // parallel teeth: dB/dd
        switch (slot.Shape)
        {
            case SlotShape.Trapezoid:
                return section with { BottomWidth = slot.BottomWidth ?? b4 + k * h4 };
            case SlotShape.RoundBottom:
                // Straight part of height ht, then a semicircle of diameter b4 + k·ht: ht + (b4 + k·ht)/2 = h4.
                double ht = (h4 - b4 / 2) / (1 + k / 2);
                return section with { ArcStart = section.ConductorTop + ht, BottomWidth = b4 + k * ht };
            default:
                return section with { BottomWidth = b4 };
        }
    }

    /// <summary>Width b(d) of the slot at depth d within the conductor region.</summary>
    public double Width(double d)
    {
        double top = ConductorTop, b4 = TopWidth ?? 0, depth = Depth ?? top;
        if (Shape == SlotShape.RoundBottom && ArcStart is { } a && d > a)
        {
            double r = (BottomWidth ?? b4) / 2, x = Math.Min(d - a, r);
            return 2 * Math.Sqrt(Math.Max(0, r * r - x * x));
        }
        double end = Shape == SlotShape.RoundBottom ? ArcStart ?? depth : depth;
        double bb = BottomWidth ?? b4;
        return end > top ? b4 + (bb - b4) * (d - top) / (end - top) : b4;
    }

    /// <summary>Area of the conductor region inside the iron (liner included): the gross slot area, or the area as given.</summary>
    public double GrossArea => Drawable ? Integrate(Width) : GivenArea ?? 0;

    /// <summary>Perimeter of the conductor region (sides, bottom, and the top under the wedge), for the liner.</summary>
    public double Perimeter
    {
        get
        {
            if (!Drawable) return 0;
            double top = ConductorTop, depth = Depth!.Value, h = (depth - top) / Steps, sides = 0;
            for (int i = 0; i < Steps; i++)
            {
                double d0 = top + i * h, d1 = d0 + h;
                double dw = (Width(d1) - Width(d0)) / 2;
                sides += 2 * Math.Sqrt(h * h + dw * dw);
            }
            return sides + Width(top) + (Shape == SlotShape.RoundBottom ? 0 : Width(depth));
        }
    }

    /// <summary>
    /// Area left for conductors inside liner and separator: A − t·P + c·t² (the liner as a band of
    /// thickness t along the perimeter P; c corrects the corners: 4 for four right-angled corners, 2 + π/2
    /// with a round bottom), minus the separator across the slot's mid width. Area only: the area as given
    /// less the separator across √A.
    /// </summary>
    public double NetArea
    {
        get
        {
            if (!Drawable) return Math.Max(0, (GivenArea ?? 0) - Separator * Math.Sqrt(GivenArea ?? 0));
            double t = Liner, c = Shape == SlotShape.RoundBottom ? 2 + Math.PI / 2 : 4;
            double mid = Width((ConductorTop + Depth!.Value) / 2);
            return Math.Max(0, GrossArea - t * Perimeter + c * t * t - Separator * Math.Max(0, mid - 2 * t));
        }
    }

    /// <summary>Radius at depth d (null without a bore).</summary>
    public double? RadiusAt(double d) => GapRadius is { } r ? r + Outward * d : null;

    /// <summary>Tooth width at depth d: 2π·r(d)/Q − b(d) (null without a bore).</summary>
    public double? ToothWidthAt(double d) => RadiusAt(d) is { } r ? 2 * Math.PI * r / Slots - Width(d) : null;

    /// <summary>Depth of the middle of the conductor region (where the coil sides' centres lie).</summary>
    public double ConductorMid => Drawable ? (ConductorTop + Depth!.Value) / 2 : TipHeight + TipTaper + Wedge;

    private double Integrate(Func<double, double> f)
    {
        double a = ConductorTop, b = Depth!.Value, h = (b - a) / Steps, sum = f(a) + f(b);
        for (int i = 1; i < Steps; i++) sum += f(a + i * h) * (i % 2 == 1 ? 4 : 2);
        return sum * h / 3;
    }
}
