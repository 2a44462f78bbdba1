namespace WindScript;

/// <summary>
/// The limits that keep every run short and bounded: a file within them is read, checked and
/// evaluated in well under a second, and none of the counts or their products can overflow.
/// Each is enforced with a diagnostic at the place that exceeds it (the code is named beside
/// it) and documented in README ("Limits") and in the diagnostic's explanation.
/// Real machines sit far inside them.
/// </summary>
public static class InputLimits
{
    /// <summary>Largest file read, in bytes (WS1020 in the core; a usage error in the CLI).</summary>
    public const int MaxFileBytes = 1 << 20;

    /// <summary>Most operators in one expression (one line); longer chains are refused (WS1021).</summary>
    public const int MaxOperatorsPerLine = 1000;

    /// <summary>Most slots Q (WS2040).</summary>
    public const int MaxSlots = 1000;

    /// <summary>Most poles 2p (WS2040).</summary>
    public const int MaxPoles = 1000;

    /// <summary>Most phases m (WS2040).</summary>
    public const int MaxPhases = 64;

    /// <summary>Most turns per coil (WS2040); with <see cref="MaxCoils"/> no sum of turns can overflow.</summary>
    public const int MaxTurns = 10_000;

    /// <summary>Most coils in one winding (WS2041).</summary>
    public const int MaxCoils = 100_000;

    /// <summary>Most parallel paths (WS2040).</summary>
    public const int MaxPaths = 1000;

    /// <summary>Highest electrical order evaluated (<c>--orders</c>).</summary>
    public const int MaxOrders = 1000;

    /// <summary>
    /// Most mechanical orders one evaluation computes (electrical orders times pole pairs): the
    /// cost of the spectrum grows with it. The default 25 orders stay within it up to 1,000 poles.
    /// </summary>
    public const int MaxMechanicalOrders = 25_000;

    /// <summary>
    /// Largest magnitude of a dimensioned value, in SI units (m, A, Hz, rad, T) (WS2042): far beyond
    /// any machine, and small enough that no product of the analysis can overflow.
    /// </summary>
    public const double MaxMagnitude = 1e12;
}
