namespace WindScript.Analysis;

/// <summary>
/// How the star of slots is cut into phase belts. Phase k's positive belt points at k·φ
/// electrical and its negative belt at k·φ + 180°, φ being the phase shift; these directions
/// split the circle into equal sectors, and a slot phasor belongs to the belt whose sector it
/// falls in. Each sector starts at its direction, so an integral-slot winding begins with a
/// whole belt (U U U -W -W -W ...). For three phases the sectors are the classic 60° belts.
/// </summary>
/// <remarks>
/// Angles are exact fractions of a turn, so no slot ever lands on the wrong side of a sector
/// boundary by rounding. Rotating the star by φ maps the sectors onto each other, which is what
/// makes the synthesised phases identical copies displaced by φ.
/// </remarks>
internal sealed class PhaseBelts
{
    private readonly int[] _sectorPhase;
    private readonly int[] _sectorSign;

    private PhaseBelts(int phases, int shiftNumerator, int shiftDenominator, int[] sectorPhase, int[] sectorSign, int rotation)
    {
        Phases = phases;
        ShiftNumerator = shiftNumerator;
        ShiftDenominator = shiftDenominator;
        _sectorPhase = sectorPhase;
        _sectorSign = sectorSign;
        SectorsPerShift = rotation;
    }

    public int Phases { get; }

    /// <summary>The phase shift φ as a reduced fraction of a turn: φ/360° = Numerator/Denominator.</summary>
    public int ShiftNumerator { get; }
    public int ShiftDenominator { get; }

    public double PhaseShiftDegrees => 360.0 * ShiftNumerator / ShiftDenominator;

    /// <summary>Number of equal sectors the circle is cut into (2m for odd m, 4 for two phases in quadrature).</summary>
    public int Sectors => _sectorPhase.Length;

    /// <summary>How many sectors one phase shift spans: rotating the star by φ moves sector j to j + this.</summary>
    public int SectorsPerShift { get; }

    /// <summary>The phase and sign of the belt holding an electrical position given in Q-ths of a turn (0 ≤ position &lt; Q).</summary>
    public (int Phase, int Sign) BeltAt(int position, int slots)
    {
        int sector = (int)((long)position * Sectors / slots);
        return (_sectorPhase[sector], _sectorSign[sector]);
    }

    /// <summary>
    /// The belt that (phase, sign) becomes when the star turns by one phase shift. A side whose
    /// belt the table lacks (the negative sides of an even phase count at 360/m, whose belts
    /// coincide with other phases' positive ones) turns like its reversal, reversed.
    /// </summary>
    public (int Phase, int Sign) Rotate(int phase, int sign)
    {
        for (int j = 0; j < Sectors; j++)
            if (_sectorPhase[j] == phase && _sectorSign[j] == sign)
            {
                int to = (j + SectorsPerShift) % Sectors;
                return (_sectorPhase[to], _sectorSign[to]);
            }
        for (int j = 0; j < Sectors; j++)
            if (_sectorPhase[j] == phase && _sectorSign[j] == -sign)
            {
                int to = (j + SectorsPerShift) % Sectors;
                return (_sectorPhase[to], -_sectorSign[to]);
            }
        return (-1, 0);
    }

    /// <summary>
    /// The belts for m phases at the default phase shift (<see cref="Model.PhaseShift.DefaultTurnFraction"/>).
    /// Null for m &lt; 1.
    /// </summary>
    public static PhaseBelts? ForPhases(int phases)
    {
        if (phases < 1) return null;
        var (num, den) = Model.PhaseShift.DefaultTurnFraction(phases);
        return Create(phases, num, den);
    }

    /// <summary>
    /// Belts for m phases shifted by num/den of a turn, or null when their directions do not cut
    /// the circle into equal sectors, or leave a phase without a belt.
    /// </summary>
    public static PhaseBelts? Create(int phases, int shiftNumerator, int shiftDenominator)
    {
        if (phases < 1 || shiftDenominator < 1 || shiftNumerator < 0) return null;
        int g = (int)WindScript.Numerics.IntegerMath.Gcd(shiftNumerator, shiftDenominator);
        if (g > 1) { shiftNumerator /= g; shiftDenominator /= g; }
        // Directions in units of 1/(2·den) turn; positive belts first, so that for even m at 360/m
        // the negative belt of phase k (which coincides with the positive belt of k + m/2) gives way.
        int units = 2 * shiftDenominator;
        var owner = new Dictionary<int, (int Phase, int Sign)>();
        for (int k = 0; k < phases; k++) owner.TryAdd((int)(2L * k * shiftNumerator % units), (k, 1));
        for (int k = 0; k < phases; k++) owner.TryAdd((int)((2L * k * shiftNumerator + shiftDenominator) % units), (k, -1));
        int sectors = owner.Count;
        if (units % sectors != 0) return null;
        int spacing = units / sectors;
        var phase = new int[sectors];
        var sign = new int[sectors];
        for (int j = 0; j < sectors; j++)
        {
            if (!owner.TryGetValue(j * spacing, out var belt)) return null;   // unequal spacing
            (phase[j], sign[j]) = belt;
        }
        for (int k = 0; k < phases; k++)
            if (Array.IndexOf(phase, k) < 0) return null;
        int shiftUnits = 2 * shiftNumerator;
        if (shiftUnits % spacing != 0) return null;
        return new PhaseBelts(phases, shiftNumerator, shiftDenominator, phase, sign, shiftUnits / spacing % sectors);
    }
}
