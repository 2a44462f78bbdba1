using System.Globalization;

namespace WindScript.Units;

/// <summary>A value in SI (radians for angles) with its dimension.</summary>
internal readonly record struct Quantity(double Value, Dimension Dimension)
{
    public static Quantity Plain(double value) => new(value, Dimension.None);

    public override string ToString()
    {
        string unit = UnitTable.Example(Dimension);
        if (unit.Length == 0) return Value.ToString("G6", CultureInfo.InvariantCulture) + (Dimension.IsNone ? "" : " (" + Dimension.Describe() + ")");
        double shown = Value / UnitTable.Find(unit)!.ToSi;
        if (Dimension == Dimension.AngularFrequency) return (Value / (2 * Math.PI)).ToString("G6", CultureInfo.InvariantCulture) + " Hz";
        return shown.ToString("G6", CultureInfo.InvariantCulture) + " " + unit;
    }
}
