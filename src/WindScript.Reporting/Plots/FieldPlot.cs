using System.Numerics;
using WindScript.Analysis;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>
/// The air-gap field at an instant. Left, a cross-section: the gap ring (drawn enlarged) coloured
/// by the radial flux density, the slots coloured by their current, and flux lines — contours of
/// the flux function, radial across the gap and tangential in the iron. Right, the radial flux
/// density around the gap with its fundamental.
/// </summary>
/// <remarks>
/// The flux lines assume iron of high, uniform permeability: a solid rotor and a stator yoke whose
/// outer surface carries no flux. Each space harmonic ν of the gap flux function ψ_ν then
/// continues as (r/r_r)^ν into the rotor and as (x^−ν·X^2ν − x^ν)/(X^2ν − 1), x = r/r_s,
/// X = r_o/r_s, into the yoke (solutions of Laplace's equation that match ψ at the gap and vanish
/// at the outer surface). The chart shows the thin-gap value μ0·F/(k_C·δ) (Carter's coefficient)
/// and, when both radii are known, the exact 2-D field of the smooth annulus at the rotor surface
/// (<see cref="StaircaseGapField"/>); the gap ring is coloured by the 2-D field at mid-gap.
/// </remarks>
public static class FieldPlot
{
    private const double RotorRadius = 0.60, BoreRadius = 0.70, SlotDepth = 0.10, OuterRadius = 1.0;

