using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// The conductor length of a coil end and the mean length of a turn, MLT = 2·(l + l_end), with l the
/// stack length and l_end one coil end: the straight extension at both sides plus the end's run,
/// from its shape over the coil span w (the arc of the coil's pitch at the radius of the conductor
/// region's middle):
/// lap (diamond) — two inclined legs to an apex at height h beyond the straight run: 2·√((w/2)² + h²),
/// h = (w/2)·tan 30° unless 'end_overhang' gives it (legs at 30° to the core face: common practice);
/// concentric — a half circle over the span: π·w/2;
/// tooth coil — round the tooth's end at a quarter slot width from it: b_t + π·b_s/4 = w − b_s·(1 − π/4);
/// or the length of a coil end as stated ('end_length', straight extension included).
/// </summary>
internal static class TurnLength
{
    public static readonly double DefaultLegAngle = 30 * Math.PI / 180;

    /// <summary>The coil span w (m) of a coil of <paramref name="pitchSlots"/> slots at the conductors' radius, or null without a bore.</summary>
    public static double? Span(WindingDesign design, SlotSection? section, int pitchSlots)
    {
        double? radius = section?.RadiusAt(section.ConductorMid) ?? design.Geometry.BoreRadius;
        return radius is { } r ? pitchSlots * 2 * Math.PI * r / design.Slots : null;
    }

    /// <summary>One coil end's length (m), or null when the conductor block gives neither a shape nor a length, or the span is unknown.</summary>
    public static double? EndLength(ConductorSpec c, double? span, double? slotWidthAtMid)
    {
        if (c.EndLength is { } given) return given;
        if (c.EndShape is not { } shape || span is not { } w) return null;
        double straight = 2 * c.EndExtension;
        return shape switch
        {
            EndWindingShape.Lap => straight + 2 * Math.Sqrt(w * w / 4 + Math.Pow(c.EndOverhang ?? w / 2 * Math.Tan(DefaultLegAngle), 2)),
            EndWindingShape.Concentric => straight + Math.PI * w / 2,
            _ => straight + w - (slotWidthAtMid ?? w / 2) * (1 - Math.PI / 4),
        };
    }

    /// <summary>The shortest way round between a coil's sides, in slots.</summary>
    public static int PitchOf(Coil coil, int slots)
    {
        int y = coil.PitchSlots(slots);
        return Math.Max(1, Math.Min(y, slots - y));
    }
}
