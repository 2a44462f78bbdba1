using System.Globalization;
using System.Text;

namespace WindScript.Reporting.Drawing;

/// <summary>
/// Writes a <see cref="Scene"/> as standalone SVG 1.1: no external fonts, images or ids beyond
/// those the scene names, so several drawings can be inlined in one HTML page.
/// </summary>
public static class SvgRenderer
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The font stack: DejaVu Sans where installed, any sans-serif otherwise.</summary>
    public const string FontFamily = "'DejaVu Sans', Verdana, Arial, sans-serif";

    public static string Render(Scene scene, bool xmlDeclaration = true)
    {
        var o = new StringBuilder();
        if (xmlDeclaration) o.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        o.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{N(scene.Width)}\" height=\"{N(scene.Height)}\" viewBox=\"0 0 {N(scene.Width)} {N(scene.Height)}\" role=\"img\" font-family=\"{FontFamily}\">\n");
        o.Append($"<title>{Escape(scene.Title)}</title>\n");
        o.Append($"<rect width=\"{N(scene.Width)}\" height=\"{N(scene.Height)}\" fill=\"{Palette.Paper}\"/>\n");
        foreach (var shape in scene.Shapes) Write(o, shape);
        o.Append("</svg>\n");
        return o.ToString();
    }

    private static void Write(StringBuilder o, Shape shape)
    {
        string id = (shape.Id is { } value ? $" id=\"{Escape(value)}\"" : "") + DataAttributes(shape);
        switch (shape)
        {
            case PathShape p:
                o.Append($"<path{id} d=\"{PathData(p.Points, p.Closed)}\"");
                o.Append($" fill=\"{p.Fill ?? "none"}\"");
                if (p.Opacity < 1) o.Append($" fill-opacity=\"{N(p.Opacity)}\"");
                StrokeAttributes(o, p.Stroke);
                o.Append("/>\n");
                break;
            case CircleShape c:
                o.Append($"<circle{id} cx=\"{N(c.Centre.X)}\" cy=\"{N(c.Centre.Y)}\" r=\"{N(c.Radius)}\" fill=\"{c.Fill ?? "none"}\"");
                StrokeAttributes(o, c.Stroke);
                o.Append("/>\n");
                break;
            case TextShape t:
                string anchor = t.Anchor switch { Anchor.Middle => "middle", Anchor.End => "end", _ => "start" };
                o.Append($"<text{id} x=\"{N(t.At.X)}\" y=\"{N(t.At.Y)}\" font-size=\"{N(t.Size)}\" fill=\"{t.Color}\" text-anchor=\"{anchor}\"");
                if (t.Bold) o.Append(" font-weight=\"bold\"");
                if (t.Rotate != 0) o.Append($" transform=\"rotate({N(t.Rotate)} {N(t.At.X)} {N(t.At.Y)})\"");
                o.Append($">{Escape(t.Text)}</text>\n");
                break;
        }
    }

    private static string DataAttributes(Shape shape)
    {
        if (shape.Data is not { Count: > 0 } data) return "";
        var o = new StringBuilder();
        foreach (var (name, value) in data) o.Append($" data-{name}=\"{Escape(value)}\"");
        return o.ToString();
    }

    /// <summary>SVG path data for a polyline or polygon.</summary>
    public static string PathData(IReadOnlyList<Point> points, bool closed)
    {
        var d = new StringBuilder();
        bool move = true;
        foreach (var p in points)
        {
            if (double.IsNaN(p.X)) { move = true; continue; }
            d.Append(move ? "M" : "L").Append(N(p.X)).Append(' ').Append(N(p.Y));
            move = false;
        }
        if (closed) d.Append('Z');
        return d.ToString();
    }

    private static void StrokeAttributes(StringBuilder o, Stroke? stroke)
    {
        if (stroke is null) { o.Append(" stroke=\"none\""); return; }
        o.Append($" stroke=\"{stroke.Color}\" stroke-width=\"{N(stroke.Width)}\" stroke-linejoin=\"round\"");
        if (stroke.Dash is { Length: > 0 } dash) o.Append($" stroke-dasharray=\"{string.Join(" ", dash.Select(N))}\"");
    }

    public static string N(double x) => Math.Round(x, 2).ToString("0.##", Inv);

    public static string Escape(string text) =>
        text.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");
}
