using System.Buffers.Binary;
using System.Numerics;
using System.Xml.Linq;
using WindScript.Model;
using WindScript.Reporting.Plots;
using WindScript.Tests.Support;

namespace WindScript.Tests.Review;

public sealed class PlotTests : IDisposable
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-plot-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    public static TheoryData<string, string> ExamplesAndKinds()
    {
        var data = new TheoryData<string, string>();
        foreach (var file in Repo.ExampleFiles())
            foreach (var kind in Plotter.Names) data.Add(Path.GetFileName(file), kind);
        return data;
    }

    [Theory]
    [MemberData(nameof(ExamplesAndKinds))]
    public void Every_example_plots_every_kind_as_valid_svg_and_png(string example, string kind)
    {
        var input = Path.Combine(Repo.Examples, example);
        var svg = Path.Combine(_dir, kind + ".svg");
        var png = Path.Combine(_dir, kind + ".png");
        var r = CliRunner.Run("plot", input, "--kind", kind, "-o", svg);
        Assert.True(r.Exit == 0, r.Err);
        var doc = XDocument.Load(svg);   // throws on malformed XML
        Assert.Equal(Svg + "svg", doc.Root!.Name);
        Assert.False(string.IsNullOrWhiteSpace(doc.Root.Element(Svg + "title")?.Value));
        Assert.True(doc.Descendants(Svg + "path").Count() > 10);
        Assert.DoesNotContain("NaN", File.ReadAllText(svg));

        r = CliRunner.Run("plot", input, "--kind", kind, "-o", png);
        Assert.True(r.Exit == 0, r.Err);
        var bytes = File.ReadAllBytes(png);
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
        // IHDR: the PNG is the SVG's size at twice the resolution.
        double width = double.Parse(doc.Root.Attribute("width")!.Value, System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal((int)Math.Ceiling(width * 2), BinaryPrimitives.ReadInt32BigEndian(bytes.AsSpan(16, 4)));
        Assert.Empty(Directory.EnumerateFiles(_dir, ".*.tmp"));   // atomic write left no temporary file
    }

    [Fact]
    public void The_layout_plot_labels_every_coil_side_as_the_slot_layout_has_it()
    {
        var path = Path.Combine(Repo.Examples, "mill_fan_lap.wind");
        var design = Wind.Design(File.ReadAllText(path));
        var svg = Path.Combine(_dir, "layout.svg");
        Assert.Equal(0, CliRunner.Run("plot", path, "--kind", "layout", "-o", svg).Exit);
        var labels = XDocument.Load(svg).Descendants(Svg + "text").Select(t => t.Value).ToList();
        var layout = SlotLayout.From(design);
        foreach (var phase in design.Phases)
            foreach (int sign in new[] { 1, -1 })
            {
                int expected = Enumerable.Range(1, design.Slots).Sum(s => Enumerable.Range(0, layout.Layers).Count(l => layout[s, l].Any(c => c.Phase == phase.Index && c.Sign == sign)));
                Assert.Equal(expected, labels.Count(t => t == (sign > 0 ? "+" : "−") + phase.Name));
            }
    }

    [Fact]
    public void The_pictured_working_wave_has_the_rotating_field_amplitude_and_travels_at_omega_over_p()
    {
        // Fitzgerald, Kingsley & Umans, Electric Machinery: F1 = (m/2)(4/π)(k_w1·N_ph/(2p))·I_peak, constant in
        // time for balanced currents, with crests moving at ω/p mechanical rad/s in the sequence direction.
        var design = Wind.Design(File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind")));
        var x = Excitation.Resolve(design, null)!;
        const int m = 3, p = 2;
        double kw1 = 0.92503064888753617;   // k_d·k_p for q = 4, y/τ = 10/12 (Pyrhonen et al., ch. 2)
        double nph = 48, peak = 38 * Math.Sqrt(2), omega = 2 * Math.PI * 50;
        double f1 = m / 2.0 * (4 / Math.PI) * (kw1 * nph / (2 * p)) * peak;
        double period = x.PeriodSeconds!.Value;
        Assert.Equal(0.02, period, 12);
        Complex previous = default;
        for (int i = 0; i < 12; i++)
        {
            double t = period * i / 12;
            var c = x.Harmonic(t, p);
            Assert.Equal(f1, c.Magnitude, 6);
            if (i > 0)
            {
                // F_p = |C| cos(pθ + arg C): the crest θ = −arg C / p advances by ω·Δt / p.
                double advance = -(c / previous).Phase / p;
                Assert.Equal(omega * period / 12 / p, advance, 9);
            }
            previous = c;
        }
    }

    [Fact]
    public void Contour_tracing_follows_the_level_sets_of_a_known_function()
    {
        // ψ = r·cos θ on a polar grid: its level sets are the straight lines x = level.
        const int rows = 40, columns = 120;
        var grid = new double[rows, columns];
        double R(double i) => 0.05 + 0.95 * i / (rows - 1);
        double T(double j) => 2 * Math.PI * j / columns;
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < columns; j++) grid[i, j] = R(i) * Math.Cos(T(j));
        foreach (double level in new[] { -0.6, -0.2, 0.3, 0.7 })
        {
            var lines = Contours.Trace(grid, level);
            Assert.Single(lines);   // one open line across the disc
            foreach (var (row, column) in lines[0])
            {
                double x = R(row) * Math.Cos(T(column));
                Assert.True(Math.Abs(x - level) < 0.02, $"point at x = {x} on the level {level}");
            }
        }
    }

    [Theory]
    [InlineData("0", null, 0)]
    [InlineData("2.5 ms", null, 0.0025)]
    [InlineData("250us", null, 0.00025)]
    [InlineData("1e-3 s", null, 0.001)]
    [InlineData("90 deg", 0.02, 0.005)]
    public void Times_are_read_in_seconds_or_as_an_angle_of_the_period(string text, double? period, double seconds)
    {
        Assert.True(TimeValue.TryParse(text, period, out double value, out string error), error);
        Assert.Equal(seconds, value, 12);
    }

    [Theory]
    [InlineData("soon")]
    [InlineData("3 min")]
    [InlineData("90 deg")]   // no period: a DC drive
    public void Bad_times_are_refused_with_a_reason(string text)
    {
        Assert.False(TimeValue.TryParse(text, null, out _, out string error));
        Assert.NotEmpty(error);
    }

    [Fact]
    public void Usage_errors_exit_2_and_a_file_with_errors_draws_nothing_and_keeps_the_old_output()
    {
        var example = Path.Combine(Repo.Examples, "mill_fan_lap.wind");
        Assert.Equal(2, CliRunner.Run("plot", example, "--kind", "mmf", "-o", Path.Combine(_dir, "x.pdf")).Exit);
        Assert.Equal(2, CliRunner.Run("plot", example, "--kind", "heat", "-o", Path.Combine(_dir, "x.svg")).Exit);
        Assert.Equal(2, CliRunner.Run("plot", example, "--kind", "mmf", "--drive", "nope", "-o", Path.Combine(_dir, "x.svg")).Exit);
        Assert.Equal(2, CliRunner.Run("plot", example, "--kind", "mmf", "--at", "soon", "-o", Path.Combine(_dir, "x.svg")).Exit);
        Assert.False(File.Exists(Path.Combine(_dir, "x.svg")));

        var broken = Path.Combine(_dir, "broken.wind");
        File.WriteAllText(broken, File.ReadAllText(example).Replace("slots 48", "slots 48 mm"));
        var output = Path.Combine(_dir, "keep.svg");
        File.WriteAllText(output, "previous plot");
        var r = CliRunner.Run("plot", broken, "--kind", "mmf", "-o", output);
        Assert.Equal(1, r.Exit);
        Assert.Contains("error", r.Err);
        Assert.Equal("previous plot", File.ReadAllText(output));
    }
}
