using System.Globalization;
using System.Numerics;
using WindScript.Model;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>
/// The star of slots (Bianchi and Dai Pre, 2006): the EMF phasor of every slot at its electrical
/// angle p·(2π/Q)·(s − 1) from slot 1, drawn clockwise from the top, coloured by the phase of its
/// top-layer coil side (dashed for a return side, whose EMF the phase takes reversed), with the
/// slot number at the tip. Phasors that coincide (the machine repeats t = gcd(Q, p) times) are
/// drawn slightly shorter one after another. Thick arrows: each phase's resultant EMF.
/// </summary>
public static class StarPlot
{
    public static Scene Draw(WindingDesign d)
    {
        var s = new Scene(640, 640, $"Star of slots of {d.Name}");
        int q = d.Slots, p = d.PolePairs, t = d.Periodicity;
        double alpha = 360.0 * p / q;
        s.Text(20, 24, $"Star of slots: {d.Name} (Q = {q}, p = {p}, slot angle {Ticks.Format(alpha)}° el., t = {t})", 14, bold: true);
        double cx = 320, cy = 340, radius = 220;
        s.Add(new CircleShape(new Point(cx, cy), radius, new Stroke(Palette.Grid, 1)));
        var layout = SlotLayout.From(d);
        // Slots whose phasors coincide (t of them) share one arrow when they also share phase and sign.
        var groups = Enumerable.Range(1, q)
            .GroupBy(slot => (long)Math.Round(Angle(slot, q, p) / (2 * Math.PI) * q * 1000) % (q * 1000L))
            .OrderBy(g => g.Key);
        foreach (var coincident in groups)
        {
            int index = 0;
            foreach (var same in coincident.GroupBy(slot => Style(layout, slot, d)))
            {
                var (color, negative, phaseName) = same.Key;
                double angle = Angle(same.First(), q, p), length = radius * (1 - 0.12 * index++);
                s.Arrow(new Point(cx, cy), Polar(cx, cy, length, angle), color, 1.4, 7, negative ? [5, 3] : null);
                // The label names the phase and sign, so a spoke reads without its colour.
                var label = Polar(cx, cy, length + 22, angle);
                string tag = phaseName.Length == 0 ? "" : $" {(negative ? "−" : "+")}{phaseName}";
                s.Label(label.X, label.Y, string.Join(",", same.Select(n => n.ToString(CultureInfo.InvariantCulture))) + tag, 10, color);
            }
        }

        // Resultant EMF of each phase: Σ over slots of the layer-summed conductors times the slot phasor.
        var sums = new Complex[d.Phases.Length];
        var m = d.Conductors;
        for (int k = 0; k < d.Phases.Length; k++)
            for (int slot = 1; slot <= q; slot++)
                for (int layer = 0; layer < m.Layers; layer++)
                    sums[k] += m[k, slot - 1, layer] * Complex.FromPolarCoordinates(1, Angle(slot, q, p));
        double largest = sums.Select(z => z.Magnitude).DefaultIfEmpty(0).Max();
        if (largest > 0)
            foreach (var phase in d.Phases)
            {
                var z = sums[phase.Index];
                if (z.Magnitude < largest * 1e-9) continue;
                var tip = Polar(cx, cy, radius * 0.55 * z.Magnitude / largest, z.Phase);
                s.Arrow(new Point(cx, cy), tip, Palette.Phase(phase.Index), 4.5, 14);
                var label = Polar(cx, cy, radius * 0.55 * z.Magnitude / largest + 18, z.Phase);
                double w = Scene.TextWidth(phase.Name, 13) + 8;
                s.Rect(label.X - w / 2, label.Y - 10, w, 20, Palette.Paper, new Stroke(Palette.Phase(phase.Index), 1));
                s.Label(label.X, label.Y, phase.Name, 13, Palette.Phase(phase.Index), bold: true);
            }

        s.Text(20, 628, "labels: slots, phase and sign of the top-layer side; dashed: return side (−); thick: phase resultant", 11, Palette.Muted);
        return s;
    }

    /// <summary>Colour and sign of a slot's top-layer side (the bottom layer's for a slot with no top side).</summary>
    private static (string Color, bool Negative, string Phase) Style(SlotLayout layout, int slot, WindingDesign d)
    {
        var cells = layout[slot, 0].Count > 0 ? layout[slot, 0] : layout.Layers > 1 ? layout[slot, 1] : [];
        return cells.Count == 0 ? (Palette.Muted, false, "") : (Palette.Phase(cells[0].Phase), cells[0].Sign < 0, d.Phases[cells[0].Phase].Name);
    }

    /// <summary>Electrical angle of slot s (1-based) from slot 1, in radians.</summary>
    public static double Angle(int slot, int slots, int polePairs) => 2 * Math.PI * polePairs * (slot - 1) / slots % (2 * Math.PI);

    /// <summary>Clockwise from the top.</summary>
    private static Point Polar(double cx, double cy, double r, double angle) => new(cx + r * Math.Sin(angle), cy - r * Math.Cos(angle));
}
