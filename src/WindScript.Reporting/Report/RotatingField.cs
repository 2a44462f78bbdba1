using System.Numerics;
using System.Text.Json;
using WindScript.Model;
using WindScript.Reporting.Drawing;
using WindScript.Reporting.Plots;

namespace WindScript.Reporting.Report;

/// <summary>
/// The animation of the rotating field: for every drive, F(θ, t) over one electrical period in
/// <see cref="FramesPerPeriod"/> frames (the staircase levels, the phase currents and the complex
/// amplitude of the working wave), and the static drawing the page's script animates — a ring
/// coloured by F with the crests of the working wave, and the developed F(θ) with its fundamental.
/// The first frame is drawn in the SVG itself, so the picture stands without the script.
/// </summary>
public static class RotatingField
{
    public const int FramesPerPeriod = 72;

    // Layout of the drawing, shared with the script through the JSON.
    private const double RingX = 175, RingY = 205, RingInner = 105, RingOuter = 150;
    private const double ChartLeft = 420, ChartTop = 55, ChartWidth = 460, ChartHeight = 290;

    public sealed record Frames(string Json, Scene Scene);

    public static Frames Build(WindingDesign design)
    {
        var excitations = design.Drives.IsEmpty
            ? [Excitation.Resolve(design, null)!]
            : design.Drives.Select(d => Excitation.Of(design, d)).ToList();
        var drives = excitations.Select(x => Sample(x, design.PolePairs)).ToList();
        double yMax = Math.Max(1e-9, drives.Max(d => d.Peak)) * 1.12;

        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream))   // the default encoder escapes '<', so the JSON is safe inside <script>
        {
            json.WriteStartObject();
            json.WriteNumber("slots", design.Slots);
            json.WriteNumber("polePairs", design.PolePairs);
            json.WriteStartArray("phases");
            foreach (var p in design.Phases) json.WriteStringValue(p.Name);
            json.WriteEndArray();
            json.WriteStartObject("chart");
            json.WriteNumber("left", ChartLeft);
            json.WriteNumber("top", ChartTop);
            json.WriteNumber("width", ChartWidth);
            json.WriteNumber("height", ChartHeight);
            json.WriteNumber("yMax", yMax);
            json.WriteEndObject();
            json.WriteStartObject("ring");
            json.WriteNumber("cx", RingX);
            json.WriteNumber("cy", RingY);
            json.WriteNumber("inner", RingInner);
            json.WriteNumber("outer", RingOuter);
            json.WriteEndObject();
            json.WriteStartArray("drives");
            foreach (var d in drives)
            {
                json.WriteStartObject();
                json.WriteString("name", d.Name);
                if (d.Period is { } period) json.WriteNumber("period", period);
                else json.WriteNull("period");
                json.WriteStartArray("frames");
                foreach (var f in d.Frames)
                {
                    json.WriteStartObject();
                    json.WriteNumber("t", Round(f.Time));
                    Array(json, "currents", f.Currents);
                    Array(json, "levels", f.Levels);
                    Array(json, "fundamental", [f.Fundamental.Real, f.Fundamental.Imaginary]);
                    json.WriteEndObject();
                }
                json.WriteEndArray();
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return new Frames(System.Text.Encoding.UTF8.GetString(stream.ToArray()), Draw(design, drives[0].Frames[0], yMax));
    }

    private sealed record Frame(double Time, double[] Currents, double[] Levels, Complex Fundamental);

    private sealed record DriveFrames(string Name, double? Period, List<Frame> Frames, double Peak);

    private static DriveFrames Sample(Excitation x, int polePairs)
    {
        var frames = new List<Frame>(FramesPerPeriod);
        for (int i = 0; i < FramesPerPeriod; i++)
        {
            double t = x.PeriodSeconds is { } period ? period * i / FramesPerPeriod : 0;
            frames.Add(new Frame(t, x.CurrentsAt(t), x.MmfLevels(t), x.Harmonic(t, polePairs)));
        }
        double peak = frames.Max(f => Math.Max(f.Levels.Select(Math.Abs).DefaultIfEmpty(0).Max(), f.Fundamental.Magnitude));
        return new DriveFrames(x.IsSynthetic ? "balanced 1 A (no drive in the file)" : x.Drive.Name, x.PeriodSeconds, frames, peak);
    }

    /// <summary>The static drawing with the first frame; the script updates the elements with ids.</summary>
    private static Scene Draw(WindingDesign design, Frame first, double yMax)
    {
        int q = design.Slots, p = design.PolePairs;
        var s = new Scene(900, 420, $"Rotating field of {design.Name}");
        // Ring: one wedge per slot interval, coloured by F; the working wave's crests as spokes.
        s.Add(new CircleShape(new Point(RingX, RingY), RingOuter + 6, new Stroke(Palette.IronEdge, 1), Palette.Iron));
        for (int i = 0; i < q; i++)
        {
            double from = Analysis.SlotFourier.SlotAngle(i, q), to = Analysis.SlotFourier.SlotAngle(i + 1, q);
            var wedge = new List<Point>();
            for (int k = 0; k <= 6; k++) wedge.Add(Ring(RingOuter, from + (to - from) * k / 6));
            for (int k = 6; k >= 0; k--) wedge.Add(Ring(RingInner, from + (to - from) * k / 6));
            s.Add(new PathShape(wedge, true, new Stroke(Palette.Paper, 0.4), Palette.Diverging(first.Levels[i] / yMax)) { Id = $"ws-wedge-{i}" });
        }
        s.Add(new CircleShape(new Point(RingX, RingY), RingInner - 4, new Stroke(Palette.IronEdge, 1), Palette.Iron));
        s.Add(new PathShape(CrestSpokes(first.Fundamental, p), false, new Stroke(Palette.Fundamental, 3)) { Id = "ws-crest" });
        s.Text(RingX, RingY + RingOuter + 34, "F(θ) around the gap; spokes: crests of the working wave", 11, Palette.Muted, Anchor.Middle);
        s.Text(RingX, RingY + RingOuter + 50, design.Geometry.RotorOutside ? "rotor outside (ring's outer edge), stator inside" : "stator outside (ring's outer edge), rotor inside", 10, Palette.Muted, Anchor.Middle);
        // Key of the field colour scale (its own purple–green scale, not phase colours).
        double kx = RingX - 120, ky = 22;
        for (int k = 0; k < 40; k++) s.Rect(kx + k * 6, ky, 6.5, 10, Palette.Diverging(-1 + 2 * k / 39.0));
        s.Text(kx, ky + 22, $"−{Ticks.Format(yMax)} A", 10, Palette.Muted, Anchor.Middle);
        s.Text(kx + 240, ky + 22, $"+{Ticks.Format(yMax)} A", 10, Palette.Muted, Anchor.Middle);
        s.Text(kx + 120, ky + 22, "ring colour: MMF F", 10, Palette.Muted, Anchor.Middle);

        // Developed F(θ) and its fundamental.
        var area = new ChartArea(ChartLeft, ChartTop, ChartWidth, ChartHeight, 0, 360, -yMax, yMax);
        area.DrawAxes(s, "mechanical angle (degrees, counter-clockwise)", "MMF (A)", Staircases.DegreeTicks, null, ChartArea.Degrees);
        s.Add(new PathShape(Staircases.Points(area, first.Levels), false, new Stroke(Palette.Staircase, 1.8)) { Id = "ws-stair" });
        var fundamental = Staircases.Sample(theta => (first.Fundamental * Complex.FromPolarCoordinates(1, p * theta)).Real);
        s.Add(new PathShape([.. fundamental.Select(pt => area.At(pt.X, pt.Y))], false, new Stroke(Palette.Fundamental, 2, [7, 4])) { Id = "ws-fund" });
        area.DrawLegend(s, [("F(θ, t)", Palette.Staircase, false, null), ($"working wave (order {p})", Palette.Fundamental, false, [7, 4])]);
        return s;
    }

    /// <summary>Spokes across the ring at each crest of F_p(θ) = |C|cos(pθ + arg C): θ = (2πk − arg C)/p.</summary>
    private static List<Point> CrestSpokes(Complex c, int p)
    {
        var points = new List<Point>();
        if (c.Magnitude < 1e-12 || p == 0) return points;
        for (int k = 0; k < p; k++)
        {
            double theta = (2 * Math.PI * k - c.Phase) / p;
            points.Add(Ring(RingInner - 4, theta));
            points.Add(Ring(RingOuter + 6, theta));
            points.Add(PathShape.Break);
        }
        return points;
    }

    private static Point Ring(double r, double theta) => new(RingX + r * Math.Cos(theta), RingY - r * Math.Sin(theta));

    private static void Array(Utf8JsonWriter json, string name, IEnumerable<double> values)
    {
        json.WriteStartArray(name);
        foreach (var v in values) json.WriteNumberValue(Round(v));
        json.WriteEndArray();
    }

    /// <summary>Six significant digits keep the page small and the picture exact to the pixel.</summary>
    private static double Round(double v) => v == 0 || !double.IsFinite(v) ? 0 : double.Parse(v.ToString("G6", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);
}
