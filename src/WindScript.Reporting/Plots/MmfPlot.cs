using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>The air-gap MMF staircase F(θ) at an instant over one revolution, with its fundamental (order p).</summary>
public static class MmfPlot
{
    public static Scene Draw(Excitation x, double time)
    {
        var d = x.Design;
        var levels = x.MmfLevels(time);
        var c = x.Harmonic(time, d.PolePairs);
        var fundamental = Staircases.Sample(theta => (c * System.Numerics.Complex.FromPolarCoordinates(1, d.PolePairs * theta)).Real);
        double peak = Math.Max(levels.Select(Math.Abs).DefaultIfEmpty(0).Max(), fundamental.Max(p => Math.Abs(p.Y)));
        var (yMin, yMax) = Ticks.Range(-peak, peak, 0.12, symmetric: true);
        var s = new Scene(820, 380, $"Air-gap MMF of {d.Name}");
        s.Text(20, 24, $"Air-gap MMF over one revolution: {x.Name}, {x.DescribeTime(time)}", 14, bold: true);
        s.Text(20, 42, x.DescribeCurrents(time), 11, Palette.Muted);
        var area = new ChartArea(80, 60, 710, 260, 0, 360, yMin, yMax);
        area.DrawAxes(s, "mechanical angle from the start of slot 1 (degrees)", "MMF (A)", Staircases.DegreeTicks, null, ChartArea.Degrees);
        Staircases.SlotMarks(s, area, d.Slots);
        s.Polyline(Staircases.Points(area, levels), new Stroke(Palette.Staircase, 1.8));
        s.Polyline([.. fundamental.Select(p => area.At(p.X, p.Y))], new Stroke(Palette.Fundamental, 2, [7, 4]));
        area.DrawLegend(s, [("MMF staircase", Palette.Staircase, false, null), ($"fundamental (order {d.PolePairs})", Palette.Fundamental, false, [7, 4])]);
        return s;
    }
}
