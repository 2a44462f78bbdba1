namespace WindScript.Analysis;

/// <summary>
/// The turns (winding) function N(θ) of one phase: a zero-mean staircase that steps by the
/// signed conductors of each slot at its centre θ_s = 2π(s + ½)/Q. Level i holds on the
/// interval [θ_i, θ_(i+1)) (the last interval wraps past 2π to θ_0). Multiplied by the phase
/// current it is the air-gap MMF of that phase (ideal iron, conductors at slot centres).
/// </summary>
/// <remarks>
/// The mean is removed because flux leaving the rotor must return to it: with a uniform gap the
/// magnetic potential of the rotor iron settles where the mean MMF across the gap is zero.
/// Fourier form: N(θ) = Σ_ν Re(C_ν e^(jνθ)) with C_ν = S(ν) / (jπν), S from <see cref="SlotFourier"/>.
/// </remarks>
internal sealed class TurnsFunction
{
    private readonly double[] _levels;

    private TurnsFunction(double[] levels) => _levels = levels;

    /// <summary>Builds the turns function of slot conductors scaled by <paramref name="scale"/> (1/paths for series turns).</summary>
    public static TurnsFunction FromConductors(ReadOnlySpan<int> slotConductors, double scale = 1)
    {
        var levels = new double[slotConductors.Length];
        Levels(slotConductors, scale, levels);
        return new TurnsFunction(levels);
    }

    /// <summary>Writes the zero-mean staircase levels (one per interval after each slot centre) without allocating.</summary>
    public static void Levels(ReadOnlySpan<int> slotConductors, double scale, Span<double> levels)
    {
        int q = slotConductors.Length;
        double running = 0, sum = 0;
        for (int i = 0; i < q; i++)
        {
            running += slotConductors[i] * scale;
            levels[i] = running;
            sum += running;
        }
        double mean = q == 0 ? 0 : sum / q;
        for (int i = 0; i < q; i++) levels[i] -= mean;
    }

    public int Slots => _levels.Length;

    /// <summary>Staircase levels; level i holds from the centre of slot i to the centre of slot i + 1.</summary>
    public ReadOnlySpan<double> StepLevels => _levels;

    /// <summary>N(θ) at mechanical angle θ (radians, any value; right-continuous at the steps).</summary>
    public double ValueAt(double theta) => _levels[IntervalAt(theta, _levels.Length)];

    /// <summary>The interval index (0..Q−1) holding angle θ: interval i is [θ_i, θ_(i+1)).</summary>
    public static int IntervalAt(double theta, int slots)
    {
        double x = theta / (2 * Math.PI) * slots - 0.5;
        int i = (int)Math.Floor(x) % slots;
        return i < 0 ? i + slots : i;
    }
}
