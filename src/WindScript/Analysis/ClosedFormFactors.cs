namespace WindScript.Analysis;

/// <summary>
/// Closed-form distribution, pitch and skew factors (Pyrhonen, Jokinen, Hrabovcova, Design of
/// Rotating Electrical Machines, ch. 2), written in the mechanical order ν for a Q-slot stator.
/// In electrical terms (n = ν/p, slot angle α = 2πp/Q): k_d = sin(nqα/2)/(q sin(nα/2)),
/// k_p = sin(n·(y/τ_p)·π/2), k_sk = sin(n·s·α/2)/(n·s·α/2). All return magnitudes.
/// k_d and k_p describe one pole of a regular winding: they hold at odd electrical orders; the
/// reversed belts of the next pole cancel every even order and every non-integer one.
/// </summary>
public static class ClosedFormFactors
{
    /// <summary>Distribution factor of q adjacent slots: |sin(νqπ/Q) / (q·sin(νπ/Q))|.</summary>
    public static double Distribution(int order, int slotsPerPolePerPhase, int slots)
    {
        double x = Math.PI * order / slots;
        double denominator = slotsPerPolePerPhase * Math.Sin(x);
        // At multiples of Q the ratio tends to ±1 (all slots in phase again).
        if (Math.Abs(denominator) < 1e-12) return 1;
        return Math.Abs(Math.Sin(slotsPerPolePerPhase * x) / denominator);
    }

    /// <summary>Pitch (chording) factor of a coil spanning y slots: |sin(νyπ/Q)|.</summary>
    public static double Pitch(int order, int coilPitchSlots, int slots) =>
        Math.Abs(Math.Sin(Math.PI * order * coilPitchSlots / slots));

    /// <summary>Skew factor for a skew of s slot pitches: |sin(νsπ/Q) / (νsπ/Q)|.</summary>
    public static double Skew(int order, double skewSlots, int slots)
    {
        double x = Math.PI * order * skewSlots / slots;
        return x == 0 ? 1 : Math.Abs(Math.Sin(x) / x);
    }
}
