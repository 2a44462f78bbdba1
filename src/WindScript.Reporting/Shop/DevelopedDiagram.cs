using System.Globalization;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Shop;

/// <summary>
/// The developed winding diagram a winder follows: the stator cut open and laid flat, seen from
/// the bore, with the connection end at the top. Every slot is a box with its number; every coil
/// is drawn as its two sides (top layer on the left half of the slot, bottom layer on the right),
/// its back end (the V below) and its front end, broken where its start (dot) and finish leave;
/// links join the coils of a group; jumpers join groups of a path and leads run to the terminals,
/// in lanes above. Colour tells the phase; line style (and shade) tells the parallel path.
/// Every coil, link, jumper, lead and terminal carries data attributes (data-coil, data-link,
/// data-jumper, data-lead, data-terminal) so the page can be checked against the model.
/// </summary>
public static class DevelopedDiagram
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Dash patterns by path (1-based): solid, dashed, dotted, dash-dot, then again.</summary>
    private static readonly double[]?[] PathDashes = [null, [7, 4], [2, 3], [10, 3, 2, 3]];

    public static double[]? PathDash(int path) => PathDashes[(Math.Max(1, path) - 1) % PathDashes.Length];

    /// <summary>The colour of a path: its phase's, darker for even paths (the dash tells them apart too).</summary>
    public static string PathColor(int phase, int path) => path % 2 == 0 ? Palette.Shade(Palette.Phase(phase), 0.35) : Palette.Phase(phase);

    private sealed record Ends(Point Start, Point Finish);

    public static Scene Draw(ShopSheet s)
    {
        int q = s.Slots;
        double w = Math.Clamp(1400.0 / q, 26, 64), left = 64;
        double stripRight = left + q * w;
        double width = stripRight + 48;

        int widest = s.Coils.Select(c => Math.Abs(c.Span)).DefaultIfEmpty(1).Max();
        var connectors = Connectors(s, widest, w, left);
        int lanes = Lanes(connectors);
        const double laneStep = 9;
        double titleY = 22, jointY = 44, terminalTop = 54, terminalHeight = 18;
        double laneTop = terminalTop + terminalHeight + 16;
        double frontTop = laneTop + Math.Max(1, lanes) * laneStep + 14;
        double frontHeight = EndHeight(widest, widest, w);
        double sideTop = frontTop + frontHeight, sideBottom = sideTop + 170;
        double backBottom = sideBottom + EndHeight(widest, widest, w);
        double groupRowY = backBottom + 18, rotationY = groupRowY + 30, legendY = rotationY + 40;
        string title = $"Developed winding diagram: {s.Machine}, winding {s.Winding} ({q} slots, {s.Poles} poles, {s.Layers} layer{(s.Layers == 1 ? "" : "s")}); seen from the bore, connection end at the top";
        // Wide enough for the longest line of text (bold runs about 15 % wider), and never so narrow that a few slots blow up the text when printed.
        var scene = new Scene(Math.Max(Math.Max(width, 1120), left + 1.15 * Scene.TextWidth(title, 14) + 20), legendY + 62, $"Developed winding diagram of {s.Machine}");
        scene.Text(left, titleY, title, 14, bold: true);

        // Slots: a box each, numbered in a gap across the middle that the coil sides leave open.
        double numberY = (sideTop + sideBottom) / 2, gap = 9;
        double numberSize = Math.Min(11, w * 0.42);
        for (int slot = 1; slot <= q; slot++)
        {
            double cx = SlotCentre(slot, w, left);
            scene.Rect(cx - 0.44 * w, sideTop, 0.88 * w, sideBottom - sideTop, "#f4f2ee", new Stroke("#c9c3b8", 0.8));
            scene.Add(new TextShape(new Point(cx, numberY + numberSize * 0.35), slot.ToString(Inv), numberSize, Palette.Ink, Anchor.Middle, Bold: true) { Data = [("slot", slot.ToString(Inv))] });
        }

        var ends = new Dictionary<int, Ends>();
        foreach (var coil in s.Coils)
        {
            var group = coil.Group > 0 ? s.Groups[coil.Group - 1] : null;
            int path = group?.Path ?? 1;
            var (points, coilEnds) = CoilLine(s, coil, widest, w, left, sideTop, sideBottom, numberY, gap);
            ends[coil.Number] = coilEnds;
            var stroke = new Stroke(PathColor(coil.Phase, path), 1.3, PathDash(path));
            scene.Add(new PathShape(RingStrip.Joined(RingStrip.Wrap(points, left, stripRight)), false, stroke)
            {
                Data = [("coil", I(coil.Number)), ("phase", s.Phases[coil.Phase]), ("group", I(coil.Group)), ("path", I(path))],
            });
            scene.Add(new CircleShape(coilEnds.Start, 2.2, null, PathColor(coil.Phase, path)));
        }

        // Links: the finish of each coil of a group straight to the start of the next.
        foreach (var group in s.Groups)
            for (int k = 0; k + 1 < group.Coils.Count; k++)
            {
                var from = ends[group.Coils[k]].Finish;
                var to = Nearest(ends[group.Coils[k + 1]].Start, from.X, stripRight - left);
                var line = new List<Point> { from, to };
                scene.Add(new PathShape(RingStrip.Joined(RingStrip.Wrap(line, left, stripRight)), false, new Stroke(PathColor(group.Phase, group.Path), 1.3, PathDash(group.Path)))
                {
                    Data = [("link", $"{group.Coils[k]}-{group.Coils[k + 1]}"), ("group", I(group.Number))],
                });
            }

        // Terminals (boxes at the top) and the points that join them.
        var marks = s.Leads.Select(l => l.Mark).Distinct().ToList();
        var terminalX = new Dictionary<string, double>();
        for (int i = 0; i < marks.Count; i++)
        {
            double x = left + (i + 0.5) * (stripRight - left) / marks.Count;
            terminalX[marks[i]] = x;
            var lead = s.Leads.First(l => l.Mark == marks[i]);
            string color = Palette.Phase(lead.Phase);
            scene.Add(new PathShape([new(x - 20, terminalTop), new(x + 20, terminalTop), new(x + 20, terminalTop + terminalHeight), new(x - 20, terminalTop + terminalHeight)], true,
                new Stroke(color, 1.6), Palette.Paper) { Data = [("terminal", marks[i])] });
            scene.Label(x, terminalTop + terminalHeight / 2, marks[i], 12, Palette.Ink, bold: true);
        }
        foreach (var joint in s.Joints)
        {
            var xs = joint.Marks.Where(terminalX.ContainsKey).Select(m => terminalX[m]).Order().ToList();
            if (xs.Count == 0) continue;
            var bar = new List<Point> { new(xs[0], terminalTop), new(xs[0], jointY) };
            bar.Add(new Point(xs[^1], jointY));
            foreach (double x in xs.Skip(1)) { bar.Add(PathShape.Break); bar.Add(new(x, jointY)); bar.Add(new(x, terminalTop)); }
            scene.Add(new PathShape(bar, false, new Stroke(Palette.Ink, 2)) { Data = [("joint", joint.Name)] });
            scene.Text(xs[^1] + 26, jointY + 4, joint.Kind == JointKind.Star ? $"star point {joint.Name}" : $"delta corner {joint.Name}", 11);
        }

        // Jumpers and leads, each in its own lane.
        foreach (var c in connectors)
        {
            double laneY = frontTop - 14 - c.Lane * laneStep;
            var from = EndPoint(s, ends, c.FromGroup, c.FromEnd);
            var line = new List<Point> { from, new(from.X, laneY) };
            if (c.Mark is { } mark)
            {
                double tx = terminalX[mark];
                line.Add(new(tx, laneY));
                line.Add(new(tx, terminalTop + terminalHeight));
            }
            else
            {
                var to = EndPoint(s, ends, c.ToGroup, c.ToEnd);
                line.Add(new(to.X, laneY));
                line.Add(to);
            }
            var stroke = new Stroke(PathColor(c.Phase, c.Path), 2, PathDash(c.Path));
            scene.Add(new PathShape(line, false, stroke) { Data = c.Data });
            // The mark beside the lead where it leaves the group, read upwards along it.
            if (c.Mark is { } label) scene.Text(from.X - 3, from.Y - 5, label, 9.5, PathColor(c.Phase, c.Path), bold: true, rotate: -90);
        }

        // Group names under the back ends.
        foreach (var g in s.Groups)
        {
            var first = s.Coils[g.Coils[0] - 1];
            var last = s.Coils[g.Coils[^1] - 1];
            double x0 = SlotCentre(first.StartSlot, w, left), x1 = x0 + (last.StartSlot - first.StartSlot + q) % q * w;
            double x = Wrapped((x0 + x1) / 2, left, stripRight);
            string name = $"{s.Phases[g.Phase]} g{g.IndexInPhase}{(g.Polarity < 0 ? " rev." : "")}";
            double size = Math.Min(10, 10 * (g.Coils.Count * w - 4) / Math.Max(1, Scene.TextWidth(name, 10)));
            scene.Text(x, groupRowY, size >= 6.5 ? name : $"{g.IndexInPhase}", Math.Max(size, 6.5), Palette.Phase(g.Phase), Anchor.Middle);
        }

        Rotation(scene, s, left, rotationY);
        Legend(scene, s, left, legendY);
        return scene;
    }

    /// <summary>
    /// Height of a coil's end (front or back) for a span of so many slot pitches, in proportion to
    /// the widest coil's (at most 130 px): wider coils rise higher, so nested (concentric) coils stay apart.
    /// </summary>
    private static double EndHeight(int span, int widest, double w)
    {
        // A rise of 0.8 per half span (about 39 degrees) keeps the crossing legs of neighbouring lap coils well apart.
        double tallest = Math.Clamp(0.4 * (widest + 0.4) * w, 12, 130);
        return Math.Max(10, tallest * (Math.Abs(span) + 0.4) / (Math.Max(1, widest) + 0.4));
    }

    private static double SlotCentre(int slot, double w, double left) => left + (slot - 0.5) * w;

    /// <summary>Where a coil side lies across its slot: top layer left of centre, bottom layer right, a single layer in the middle.</summary>
    private static double SideX(ShopSheet s, double slotPosition, int layer, double w, double left) =>
        left + (slotPosition - 0.5) * w + (s.Layers == 1 ? 0 : layer == 0 ? -0.2 * w : 0.2 * w);

    private static (List<Point> Points, Ends Ends) CoilLine(ShopSheet s, ShopCoil c, int widest, double w, double left, double sideTop, double sideBottom, double numberY, double gap)
    {
        double xs = SideX(s, c.StartSlot, c.StartLayer, w, left);
        double xf = SideX(s, c.StartSlot + c.Span, c.FinishLayer, w, left);
        double xm = (xs + xf) / 2, rise = EndHeight(c.Span, widest, w);
        var (start, finish) = FrontEnds(s, c, widest, w, left, sideTop);
        var points = new List<Point>
        {
            start, new(xs, sideTop), new(xs, numberY - gap), PathShape.Break, new(xs, numberY + gap), new(xs, sideBottom),
            new(xm, sideBottom + rise),
            new(xf, sideBottom), new(xf, numberY + gap), PathShape.Break, new(xf, numberY - gap), new(xf, sideTop), finish,
        };
        // Wrap piecewise: the pen lifts are kept, each continuous piece wrapped on its own.
        var pieces = Split(points);
        var wrapped = pieces.SelectMany(p => RingStrip.Wrap(p, left, left + s.Slots * w)).ToList();
        double ring = s.Slots * w;
        return (RingStrip.Joined(wrapped), new Ends(new(Wrapped(start.X, left, left + ring), start.Y), new(Wrapped(finish.X, left, left + ring), finish.Y)));
    }

    /// <summary>
    /// Where a coil's start and finish leave its front end (unwrapped): the front end is two
    /// diagonals rising from the sides towards the apex over the middle, stopped short of it.
    /// </summary>
    private static (Point Start, Point Finish) FrontEnds(ShopSheet s, ShopCoil c, int widest, double w, double left, double sideTop)
    {
        double xs = SideX(s, c.StartSlot, c.StartLayer, w, left);
        double xf = SideX(s, c.StartSlot + c.Span, c.FinishLayer, w, left);
        double half = Math.Abs(xf - xs) / 2, rise = EndHeight(c.Span, widest, w), dir = xf >= xs ? 1 : -1;
        // Narrower coils leave their ends further from the apex, so the ends of nested coils do not meet.
        double cut = Math.Min((0.22 + 0.12 * (widest - Math.Abs(c.Span))) * w, half * 0.6);
        double fraction = half <= 0 ? 0 : 1 - cut / half;
        return (new Point(xs + dir * half * fraction, sideTop - rise * fraction), new Point(xf - dir * half * fraction, sideTop - rise * fraction));
    }

    private static List<List<Point>> Split(List<Point> points)
    {
        var pieces = new List<List<Point>> { new() };
        foreach (var p in points)
            if (double.IsNaN(p.X)) pieces.Add([]);
            else pieces[^1].Add(p);
        return pieces;
    }

    private static double Wrapped(double x, double left, double right)
    {
        double width = right - left;
        while (x < left) x += width;
        while (x > right) x -= width;
        return x;
    }

    /// <summary>The copy of a point (shifted by whole strip widths) nearest to x: a link goes the short way round.</summary>
    private static Point Nearest(Point p, double x, double ring)
    {
        double best = p.X;
        foreach (double candidate in new[] { p.X - ring, p.X + ring })
            if (Math.Abs(candidate - x) < Math.Abs(best - x)) best = candidate;
        return new Point(best, p.Y);
    }

    private static Point EndPoint(ShopSheet s, Dictionary<int, Ends> ends, int group, GroupEnd end)
    {
        var g = s.Groups[group - 1];
        return end == GroupEnd.Start ? ends[g.Coils[0]].Start : ends[g.Coils[^1]].Finish;
    }

    private sealed record Connector(int Phase, int Path, int FromGroup, GroupEnd FromEnd, int ToGroup, GroupEnd ToEnd, string? Mark,
        double Low, double High, IReadOnlyList<(string, string)> Data)
    {
        public int Lane { get; set; }
    }

    /// <summary>The jumpers and leads with the horizontal extent each runs along its lane.</summary>
    private static List<Connector> Connectors(ShopSheet s, int widest, double w, double left)
    {
        // Terminal positions as Draw places them: evenly across the strip, in lead order.
        var marks = s.Leads.Select(l => l.Mark).Distinct().ToList();
        double stripWidth = s.Slots * w;
        double GroupEndX(int group, GroupEnd end)
        {
            var g = s.Groups[group - 1];
            var coil = s.Coils[(end == GroupEnd.Start ? g.Coils[0] : g.Coils[^1]) - 1];
            var (start, finish) = FrontEnds(s, coil, widest, w, left, 0);
            return Wrapped(end == GroupEnd.Start ? start.X : finish.X, left, left + stripWidth);
        }
        var list = new List<Connector>();
        foreach (var j in s.Jumpers)
        {
            double a = GroupEndX(j.FromGroup, j.FromEnd), b = GroupEndX(j.ToGroup, j.ToEnd);
            list.Add(new Connector(j.Phase, j.Path, j.FromGroup, j.FromEnd, j.ToGroup, j.ToEnd, null, Math.Min(a, b), Math.Max(a, b),
                [("jumper", I(j.Number)), ("phase", s.Phases[j.Phase]), ("path", I(j.Path))]));
        }
        foreach (var l in s.Leads)
        {
            double a = GroupEndX(l.Group, l.End), b = left + (marks.IndexOf(l.Mark) + 0.5) * stripWidth / marks.Count;
            list.Add(new Connector(l.Phase, l.Path, l.Group, l.End, 0, default, l.Mark, Math.Min(a, b), Math.Max(a, b),
                [("lead", I(l.Number)), ("mark", l.Mark), ("phase", s.Phases[l.Phase]), ("path", I(l.Path))]));
        }
        return list;
    }

    /// <summary>Gives every connector a lane so no two that overlap along the strip share one; short ones nearest the coils. Returns the lane count.</summary>
    private static int Lanes(List<Connector> connectors)
    {
        var taken = new List<List<(double Low, double High)>>();
        foreach (var c in connectors.OrderBy(c => c.High - c.Low))
        {
            int lane = 0;
            while (lane < taken.Count && taken[lane].Any(t => c.Low < t.High + 6 && t.Low < c.High + 6)) lane++;
            if (lane == taken.Count) taken.Add([]);
            taken[lane].Add((c.Low, c.High));
            c.Lane = lane;
        }
        return taken.Count;
    }

    private static void Rotation(Scene scene, ShopSheet s, double left, double y)
    {
        var r = s.Rotation;
        string text, detail = "";
        if (r.SlotDirection == 0) text = "No direction of rotation: the winding makes a pulsating field.";
        else
        {
            var from = new Point(r.SlotDirection > 0 ? left : left + 90, y);
            var to = new Point(r.SlotDirection > 0 ? left + 90 : left, y);
            scene.Add(new PathShape([from, to], false, new Stroke(Palette.Ink, 2.4)) { Data = [("rotation", r.SlotDirection > 0 ? "increasing" : "decreasing")] });
            scene.Arrow(from, to, Palette.Ink, 2.4, 11);
            text = $"Field travels towards {(r.SlotDirection > 0 ? "increasing" : "decreasing")} slot numbers for the supply {r.Supply}";
            detail = r.ShaftDirection ?? "The file does not say from which end the slots are numbered, so the direction at the shaft is not given.";
        }
        scene.Text(left + 104, y, text, 11.5, Palette.Ink, bold: true);
        scene.Text(left + 104, y + 15, detail, 10.5, Palette.Muted);
    }

    private static void Legend(Scene scene, ShopSheet s, double left, double y)
    {
        double x = left;
        for (int k = 0; k < s.Phases.Count; k++)
        {
            scene.Line(x, y, x + 22, y, new Stroke(Palette.Phase(k), 2.5));
            scene.Text(x + 27, y + 4, $"phase {s.Phases[k]}", 11);
            x += 40 + Scene.TextWidth($"phase {s.Phases[k]}", 11);
        }
        int paths = s.Paths.Select(p => p.Number).DefaultIfEmpty(1).Max();
        for (int p = 1; p <= paths; p++)
        {
            scene.Line(x, y, x + 30, y, new Stroke(p % 2 == 0 ? Palette.Muted : Palette.Ink, 2, PathDash(p)));
            scene.Text(x + 35, y + 4, $"path {p}", 11);
            x += 50 + Scene.TextWidth($"path {p}", 11);
        }
        scene.Text(left, y + 22, "Thin lines: coils and the links between coils of a group (dot = a coil's start); thick lines: jumpers between groups and leads to the terminals.", 10.5, Palette.Muted);
        scene.Text(left, y + 38, "Colour tells the phase; line style and shade tell the parallel path." +
            (s.Layers == 2 ? " In each slot the top layer is on the left, the bottom layer on the right." : ""), 10.5, Palette.Muted);
    }

    private static string I(int x) => x.ToString(Inv);
}
