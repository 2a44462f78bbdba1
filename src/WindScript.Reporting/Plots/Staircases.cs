using WindScript.Analysis;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>Drawing helpers shared by the plots over the circumference (MMF, field).</summary>
public static class Staircases
{
    public static readonly double[] DegreeTicks = [0, 45, 90, 135, 180, 225, 270, 315, 360];

    /// <summary>
    /// A staircase over 0..360° in chart pixels: level i from the centre of slot i to the centre
    /// of slot i + 1 (0-based), the last level wrapping round past 360° to the first slot centre.
    /// </summary>
    public static List<Point> Points(ChartArea area, IReadOnlyList<double> levels)
    {
        int q = levels.Count;
        var points = new List<Point>(2 * q + 2) { area.At(0, levels[q - 1]) };
        for (int i = 0; i < q; i++)
        {
            double at = SlotFourier.SlotAngle(i, q) * 180 / Math.PI;
            points.Add(area.At(at, levels[(i + q - 1) % q]));
            points.Add(area.At(at, levels[i]));
        }
        points.Add(area.At(360, levels[q - 1]));
        return points;
    }

    /// <summary>A smooth function of the mechanical angle (radians) sampled every half degree, as (degrees, value).</summary>
    public static List<Point> Sample(Func<double, double> f) =>
        [.. Enumerable.Range(0, 721).Select(i => new Point(i / 2.0, f(i / 2.0 * Math.PI / 180)))];

    /// <summary>Short ticks at the slot centres along the bottom of the chart, with slot numbers where they fit.</summary>
    public static void SlotMarks(Scene s, ChartArea area, int slots)
    {
        double pitch = area.Width / slots;
        int every = Math.Max(1, (int)Math.Ceiling(22 / pitch));
        for (int i = 0; i < slots; i++)
        {
            double x = area.X(SlotFourier.SlotAngle(i, slots) * 180 / Math.PI);
            s.Line(x, area.Bottom, x, area.Bottom - 5, new Stroke(Palette.Muted, 1));
            if (i % every == 0) s.Text(x, area.Bottom - 8, (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), 8, Palette.Muted, Anchor.Middle);
        }
    }
}
