namespace WindScript.Model;

/// <summary>
/// The default spatial displacement between successive phase axes, in one place: 360/m
/// electrical degrees, two phases in quadrature (90°), none for one phase. Used by the binder
/// (when a machine gives no <c>phase_shift</c>), the emitter (to leave the default unwritten)
/// and the star of slots (the phase belts of the default shift).
/// </summary>
internal static class PhaseShift
{
    /// <summary>The default shift as a fraction of a full electrical turn: num/den.</summary>
    public static (int Numerator, int Denominator) DefaultTurnFraction(int phases) => phases switch
    {
        <= 1 => (0, 1),
        2 => (1, 4),
        _ => (1, phases),
    };

    /// <summary>The default shift in electrical degrees.</summary>
    public static double DefaultDegrees(int phases)
    {
        var (num, den) = DefaultTurnFraction(phases);
        return 360.0 * num / den;
    }
}