    public static Scene Draw(Excitation x, GapSummary gap, double time)
    {
        var d = x.Design;
        int q = d.Slots;
        var levels = x.MmfLevels(time);
        double? effectiveGap = gap.EffectiveGap;
        // Radial B (T) per ampere-turn of MMF in the thin-gap model, or MMF itself without a gap.
        double scale = effectiveGap is > 0 ? AirGapField.Mu0 / effectiveGap.Value : 1;
        string quantity = effectiveGap is > 0 ? "radial flux density B (T)" : "MMF (A): no bore and gap given";
        var field = levels.Select(v => v * scale).ToArray();
        var c = x.Harmonic(time, d.PolePairs) * scale;

        var currents = x.CurrentsAt(time);
        var slotCurrent = MachineAnalysis.SlotAmpereConductors(x.Spectrum, currents);
        // The exact 2-D field of the smooth annulus, at the rotor surface and mid-gap.
        StaircaseGapField? exact = gap.BoreRadius is { } rs && gap.RotorRadius is { } rr && rs > 0 && rr > 0 && rs != rr && effectiveGap is > 0
            ? new StaircaseGapField(slotCurrent, rs, rr) : null;
        var atRotor = exact is null ? null : Staircases.Sample(theta => exact.RadialAt(exact.RotorRadius, theta));
        double rMid = exact is null ? 0 : (exact.RotorRadius + exact.StatorRadius) / 2;
        double peak = Math.Max(1e-12, Math.Max(c.Magnitude, field.Select(Math.Abs).DefaultIfEmpty(0).Max()));
        if (atRotor is not null) peak = Math.Max(peak, atRotor.Max(p => Math.Abs(p.Y)));

        var s = new Scene(920, 500, $"Air-gap field of {d.Name}");
        s.Text(20, 24, $"Air-gap field: {x.Name}, {x.DescribeTime(time)}", 14, bold: true);
        s.Text(20, 42, x.DescribeCurrents(time), 11, Palette.Muted);

        double cx = 235, cy = 270, unit = 200;
        Point At(double r, double theta) => new(cx + unit * r * Math.Cos(theta), cy - unit * r * Math.Sin(theta));

        // Stator iron, the gap ring coloured by B (2-D at mid-gap when the radii are known), the rotor.
        s.Add(new CircleShape(new Point(cx, cy), unit * OuterRadius, new Stroke(Palette.IronEdge, 1), Palette.Iron));
        int segments = exact is null ? q : Math.Max(8 * q, 240);
        for (int i = 0; i < segments; i++)
        {
            double from = exact is null ? SlotFourier.SlotAngle(i, q) : 2 * Math.PI * i / segments;
            double to = exact is null ? SlotFourier.SlotAngle(i + 1, q) : 2 * Math.PI * (i + 1) / segments;
            double value = exact is null ? field[i] : exact.RadialAt(rMid, (from + to) / 2);
            var wedge = new List<Point>();
            for (int k = 0; k <= 6; k++) wedge.Add(At(BoreRadius, from + (to - from) * k / 6));
            for (int k = 6; k >= 0; k--) wedge.Add(At(RotorRadius, from + (to - from) * k / 6));
            s.Add(new PathShape(wedge, true, null, Palette.Diverging(value / peak)));
        }
        s.Add(new CircleShape(new Point(cx, cy), unit * RotorRadius, new Stroke(Palette.IronEdge, 1), Palette.Iron));

        // Slots: an opening at the bore, with the slot's current as a symbol: a dot (positive
        // ampere-conductors, towards the viewer) or a cross (negative), sized by magnitude.
        double largestCurrent = Math.Max(1e-12, slotCurrent.Select(Math.Abs).Max());
        double halfWidth = Math.PI / q * 0.55;
        // The slots open onto the gap from the stator: outwards into the outer iron for an inner
        // rotor, inwards into the inner iron when the rotor is outside.
        bool outside = d.Geometry.RotorOutside;
        double surface = outside ? RotorRadius : BoreRadius, depth = outside ? -SlotDepth : SlotDepth;
        for (int i = 0; i < q; i++)
        {
            double theta = SlotFourier.SlotAngle(i, q);
            s.Add(new PathShape([At(surface, theta - halfWidth * 0.6), At(surface + depth, theta - halfWidth),
                At(surface + depth, theta + halfWidth), At(surface, theta + halfWidth * 0.6)], true, new Stroke(Palette.IronEdge, 0.8), Palette.Paper));
            double discRadius = Math.Min(unit * SlotDepth * 0.35, unit * (surface + depth / 2) * halfWidth * 0.8);
            double share = Math.Abs(slotCurrent[i]) / largestCurrent;
            if (share < 1e-9) continue;
            CurrentSymbol(s, At(surface + depth / 2, theta), discRadius * (0.45 + 0.55 * share), slotCurrent[i] > 0);
        }
        s.Text(cx, cy - 4, outside ? "stator (inside)" : "rotor", 11, Palette.Muted, Anchor.Middle);
        s.Text(cx, cy + 12, outside ? "rotor outside" : "stator outside", 10, Palette.Muted, Anchor.Middle);
        int every = Math.Max(1, q / 12);
        for (int i = 0; i < q; i += every)
        {
            var label = At(OuterRadius + 0.06, SlotFourier.SlotAngle(i, q));
            s.Label(label.X, label.Y, (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), 9, Palette.Muted);
        }

        // Flux lines.
        foreach (var line in FluxLines(x, time))
            s.Polyline([.. line.Select(p => At(p.R, p.Theta))], new Stroke(Palette.Ink, 0.8));
        s.Text(cx, s.Height - 8, "gap drawn enlarged; flux lines for iron of uniform high permeability", 10, Palette.Muted, Anchor.Middle);

        // B around the gap.
        var (yMin, yMax) = Ticks.Range(-peak, peak, 0.12, symmetric: true);
        var area = new ChartArea(540, 70, 350, 330, 0, 360, yMin, yMax);
        area.DrawAxes(s, "mechanical angle (degrees, counter-clockwise)", quantity, Staircases.DegreeTicks, null, ChartArea.Degrees);
        Staircases.SlotMarks(s, area, q);
        s.Polyline(Staircases.Points(area, field), new Stroke(Palette.Staircase, 1.6));
        s.Polyline([.. Staircases.Sample(theta => (c * Complex.FromPolarCoordinates(1, d.PolePairs * theta)).Real).Select(p => area.At(p.X, p.Y))],
            new Stroke(Palette.Fundamental, 2, [7, 4]));
        var legend = new List<(string, string, bool, double[]?)> { ("thin gap (Carter)", Palette.Staircase, false, null), ("fundamental", Palette.Fundamental, false, [7, 4]) };
        if (atRotor is not null)
        {
            s.Polyline([.. atRotor.Select(p => area.At(p.X, p.Y))], new Stroke(Palette.Exact, 1.4, [2, 2]));
            legend.Add(("2-D at rotor", Palette.Exact, false, [2, 2]));
        }
        area.DrawLegend(s, legend);

        // Keys: the field scale, and the slot-current symbols.
        double kx = 560, ky = 466;
        for (int k = 0; k < 40; k++) s.Rect(kx + k * 6, ky, 6.5, 12, Palette.Diverging(-1 + 2 * k / 39.0));
        s.Text(kx, ky + 24, $"−{Ticks.Format(peak)}", 10, Palette.Muted, Anchor.Middle);
        s.Text(kx + 240, ky + 24, $"+{Ticks.Format(peak)}", 10, Palette.Muted, Anchor.Middle);
        s.Text(kx + 120, ky - 6, effectiveGap is > 0 ? (exact is null ? "gap colour: radial B (T), thin gap" : "gap colour: radial B (T), 2-D at mid-gap") : "gap colour: MMF (A)", 10, Palette.Muted, Anchor.Middle);
        // Clear of the scale's end label (centred on kx + 240, up to ~25 px each side).
        double sx = kx + 300;
        CurrentSymbol(s, new Point(sx - 24, ky + 6), 6, true);
        s.Text(sx - 14, ky + 10, "+", 10, Palette.Muted);
        CurrentSymbol(s, new Point(sx + 10, ky + 6), 6, false);
        s.Text(sx + 20, ky + 10, "−", 10, Palette.Muted);
        s.Text(sx, ky + 24, "slot current", 10, Palette.Muted, Anchor.Middle);
        return s;
    }

