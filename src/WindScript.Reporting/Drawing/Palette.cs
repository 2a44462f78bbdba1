namespace WindScript.Reporting.Drawing;

/// <summary>
/// Our colours. Phases take hues from the Okabe–Ito set (M. Okabe, K. Ito, "Color Universal
/// Design", 2008), which stays distinguishable under the common colour-vision deficiencies; every
/// phase cell also carries its name and sign, so colour is never the only cue. The sign of a field
/// uses its own diverging purple–white–green scale (the ends of ColorBrewer's PRGn, C. Brewer,
/// colorbrewer2.org), not phase hues, and every picture that uses it draws its key.
/// </summary>
public static class Palette
{
    public const string Ink = "#1b1b1b";
    public const string Muted = "#6b6b6b";
    public const string Grid = "#e3e3e3";
    public const string Paper = "#ffffff";
    public const string Iron = "#d9d4cc";
    public const string IronEdge = "#8c857b";

    /// <summary>Positive and negative ends of the diverging field scale (not phase colours).</summary>
    public const string Positive = "#1b7837";
    public const string Negative = "#762a83";

    /// <summary>Curves: the staircase MMF and its fundamental; forward and backward waves.</summary>
    public const string Staircase = "#1b1b1b";
    public const string Fundamental = "#d55e00";

    /// <summary>The exact 2-D field curve beside the thin-gap staircase.</summary>
    public const string Exact = "#56b4e9";

    /// <summary>
    /// Forward and backward waves belong to no phase, so they are drawn in neutral tones that no
    /// phase uses (dark and light grey), telling them apart by lightness alone.
    /// </summary>
    public const string Forward = "#1b1b1b";
    public const string Backward = "#9a9a9a";

    private static readonly string[] Phases = ["#0072b2", "#d55e00", "#009e73", "#cc79a7", "#e69f00", "#56b4e9", "#7a5c00", "#3d3d3d"];

    /// <summary>The colour of phase k (0-based); cycles after eight phases.</summary>
    public static string Phase(int k) => Phases[((k % Phases.Length) + Phases.Length) % Phases.Length];

    /// <summary>A colour mixed towards white by t (0 = unchanged, 1 = white): the tint marks return (negative) sides.</summary>
    public static string Tint(string color, double t)
    {
        var (r, g, b) = Rgb(color);
        int Mix(int c) => (int)Math.Round(c + (255 - c) * t);
        return $"#{Mix(r):x2}{Mix(g):x2}{Mix(b):x2}";
    }

    /// <summary>A colour mixed towards black by t (0 = unchanged, 1 = black): the shop sheet's even-numbered parallel paths.</summary>
    public static string Shade(string color, double t)
    {
        var (r, g, b) = Rgb(color);
        int Mix(int c) => (int)Math.Round(c * (1 - t));
        return $"#{Mix(r):x2}{Mix(g):x2}{Mix(b):x2}";
    }

    /// <summary>The tint of a return (negative) side: the phase colour halfway to white (kept apart from every other phase's go and return colours under colour-vision deficiencies, see PaletteVisionTests).</summary>
    public static string ReturnTint(string color) => Tint(color, 0.5);

    /// <summary>The diverging field scale at v in [-1, 1]: purple through white to green.</summary>
    public static string Diverging(double v)
    {
        v = Math.Clamp(v, -1, 1);
        return Tint(v >= 0 ? Positive : Negative, 1 - Math.Abs(v));
    }

    public static (int R, int G, int B) Rgb(string color) =>
        (Convert.ToInt32(color.Substring(1, 2), 16), Convert.ToInt32(color.Substring(3, 2), 16), Convert.ToInt32(color.Substring(5, 2), 16));

    /// <summary>Black or white, whichever reads better on the colour.</summary>
    public static string TextOn(string color)
    {
        var (r, g, b) = Rgb(color);
        return 0.299 * r + 0.587 * g + 0.114 * b > 150 ? Ink : Paper;
    }
}
