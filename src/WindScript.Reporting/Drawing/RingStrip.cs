namespace WindScript.Reporting.Drawing;

/// <summary>
/// A developed strip of a ring (the stator cut open and laid flat between x = left and x = right):
/// a line that runs past one end continues at the other.
/// </summary>
public static class RingStrip
{
    /// <summary>
    /// The pieces of a polyline inside the strip: where it crosses an end it is cut at the edge and
    /// continued from the other edge (shifted by the strip's width). Points may lie up to one strip
    /// width beyond either end.
    /// </summary>
    public static IReadOnlyList<List<Point>> Wrap(IReadOnlyList<Point> points, double left, double right)
    {
        double width = right - left;
        int Band(double x) => x < left ? -1 : x > right ? 1 : 0;
        var pieces = new List<List<Point>>();
        List<Point>? current = null;
        for (int i = 0; i < points.Count; i++)
        {
            var p = points[i];
            int b = Band(p.X);
            if (current is null) { current = [Shift(p, b)]; pieces.Add(current); continue; }
            var previous = points[i - 1];
            int a = Band(previous.X);
            if (a != b)
            {
                // Cut at the edge between the two bands and start the next piece at the matching edge.
                double edge = Math.Max(a, b) > 0 ? right : left;
                double t = (edge - previous.X) / (p.X - previous.X);
                var cut = new Point(edge, previous.Y + t * (p.Y - previous.Y));
                current.Add(Shift(cut, a));
                current = [Shift(cut, b)];
                pieces.Add(current);
            }
            current.Add(Shift(p, b));
        }
        return pieces.Where(piece => piece.Count > 1).ToList();

        Point Shift(Point p, int band) => new(p.X - band * width, p.Y);
    }

    /// <summary>The pieces joined into one point list with pen lifts between them (one SVG path).</summary>
    public static List<Point> Joined(IEnumerable<IReadOnlyList<Point>> pieces)
    {
        var all = new List<Point>();
        foreach (var piece in pieces)
        {
            if (all.Count > 0) all.Add(PathShape.Break);
            all.AddRange(piece);
        }
        return all;
    }
}
