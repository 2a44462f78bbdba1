using System.Globalization;
using WindScript.Model;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>
/// The slot layout as a developed strip: one row per layer, one cell per slot coloured by phase
/// (solid for a go side "+", light for a return side "−", the name and sign written in), the
/// pole pitches marked, and the coils drawn as end-winding arcs below in their phase colour.
/// </summary>
public static class LayoutPlot
{
    public static Scene Draw(WindingDesign d)
    {
        var layout = SlotLayout.From(d);
        int q = d.Slots, layers = layout.Layers;
        double cell = Math.Clamp(900.0 / q, 6, 40), left = 70, top = 70, rowHeight = 34;
        double width = left + q * cell + 30;
        double stripBottom = top + layers * rowHeight;
        double arcBand = 90;
        var s = new Scene(Math.Max(width, 640), stripBottom + arcBand + 70, $"Slot layout of {d.Name}");
        s.Text(20, 24, $"Slot layout: {d.Name}, winding {d.Winding.Name} ({q} slots, {d.Poles} poles, {layers} layer{(layers == 1 ? "" : "s")})", 14, bold: true);

        // Slot numbers.
        int every = Math.Max(1, (int)Math.Ceiling(20 / cell));
        for (int slot = 1; slot <= q; slot++)
            if ((slot - 1) % every == 0) s.Text(left + (slot - 0.5) * cell, top - 12, slot.ToString(CultureInfo.InvariantCulture), 10, Palette.Muted, Anchor.Middle);

        string[] names = layers == 1 ? ["slot"] : ["top", "bottom"];
        for (int layer = 0; layer < layers; layer++)
        {
            double y = top + layer * rowHeight;
            s.Text(left - 8, y + rowHeight / 2 + 4, layer < names.Length ? names[layer] : $"layer {layer + 1}", 11, Palette.Ink, Anchor.End);
            for (int slot = 1; slot <= q; slot++) Cell(s, layout[slot, layer], d.Phases, left + (slot - 1) * cell, y, cell, rowHeight);
        }

        // Pole pitches: Q/(2p) slots each, numbered.
        double polePitch = (double)q / d.Poles;
        for (int pole = 0; pole <= d.Poles; pole++)
        {
            double x = left + pole * polePitch * cell;
            // Marked above and below the strip only: a pole boundary inside a slot must not cross
            // the cell's sign (a struck-through "−V" reads as "+V").
            s.Line(x, top - 8, x, top - 1, new Stroke(Palette.Ink, 1.6));
            s.Line(x, stripBottom + 1, x, stripBottom + 8, new Stroke(Palette.Ink, 1.6));
            if (pole < d.Poles && polePitch * cell > 34)
                s.Text(x + polePitch * cell / 2, stripBottom + 16, $"pole {pole + 1}", 10, Palette.Muted, Anchor.Middle);
        }

        // End connections: an arc from the go side to the return side of every coil, below the strip.
        double arcTop = stripBottom + 24, stripRight = left + q * cell;
        static int Span(Coil coil, int q)
        {
            int span = coil.PitchSlots(q);
            return span > q / 2.0 ? span - q : span;   // the shorter way round
        }
        // One lane per phase, so the coils of a lap winding do not mesh with the other phases'.
        int m = Math.Max(1, d.Phases.Length);
        double lane = (arcBand - 8) / m;
        int widest = Math.Max(1, d.Winding.Coils.Select(c => Math.Abs(Span(c, q))).DefaultIfEmpty(1).Max());
        double rise = Math.Min((lane - 6) / widest, 0.5 * cell);   // pixels of height per slot of span
        foreach (var phase in d.Phases)
            s.Text(left - 8, arcTop + phase.Index * lane + Math.Min(lane, 12) - 1, phase.Name, 10, Palette.Phase(phase.Index), Anchor.End);
        foreach (var coil in d.Winding.Coils)
        {
            int span = Span(coil, q);
            if (span == 0) continue;
            // Arc height grows with the span, so concentric coils nest visibly.
            double x0 = left + (coil.GoSlot - 0.5) * cell, height = 2 + rise * Math.Abs(span);
            double laneTop = arcTop + Math.Clamp(coil.Phase, 0, m - 1) * lane;
            var color = coil.Phase < d.Phases.Length ? Palette.Phase(coil.Phase) : Palette.Muted;
            var points = Enumerable.Range(0, 25).Select(i =>
            {
                double t = i / 24.0;
                double x = x0 + span * cell * t;
                return new Point(x, laneTop + height * Math.Sin(Math.PI * t));
            }).ToList();
            // A coil that runs past either end of the strip continues at the other end (the strip is a ring).
            foreach (var piece in RingStrip.Wrap(points, left, stripRight))
                s.Polyline(piece, new Stroke(color, 1.2));
        }
        s.Text(left, arcTop + arcBand + 4, "coils (end connections, go side to return side), one lane per phase", 10, Palette.Muted);

        // Legend.
        double lx = left, ly = s.Height - 18;
        foreach (var phase in d.Phases)
        {
            s.Rect(lx, ly - 10, 14, 12, Palette.Phase(phase.Index));
            s.Rect(lx + 16, ly - 10, 14, 12, Palette.ReturnTint(Palette.Phase(phase.Index)), new Stroke(Palette.Phase(phase.Index), 1));
            s.Text(lx + 36, ly, phase.Name, 11);
            lx += 46 + Scene.TextWidth(phase.Name, 11);
        }
        s.Text(lx + 10, ly, "solid: go (+), light: return (−); ticks: pole boundaries", 11, Palette.Muted);
        return s;
    }

    private static void Cell(Scene s, IReadOnlyList<SlotCell> cells, IReadOnlyList<Phase> phases, double x, double y, double w, double h)
    {
        if (cells.Count == 0)
        {
            s.Rect(x, y, w, h, Palette.Paper, new Stroke(Palette.Grid, 1));
            return;
        }
        double part = h / cells.Count;
        for (int i = 0; i < cells.Count; i++)
        {
            var c = cells[i];
            string color = c.Phase < phases.Count ? Palette.Phase(c.Phase) : Palette.Muted;
            string fill = c.Sign > 0 ? color : Palette.ReturnTint(color);
            double cy = y + i * part;
            s.Rect(x, cy, w, part, fill, new Stroke(c.Sign > 0 ? Palette.Paper : color, 1));
            string name = c.Phase < phases.Count ? phases[c.Phase].Name : "?";
            string sign = c.Sign > 0 ? "+" : "−";
            // The sign and the phase name both, shrunk to fit the cell with a clear margin (bold text
            // in the fonts renderers pick runs up to ~30 % wider than the width estimate).
            string text = sign + name;
            double size = Math.Min(Math.Min(11, part * 0.6), 11 * (w - 6) / (1.3 * Scene.TextWidth(text, 11)));
            if (size < 6) { text = sign; size = Math.Min(11, part * 0.6); }
            if (w >= 6) s.Label(x + w / 2, cy + part / 2, text, size, Palette.TextOn(fill), Anchor.Middle, bold: c.Sign > 0);
        }
    }
}
