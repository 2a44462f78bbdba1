namespace WindScript.Units;

/// <summary>
/// Every unit the language accepts. Frequencies are stored as angular frequencies (rad/s), so
/// "50 Hz", "314.159 rad/s" and "3000 rpm" are the same kind of quantity.
/// </summary>
internal static class UnitTable
{
    public static readonly IReadOnlyList<Unit> All =
    [
        new("mm", Dimension.LengthDim, 1e-3),
        new("cm", Dimension.LengthDim, 1e-2),
        new("m", Dimension.LengthDim, 1.0),
        new("A", Dimension.CurrentDim, 1.0),
        new("kA", Dimension.CurrentDim, 1e3),
        new("Hz", Dimension.AngularFrequency, 2 * Math.PI),
        new("rad/s", Dimension.AngularFrequency, 1.0),
        new("rpm", Dimension.AngularFrequency, 2 * Math.PI / 60),
        new("deg", Dimension.AngleDim, Math.PI / 180),
        new("rad", Dimension.AngleDim, 1.0),
        new("slots", Dimension.SlotDim, 1.0),
        new("slot", Dimension.SlotDim, 1.0) { IsAlias = true },
        new("s", Dimension.TimeDim, 1.0),
        new("ms", Dimension.TimeDim, 1e-3),
        new("T", Dimension.FluxDensity, 1.0),
        new("mT", Dimension.FluxDensity, 1e-3),
        new("Wb", Dimension.Flux, 1.0),
        new("mWb", Dimension.Flux, 1e-3),
        new("V", Dimension.Voltage, 1.0),
        new("H", Dimension.Inductance, 1.0),
        new("mH", Dimension.Inductance, 1e-3),
        // ---- conductors and slots ----
        new("mm2", Dimension.Area, 1e-6),
        new("A/mm2", Dimension.CurrentDensity, 1e6),
        new("degC", Dimension.TemperatureDim, 1.0),
    ];

    private static readonly Dictionary<string, Unit> BySymbol = All.ToDictionary(u => u.Symbol, StringComparer.Ordinal);

    public static Unit? Find(string symbol) => BySymbol.GetValueOrDefault(symbol);

    /// <summary>The symbols, longest first, so that "rad/s" is tried before "rad" and "mm" before "m".</summary>
    public static IReadOnlyList<string> SymbolsLongestFirst { get; } =
        All.Select(u => u.Symbol).OrderByDescending(s => s.Length).ThenBy(s => s, StringComparer.Ordinal).ToArray();

    /// <summary>A unit a designer would write for a dimension, used in messages ("such as mm").</summary>
    public static string Example(Dimension d) =>
        d == Dimension.LengthDim ? "mm" :
        d == Dimension.CurrentDim ? "A" :
        d == Dimension.AngleDim ? "deg" :
        d == Dimension.SlotDim ? "slots" :
        d == Dimension.AngularFrequency ? "Hz" :
        d == Dimension.TimeDim ? "ms" :
        d == Dimension.FluxDensity ? "T" :
        d == Dimension.Flux ? "Wb" :
        d == Dimension.Area ? "mm2" :
        d == Dimension.CurrentDensity ? "A/mm2" :
        d == Dimension.TemperatureDim ? "degC" : "";
}
