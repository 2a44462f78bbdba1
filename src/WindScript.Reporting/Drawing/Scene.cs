namespace WindScript.Reporting.Drawing;

/// <summary>A point in pixels (y grows downwards).</summary>
public readonly record struct Point(double X, double Y);

/// <summary>How a line is drawn: colour (#rrggbb), width in pixels and an optional dash pattern.</summary>
public sealed record Stroke(string Color, double Width = 1, double[]? Dash = null);

public enum Anchor { Start, Middle, End }

/// <summary>Something drawn: every plot is a list of these, rendered the same way to SVG and to PNG.</summary>
public abstract record Shape
{
    /// <summary>An id for the SVG element (the report's script updates a few paths by id).</summary>
    public string? Id { get; init; }

    /// <summary>
    /// Data attributes for the SVG element (written as <c>data-NAME="VALUE"</c>), so a test or a
    /// reader of the page can tell what a shape stands for (the shop sheet marks every coil and jumper).
    /// </summary>
    public IReadOnlyList<(string Name, string Value)>? Data { get; init; }
}

/// <summary>
/// An open polyline or a closed polygon, stroked and/or filled. A point with NaN coordinates
/// (<see cref="PathShape.Break"/>) lifts the pen: the next point starts a new piece.
/// </summary>
public sealed record PathShape(IReadOnlyList<Point> Points, bool Closed, Stroke? Stroke, string? Fill = null, double Opacity = 1) : Shape
{
    public static readonly Point Break = new(double.NaN, double.NaN);
}

public sealed record CircleShape(Point Centre, double Radius, Stroke? Stroke, string? Fill = null) : Shape;

/// <summary>Text whose baseline passes through the point; rotated by degrees (clockwise) about it.</summary>
public sealed record TextShape(Point At, string Text, double Size, string Color, Anchor Anchor = Anchor.Start, bool Bold = false, double Rotate = 0) : Shape;

/// <summary>A drawing of fixed size in pixels, with a title (the SVG's accessible name).</summary>
public sealed class Scene(double width, double height, string title)
{
    private readonly List<Shape> _shapes = [];

    public double Width { get; } = width;
    public double Height { get; } = height;
    public string Title { get; } = title;
    public IReadOnlyList<Shape> Shapes => _shapes;

    public T Add<T>(T shape) where T : Shape
    {
        _shapes.Add(shape);
        return shape;
    }

    public void Line(double x1, double y1, double x2, double y2, Stroke stroke) =>
        Add(new PathShape([new Point(x1, y1), new Point(x2, y2)], false, stroke));

    public void Polyline(IReadOnlyList<Point> points, Stroke stroke) => Add(new PathShape(points, false, stroke));

    public void Rect(double x, double y, double width, double height, string? fill, Stroke? stroke = null, double opacity = 1) =>
        Add(new PathShape([new(x, y), new(x + width, y), new(x + width, y + height), new(x, y + height)], true, stroke, fill, opacity));

    public void Text(double x, double y, string text, double size = 12, string color = Palette.Ink, Anchor anchor = Anchor.Start, bool bold = false, double rotate = 0) =>
        Add(new TextShape(new Point(x, y), text, size, color, anchor, bold, rotate));

    /// <summary>Text centred vertically on y (baseline a third of the size below).</summary>
    public void Label(double x, double y, string text, double size = 12, string color = Palette.Ink, Anchor anchor = Anchor.Middle, bool bold = false) =>
        Text(x, y + size * 0.35, text, size, color, anchor, bold);

    /// <summary>A line from one point to another with a filled arrow head at the end.</summary>
    public void Arrow(Point from, Point to, string color, double width = 1.5, double head = 8, double[]? dash = null)
    {
        double dx = to.X - from.X, dy = to.Y - from.Y, length = Math.Sqrt(dx * dx + dy * dy);
        if (length < 1e-9) return;
        double ux = dx / length, uy = dy / length;
        head = Math.Min(head, length * 0.5);
        var root = new Point(to.X - ux * head, to.Y - uy * head);
        Add(new PathShape([from, root], false, new Stroke(color, width, dash)));
        Add(new PathShape([to, new(root.X - uy * head * 0.45, root.Y + ux * head * 0.45), new(root.X + uy * head * 0.45, root.Y - ux * head * 0.45)], true, null, color));
    }

    /// <summary>Approximate width of text (DejaVu Sans averages about 0.58 em per character).</summary>
    public static double TextWidth(string text, double size) => text.Length * size * 0.58;
}
