using System.Globalization;

namespace WindScript.Reporting.Drawing;

/// <summary>
/// A rectangular plot area mapping data (x right, y up) to pixels, with a frame, grid, ticks and
/// axis labels drawn into a scene.
/// </summary>
public sealed class ChartArea(double left, double top, double width, double height, double xMin, double xMax, double yMin, double yMax)
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public double Left { get; } = left;
    public double Top { get; } = top;
    public double Width { get; } = width;
    public double Height { get; } = height;
    public double XMin { get; } = xMin;
    public double XMax { get; } = xMax;
    public double YMin { get; } = yMin;
    public double YMax { get; } = yMax;
    public double Bottom => Top + Height;
    public double Right => Left + Width;

    public double X(double x) => Left + (x - XMin) / (XMax - XMin) * Width;

    public double Y(double y) => Bottom - (y - YMin) / (YMax - YMin) * Height;

    public Point At(double x, double y) => new(X(x), Y(y));

    /// <summary>Grid, frame, tick labels and axis titles. Null tick lists mean "choose nice ticks".</summary>
    public void DrawAxes(Scene s, string xTitle, string yTitle, IReadOnlyList<double>? xTicks = null, IReadOnlyList<double>? yTicks = null,
        Func<double, string>? xFormat = null, Func<double, string>? yFormat = null)
    {
        xTicks ??= Ticks.Nice(XMin, XMax);
        yTicks ??= Ticks.Nice(YMin, YMax);
        xFormat ??= Ticks.Format;
        yFormat ??= Ticks.Format;
        var grid = new Stroke(Palette.Grid, 1);
        foreach (double x in xTicks.Where(x => x >= XMin - 1e-12 && x <= XMax + 1e-12))
        {
            s.Line(X(x), Top, X(x), Bottom, grid);
            s.Text(X(x), Bottom + 15, xFormat(x), 11, Palette.Muted, Anchor.Middle);
        }
        foreach (double y in yTicks.Where(y => y >= YMin - 1e-12 && y <= YMax + 1e-12))
        {
            s.Line(Left, Y(y), Right, Y(y), grid);
            s.Text(Left - 6, Y(y) + 4, yFormat(y), 11, Palette.Muted, Anchor.End);
        }
        if (YMin < 0 && YMax > 0) s.Line(Left, Y(0), Right, Y(0), new Stroke(Palette.Muted, 1));
        s.Rect(Left, Top, Width, Height, null, new Stroke(Palette.Muted, 1));
        s.Text(Left + Width / 2, Bottom + 34, xTitle, 12, Palette.Ink, Anchor.Middle);
        s.Text(Left - 48, Top + Height / 2, yTitle, 12, Palette.Ink, Anchor.Middle, rotate: -90);
    }

    /// <summary>A legend row just above the top right corner of the area: short coloured lines or blocks with names.</summary>
    public void DrawLegend(Scene s, IReadOnlyList<(string Name, string Color, bool Block, double[]? Dash)> entries)
    {
        double widthNeeded = entries.Sum(e => 34 + Scene.TextWidth(e.Name, 11));
        double x = Right - widthNeeded + 10, y = Top - 10;
        foreach (var (name, color, block, dash) in entries)
        {
            if (block) s.Rect(x, y - 5, 18, 10, color);
            else s.Line(x, y, x + 18, y, new Stroke(color, 2.5, dash));
            s.Text(x + 24, y + 4, name, 11);
            x += 34 + Scene.TextWidth(name, 11);
        }
    }

    public static string Degrees(double x) => x.ToString("0", Inv);
}
