using WindScript.Analysis;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>
/// The harmonic spectrum by mechanical order ν (cycles per revolution), with the electrical order
/// n = ν/p marked: the winding factor of every phase above, and below the MMF waves of the drive's
/// strongest frequency, forward (towards increasing slot number) and backward side by side (a DC
/// drive's standing waves in grey).
/// </summary>
public static class SpectrumPlot
{
    public static Scene Draw(Excitation x)
    {
        var d = x.Design;
        int p = Math.Max(1, d.PolePairs);
        int maxOrder = Math.Min(25 * p, Math.Max(13 * p, 2 * d.Slots + p));
        var s = new Scene(820, 610, $"Harmonic spectrum of {d.Name}");
        s.Text(20, 24, $"Harmonic spectrum: winding factors and MMF waves by order ({x.Name})", 14, bold: true);

        // Winding factors of each phase (bars of the first phase in its colour; the others as marks
        // in theirs where they differ): a colour here means the same phase as in the layout.
        var factors = new double[d.Phases.Length, maxOrder];
        for (int k = 0; k < d.Phases.Length; k++)
            for (int order = 1; order <= maxOrder; order++) factors[k, order - 1] = d.WindingFactor(k, order);
        var top = new ChartArea(80, 50, 710, 200, 0.5, maxOrder + 0.5, 0, 1.05);
        top.DrawAxes(s, "electrical order n = ν/p", "winding factor", OrderTicks(maxOrder, p), [0, 0.2, 0.4, 0.6, 0.8, 1.0], Label(p), null);
        double bar = Math.Max(1, top.Width / maxOrder * 0.7);
        for (int order = 1; order <= maxOrder; order++)
        {
            double kw = factors[0, order - 1];
            if (kw > 1e-6) s.Rect(top.X(order) - bar / 2, top.Y(kw), bar, top.Y(0) - top.Y(kw), Palette.Phase(0));
            for (int k = 1; k < d.Phases.Length; k++)
                if (Math.Abs(factors[k, order - 1] - kw) > 1e-6)
                    s.Add(new CircleShape(top.At(order, factors[k, order - 1]), 2.5, new Stroke(Palette.Phase(k), 1.2), Palette.Paper));
        }
        WorkingOrder(s, top, p);
        string others = d.Phases.Length > 1 ? $" (phase {d.Phases[0].Name}; circles: other phases where they differ)" : "";
        s.Text(top.Left, top.Top - 6, $"winding factor{others}", 11, Palette.Muted);

        // MMF waves of the strongest current frequency, relative to the working wave, on a log scale.
        var group = x.Groups.FirstOrDefault();
        var waves = group is null ? [] : Enumerable.Range(1, maxOrder).Select(order => TravellingWaves.Describe(x.Spectrum, group, order)).ToList();
        static double Size(TravellingWave w) => Math.Max(w.Standing, Math.Max(w.Forward, w.Backward));
        double working = waves.Where(w => w.Order == p).Select(Size).FirstOrDefault();
        double reference = working > 0 ? working : waves.Select(Size).DefaultIfEmpty(0).Max();
        if (reference <= 0) reference = 1;
        double top10 = Math.Max(2, Math.Ceiling(Math.Log10(Math.Max(100, waves.Select(w => Size(w) / reference * 100).DefaultIfEmpty(0).Max())) + 0.15));
        var bottom = new ChartArea(80, 320, 710, 220, 0.5, maxOrder + 0.5, Floor, top10);
        double[] decades = [.. Enumerable.Range((int)Floor, (int)top10 - (int)Floor + 1).Select(k => (double)k)];
        bottom.DrawAxes(s, $"electrical order n = ν/p (ν: cycles per revolution, p = {p})", "% of the working wave", OrderTicks(maxOrder, p), decades, Label(p),
            k => Ticks.Format(Math.Pow(10, k)) + "%");
        double half = Math.Max(1, bottom.Width / maxOrder * 0.38);
        void Bar(double left, double value, double w, string color)
        {
            double level = Math.Log10(value / reference * 100);
            if (level > Floor) s.Rect(left, bottom.Y(level), w, bottom.Y(Floor) - bottom.Y(level), color);
        }
        foreach (var w in waves)
        {
            if (group!.IsDirect) { Bar(bottom.X(w.Order) - half, w.Standing, 2 * half, Palette.Muted); continue; }
            Bar(bottom.X(w.Order) - half, w.Forward, half, Palette.Forward);
            Bar(bottom.X(w.Order), w.Backward, half, Palette.Backward);
        }
        WorkingOrder(s, bottom, p);
        string frequency = group is null ? "no current" : group.IsDirect ? "direct current: standing waves" : $"currents at {Ticks.Format(group.FrequencyHz)} Hz";
        s.Text(bottom.Left, bottom.Top - 6, $"MMF waves, {frequency} (log scale)", 11, Palette.Muted);
        if (group is { IsDirect: false })
            bottom.DrawLegend(s, [("forward", Palette.Forward, true, null), ("backward", Palette.Backward, true, null)]);
        else if (group is not null)
            bottom.DrawLegend(s, [("standing", Palette.Muted, true, null)]);
        return s;
    }

    /// <summary>Lowest decade shown: 0.01 % of the working wave.</summary>
    private const double Floor = -2;

    /// <summary>Ticks at multiples of p (the electrical harmonics), thinned to about a dozen.</summary>
    private static double[] OrderTicks(int maxOrder, int p)
    {
        int step = p * Math.Max(1, (int)Math.Ceiling(maxOrder / (double)p / 13));
        return [.. Enumerable.Range(1, maxOrder / step).Select(i => (double)(i * step))];
    }

    private static Func<double, string> Label(int p) => order => Ticks.Format(order / p);

    private static void WorkingOrder(Scene s, ChartArea area, int p)
    {
        s.Line(area.X(p), area.Top, area.X(p), area.Bottom, new Stroke(Palette.Fundamental, 1, [3, 3]));
        s.Text(area.X(p) + 4, area.Top + 12, "working wave", 10, Palette.Fundamental);
    }
}
