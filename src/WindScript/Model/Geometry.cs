namespace WindScript.Model;

/// <summary>
/// Core dimensions in SI (metres). Each is optional: analyses that need one report that it is
/// missing rather than assume it.
/// </summary>
public sealed record Geometry
{
    /// <summary>
    /// Diameter of the stator's slotted surface at the gap: the bore (inner diameter) of an
    /// inner-rotor machine, the stator's outer diameter when the rotor is outside.
    /// </summary>
    public double? BoreDiameter { get; init; }

    /// <summary>Axial length of the core.</summary>
    public double? StackLength { get; init; }

    /// <summary>Mechanical air gap (radial).</summary>
    public double? Gap { get; init; }

    /// <summary>Width of the slot opening at the bore, for Carter's coefficient.</summary>
    public double? SlotOpening { get; init; }

    /// <summary>Radius of the rotor's gap surface, if given; otherwise bore radius ∓ gap.</summary>
    public double? RotorRadius { get; init; }

    /// <summary>True when the rotor lies outside the stator (hub and fan motors): the gap is outside the slotted surface.</summary>
    public bool RotorOutside { get; init; }

    /// <summary>Skew of the stator slots, in slot pitches (0 = unskewed).</summary>
    public double SkewSlots { get; init; }

    /// <summary>Peak of the fundamental air-gap flux density (tesla), for back-EMF.</summary>
    public double? GapFluxDensity { get; init; }

    /// <summary>Diameter of the core's back surface: the stator's outer diameter (its inner diameter when the rotor is outside).</summary>
    public double? BackDiameter { get; init; }

    /// <summary>Bore radius (m), half the bore diameter; null without a bore.</summary>
    public double? BoreRadius => BoreDiameter / 2;

    /// <summary>The radius of the rotor's gap surface actually used: given, or bore radius minus (inner rotor) or plus (outer rotor) the gap.</summary>
    public double? RotorOuterRadius => RotorRadius ?? (BoreDiameter is { } d && Gap is { } g ? (RotorOutside ? d / 2 + g : d / 2 - g) : null);

    /// <summary>The radial gap actually used: given, or the distance between the bore and rotor radii.</summary>
    public double? EffectiveMechanicalGap => Gap ?? (BoreDiameter is { } d && RotorRadius is { } r ? (RotorOutside ? r - d / 2 : d / 2 - r) : null);

    /// <summary>Slot pitch at the bore, in metres.</summary>
    public double? SlotPitch(int slots) => BoreDiameter is { } d ? Math.PI * d / slots : null;
}
