namespace WindScript.Reporting.Plots;

/// <summary>
/// Contour lines of a function sampled on a grid whose second index wraps round (a polar grid:
/// rows are radii, columns angles), by marching squares. Crossings are identified by the grid
/// edge they lie on, so segments join into polylines exactly, without comparing coordinates.
/// </summary>
public static class Contours
{
    /// <summary>Polylines in grid coordinates (row, column as fractions), one list per level.</summary>
    public static List<List<(double Row, double Column)>> Trace(double[,] grid, double level)
    {
        int rows = grid.GetLength(0), columns = grid.GetLength(1);
        var points = new Dictionary<int, (double, double)>();
        var links = new Dictionary<int, List<int>>();

        // Edge ids: the edge from (i, j) to (i, j + 1) is 2·(i·columns + j); from (i, j) to (i + 1, j) is that + 1.
        int? Crossing(int i, int j, bool along)
        {
            int i2 = along ? i : i + 1, j2 = along ? (j + 1) % columns : j;
            double a = grid[i, j] - level, b = grid[i2, j2] - level;
            if ((a < 0) == (b < 0)) return null;
            int id = 2 * (i * columns + j) + (along ? 0 : 1);
            double t = a / (a - b);
            points[id] = along ? (i, j + t) : (i + t, j);
            return id;
        }

        void Link(int a, int b)
        {
            (links.TryGetValue(a, out var la) ? la : links[a] = []).Add(b);
            (links.TryGetValue(b, out var lb) ? lb : links[b] = []).Add(a);
        }

        for (int i = 0; i < rows - 1; i++)
            for (int j = 0; j < columns; j++)
            {
                int? bottom = Crossing(i, j, true), top = Crossing(i + 1, j, true);
                int? left = Crossing(i, j, false), right = Crossing(i, (j + 1) % columns, false);
                var found = new[] { bottom, right, top, left }.Where(c => c is not null).Select(c => c!.Value).ToArray();
                if (found.Length == 2) Link(found[0], found[1]);
                else if (found.Length == 4)
                {
                    // A saddle: join the pairs that keep the centre on its own side.
                    double centre = (grid[i, j] + grid[i, (j + 1) % columns] + grid[i + 1, j] + grid[i + 1, (j + 1) % columns]) / 4 - level;
                    bool cornerHigh = grid[i, j] - level >= 0;
                    if ((centre >= 0) == cornerHigh) { Link(bottom!.Value, right!.Value); Link(top!.Value, left!.Value); }
                    else { Link(bottom!.Value, left!.Value); Link(top!.Value, right!.Value); }
                }
            }

        var lines = new List<List<(double, double)>>();
        var visited = new HashSet<int>();
        // Open lines first (start at an end with one link), then closed loops.
        foreach (var start in links.Keys.OrderBy(k => links[k].Count).ToList())
        {
            if (visited.Contains(start)) continue;
            var line = new List<(double, double)>();
            int? previous = null, current = start;
            while (current is { } c && visited.Add(c))
            {
                line.Add(points[c]);
                int? next = links[c].Where(n => n != previous && !visited.Contains(n)).Select(n => (int?)n).FirstOrDefault();
                if (next is null && line.Count > 2 && links[c].Contains(start)) line.Add(points[start]);   // close the loop
                (previous, current) = (c, next);
            }
            if (line.Count > 1) lines.Add(line);
        }
        return lines;
    }
}
