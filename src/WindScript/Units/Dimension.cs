namespace WindScript.Units;

/// <summary>
/// Exponents of the base dimensions a winding description uses. Angle and slot pitch are kept
/// as base dimensions of their own so that "phase 30" (no unit) or "pitch 7 mm" is caught.
/// </summary>
internal readonly record struct Dimension(sbyte Mass, sbyte Length, sbyte Time, sbyte Current, sbyte Angle, sbyte Slots, sbyte Temperature = 0)
{
    public static readonly Dimension None = default;
    public static readonly Dimension LengthDim = new(0, 1, 0, 0, 0, 0);
    public static readonly Dimension TimeDim = new(0, 0, 1, 0, 0, 0);
    public static readonly Dimension CurrentDim = new(0, 0, 0, 1, 0, 0);
    public static readonly Dimension AngleDim = new(0, 0, 0, 0, 1, 0);
    public static readonly Dimension SlotDim = new(0, 0, 0, 0, 0, 1);
    public static readonly Dimension AngularFrequency = new(0, 0, -1, 0, 1, 0);
    public static readonly Dimension FluxDensity = new(1, 0, -2, -1, 0, 0);
    public static readonly Dimension Flux = new(1, 2, -2, -1, 0, 0);
    public static readonly Dimension Voltage = new(1, 2, -3, -1, 0, 0);
    public static readonly Dimension Inductance = new(1, 2, -2, -2, 0, 0);
    // ---- conductors and slots ----
    public static readonly Dimension Area = new(0, 2, 0, 0, 0, 0);
    public static readonly Dimension CurrentDensity = new(0, -2, 0, 1, 0, 0);
    /// <summary>A temperature, held in degrees Celsius (only differences from 20 degC enter the physics).</summary>
    public static readonly Dimension TemperatureDim = new(0, 0, 0, 0, 0, 0, 1);

    public bool IsNone => this == None;

    public static Dimension operator *(Dimension a, Dimension b) => new(
        (sbyte)(a.Mass + b.Mass), (sbyte)(a.Length + b.Length), (sbyte)(a.Time + b.Time),
        (sbyte)(a.Current + b.Current), (sbyte)(a.Angle + b.Angle), (sbyte)(a.Slots + b.Slots), (sbyte)(a.Temperature + b.Temperature));

    public static Dimension operator /(Dimension a, Dimension b) => new(
        (sbyte)(a.Mass - b.Mass), (sbyte)(a.Length - b.Length), (sbyte)(a.Time - b.Time),
        (sbyte)(a.Current - b.Current), (sbyte)(a.Angle - b.Angle), (sbyte)(a.Slots - b.Slots), (sbyte)(a.Temperature - b.Temperature));

    /// <summary>A name a designer recognises ("length", "current", ...) or the exponent form.</summary>
    public string Describe()
    {
        if (this == None) return "a plain number";
        if (this == LengthDim) return "a length";
        if (this == TimeDim) return "a time";
        if (this == CurrentDim) return "a current";
        if (this == AngleDim) return "an angle";
        if (this == SlotDim) return "a number of slots";
        if (this == AngularFrequency) return "a frequency";
        if (this == FluxDensity) return "a flux density";
        if (this == Flux) return "a magnetic flux";
        if (this == Voltage) return "a voltage";
        if (this == Inductance) return "an inductance";
        if (this == Area) return "an area";
        if (this == CurrentDensity) return "a current density";
        if (this == TemperatureDim) return "a temperature";
        var parts = new List<string>();
        void Part(string symbol, int e) { if (e != 0) parts.Add(e == 1 ? symbol : $"{symbol}^{e}"); }
        Part("kg", Mass); Part("m", Length); Part("s", Time); Part("A", Current); Part("rad", Angle); Part("slot", Slots); Part("degC", Temperature);
        return "a quantity in " + string.Join("·", parts);
    }
}