    /// <summary>A conductor seen end-on: a dot for current towards the viewer, a cross for away.</summary>
    private static void CurrentSymbol(Scene s, Point centre, double radius, bool towardsViewer)
    {
        s.Add(new CircleShape(centre, radius, new Stroke(Palette.Ink, 0.9), Palette.Paper));
        if (towardsViewer)
            s.Add(new CircleShape(centre, Math.Max(1, radius * 0.3), null, Palette.Ink));
        else
        {
            double a = radius * 0.7;
            s.Polyline([new Point(centre.X - a, centre.Y - a), new Point(centre.X + a, centre.Y + a)], new Stroke(Palette.Ink, 0.9));
            s.Polyline([new Point(centre.X - a, centre.Y + a), new Point(centre.X + a, centre.Y - a)], new Stroke(Palette.Ink, 0.9));
        }
    }

    /// <summary>Contours of the flux function over the cross-section, as (radius, angle) in drawing units.</summary>
    public static List<List<(double R, double Theta)>> FluxLines(Excitation x, double time, int lines = 18)
    {
        int q = x.Design.Slots, maxOrder = Math.Min(3 * q, 150);
        var coefficients = new Complex[maxOrder + 1];
        for (int order = 1; order <= maxOrder; order++) coefficients[order] = x.Harmonic(time, order) / new Complex(0, order);
        const int columns = 240, rows = 72;
        var radii = Enumerable.Range(0, rows).Select(i => 0.02 + (OuterRadius - 0.02) * i / (rows - 1)).ToArray();
        var grid = new double[rows, columns];
        var cosines = new double[columns];
        var sines = new double[columns];
        for (int order = 1; order <= maxOrder; order++)
        {
            if (coefficients[order].Magnitude == 0) continue;
            for (int j = 0; j < columns; j++) (sines[j], cosines[j]) = Math.SinCos(order * 2 * Math.PI * j / columns);
            for (int i = 0; i < rows; i++)
            {
                var c = coefficients[order] * Radial(order, radii[i]);
                if (c.Magnitude < 1e-14) continue;
                for (int j = 0; j < columns; j++) grid[i, j] += c.Real * cosines[j] - c.Imaginary * sines[j];
            }
        }
        double min = double.MaxValue, max = double.MinValue;
        foreach (double v in grid) { min = Math.Min(min, v); max = Math.Max(max, v); }
        var result = new List<List<(double, double)>>();
        if (!(max > min)) return result;
        for (int k = 0; k < lines; k++)
        {
            double level = min + (max - min) * (k + 0.5) / lines;
            foreach (var line in Contours.Trace(grid, level))
                result.Add([.. line.Select(p => (Interpolate(radii, p.Row), 2 * Math.PI * p.Column / columns))]);
        }
        return result;
    }

    /// <summary>How harmonic ν of the gap flux function continues into the rotor, the gap and the yoke.</summary>
    private static double Radial(int order, double r)
    {
        if (r <= RotorRadius) return Math.Pow(r / RotorRadius, order);
        if (r <= BoreRadius) return 1;
        double x = r / BoreRadius, big = Math.Pow(OuterRadius / BoreRadius, 2 * order);
        return (big * Math.Pow(x, -order) - Math.Pow(x, order)) / (big - 1);
    }

    private static double Interpolate(double[] values, double index)
    {
        int i = Math.Clamp((int)Math.Floor(index), 0, values.Length - 2);
        return values[i] + (values[i + 1] - values[i]) * (index - i);
    }
}
