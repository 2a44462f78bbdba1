using System.Globalization;

namespace WindScript.Reporting.Drawing;

/// <summary>Round tick values (1, 2, 2.5 or 5 times a power of ten) and their labels.</summary>
public static class Ticks
{
    public static double[] Nice(double min, double max, int target = 6)
    {
        if (!(max > min) || !double.IsFinite(min) || !double.IsFinite(max)) return [min];
        double raw = (max - min) / target;
        double power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double step = new[] { 1, 2, 2.5, 5, 10 }.Select(m => m * power).First(s => s >= raw);
        var ticks = new List<double>();
        for (double t = Math.Ceiling(min / step - 1e-9) * step; t <= max + step * 1e-9; t += step)
            ticks.Add(Math.Abs(t) < step * 1e-9 ? 0 : t);
        return [.. ticks];
    }

    /// <summary>A range that contains [min, max] padded by a fraction and symmetric about zero when the data straddle it.</summary>
    public static (double Min, double Max) Range(double min, double max, double pad = 0.08, bool symmetric = false)
    {
        if (symmetric)
        {
            double m = Math.Max(Math.Abs(min), Math.Abs(max));
            if (m == 0) m = 1;
            return (-m * (1 + pad), m * (1 + pad));
        }
        if (max <= min) return (min - 1, max + 1);
        double span = max - min;
        return (min - span * pad, max + span * pad);
    }

    public static string Format(double x)
    {
        double a = Math.Abs(x);
        string f = a == 0 ? "0" : a >= 1000 ? "0" : a >= 10 ? "0.#" : a >= 1 ? "0.##" : "0.###";
        return x.ToString(f, CultureInfo.InvariantCulture);
    }
}
