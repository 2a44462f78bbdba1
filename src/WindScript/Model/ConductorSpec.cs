using WindScript.Text;

namespace WindScript.Model;

/// <summary>Conductor materials with standard resistivities.</summary>
public enum ConductorMaterial
{
    /// <summary>Annealed copper (IEC 60028).</summary>
    Copper,
    /// <summary>Aluminium for electrical purposes (IEC 60121).</summary>
    Aluminium,
}

/// <summary>The shape of a coil end, from which its length follows.</summary>
public enum EndWindingShape
{
    /// <summary>Lap (diamond) coil ends: two inclined legs meeting at an apex.</summary>
    Lap,
    /// <summary>Concentric coil ends: a half circle over the coil span.</summary>
    Concentric,
    /// <summary>A coil wound around one tooth: the end runs round the tooth's end.</summary>
    ToothCoil,
}

/// <summary>
/// The conductor of the winding (metres, degrees Celsius): round enamelled wire by bare diameter and
/// IEC 60317 grade, or by overall diameter, or rectangular strip; strands in hand; material; the
/// operating temperature; the end windings; the limits the checks apply.
/// </summary>
public sealed record ConductorSpec
{
    /// <summary>The block's name, as written after <c>conductor</c>.</summary>
    public string Name { get; init; } = "";

    /// <summary>Round wire: bare (copper) diameter.</summary>
    public double? BareDiameter { get; init; }

    /// <summary>Round wire: enamel grade 1, 2 or 3 (IEC 60317).</summary>
    public int? Grade { get; init; }

    /// <summary>Round wire: diameter over the enamel, when stated.</summary>
    public double? OverallDiameter { get; init; }

    /// <summary>Strip: bare width (across the slot).</summary>
    public double? StripWidth { get; init; }

    /// <summary>Strip: bare height (along the slot depth).</summary>
    public double? StripHeight { get; init; }

    /// <summary>Strip: corner radius.</summary>
    public double CornerRadius { get; init; }

    /// <summary>Strip: insulation thickness per side.</summary>
    public double Insulation { get; init; }

    /// <summary>True for rectangular strip, false for round wire.</summary>
    public bool IsStrip => StripWidth is not null || StripHeight is not null;

    /// <summary>Strands in hand (parallel wires of one turn).</summary>
    public int Strands { get; init; } = 1;

    /// <summary>The material.</summary>
    public ConductorMaterial Material { get; init; }

    /// <summary>Operating temperature (degC), if stated.</summary>
    public double? Temperature { get; init; }

    /// <summary>Straight axial run beyond the core at each end.</summary>
    public double EndExtension { get; init; }

    /// <summary>The shape of the coil ends, if stated.</summary>
    public EndWindingShape? EndShape { get; init; }

    /// <summary>Lap ends: axial height of the apex beyond the straight run, if stated.</summary>
    public double? EndOverhang { get; init; }

    /// <summary>Length of one coil end, slot to slot, when stated instead of a shape.</summary>
    public double? EndLength { get; init; }

    /// <summary>Net fill factor above which the checker warns, if stated.</summary>
    public double? FillLimit { get; init; }

    /// <summary>rms current density (A/m²) above which the checker warns, if stated.</summary>
    public double? DensityLimit { get; init; }

    /// <summary>Where the conductor block is.</summary>
    public TextSpan Span { get; init; }

    /// <summary>The span of the <c>conductor</c> keyword.</summary>
    public TextSpan KeywordSpan { get; init; }
}
