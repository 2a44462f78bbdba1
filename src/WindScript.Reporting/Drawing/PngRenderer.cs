using SkiaSharp;

namespace WindScript.Reporting.Drawing;

/// <summary>Rasterises a <see cref="Scene"/> to PNG with Skia, at twice the scene's pixel size for sharp text.</summary>
public static class PngRenderer
{
    public const float Scale = 2;

    private static readonly Lazy<SKTypeface> Regular = new(() => Typeface(SKFontStyle.Normal));
    private static readonly Lazy<SKTypeface> Bold = new(() => Typeface(SKFontStyle.Bold));

    public static byte[] Render(Scene scene)
    {
        var info = new SKImageInfo((int)Math.Ceiling(scene.Width * Scale), (int)Math.Ceiling(scene.Height * Scale));
        using var surface = SKSurface.Create(info);
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        canvas.Scale(Scale);
        foreach (var shape in scene.Shapes) Draw(canvas, shape);
        using var image = surface.Snapshot();
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return data.ToArray();
    }

    private static void Draw(SKCanvas canvas, Shape shape)
    {
        switch (shape)
        {
            case PathShape p when p.Points.Count > 0:
                using (var path = new SKPath())
                {
                    bool move = true;
                    foreach (var point in p.Points)
                    {
                        if (double.IsNaN(point.X)) { move = true; continue; }
                        if (move) path.MoveTo((float)point.X, (float)point.Y);
                        else path.LineTo((float)point.X, (float)point.Y);
                        move = false;
                    }
                    if (p.Closed) path.Close();
                    if (p.Fill is { } fill) canvas.DrawPath(path, FillPaint(fill, p.Opacity));
                    if (p.Stroke is { } stroke) canvas.DrawPath(path, StrokePaint(stroke));
                }
                break;
            case CircleShape c:
                if (c.Fill is { } circleFill) canvas.DrawCircle((float)c.Centre.X, (float)c.Centre.Y, (float)c.Radius, FillPaint(circleFill, 1));
                if (c.Stroke is { } circleStroke) canvas.DrawCircle((float)c.Centre.X, (float)c.Centre.Y, (float)c.Radius, StrokePaint(circleStroke));
                break;
            case TextShape t:
                using (var font = new SKFont(t.Bold ? Bold.Value : Regular.Value, (float)t.Size))
                using (var paint = new SKPaint { Color = SKColor.Parse(t.Color), IsAntialias = true })
                {
                    var align = t.Anchor switch { Anchor.Middle => SKTextAlign.Center, Anchor.End => SKTextAlign.Right, _ => SKTextAlign.Left };
                    canvas.Save();
                    canvas.Translate((float)t.At.X, (float)t.At.Y);
                    if (t.Rotate != 0) canvas.RotateDegrees((float)t.Rotate);
                    canvas.DrawText(t.Text, 0, 0, align, font, paint);
                    canvas.Restore();
                }
                break;
        }
    }

    private static SKPaint FillPaint(string color, double opacity) =>
        new() { Color = SKColor.Parse(color).WithAlpha((byte)Math.Round(255 * Math.Clamp(opacity, 0, 1))), Style = SKPaintStyle.Fill, IsAntialias = true };

    private static SKPaint StrokePaint(Stroke stroke)
    {
        var paint = new SKPaint
        {
            Color = SKColor.Parse(stroke.Color),
            Style = SKPaintStyle.Stroke,
            StrokeWidth = (float)stroke.Width,
            StrokeJoin = SKStrokeJoin.Round,
            IsAntialias = true,
        };
        if (stroke.Dash is { Length: > 0 } dash) paint.PathEffect = SKPathEffect.CreateDash([.. dash.Select(d => (float)d)], 0);
        return paint;
    }

    /// <summary>DejaVu Sans where the machine has it, else the platform default (text may then be missing on a bare machine).</summary>
    private static SKTypeface Typeface(SKFontStyle style) =>
        SKTypeface.FromFamilyName("DejaVu Sans", style) ?? SKTypeface.FromFamilyName(null, style) ?? SKTypeface.Default;
}
