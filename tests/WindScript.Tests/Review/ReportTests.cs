using System.Net;
using System.Text.Json;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using WindScript.Reporting.Report;
using WindScript.Tests.Support;

namespace WindScript.Tests.Review;

public sealed class ReportTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-report-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    public static TheoryData<string> Examples() => [.. Repo.ExampleFiles().Select(f => Path.GetFileName(f))];

    private string Report(string input)
    {
        var output = Path.Combine(_dir, Path.GetFileNameWithoutExtension(input) + ".html");
        var r = CliRunner.Run("report", input, "-o", output);
        Assert.True(r.Exit == 0, r.Err);
        return File.ReadAllText(output);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_gets_a_self_contained_report_with_every_section(string example)
    {
        var html = Report(Path.Combine(Repo.Examples, example));
        foreach (var (id, title) in HtmlReport.Sections)
        {
            Assert.Contains($"<section id=\"{id}\">", html);
            Assert.Contains($"<h2>{WebUtility.HtmlEncode(title)}</h2>", html);
        }
        // Self-contained: no external scripts, styles, fonts or images (the SVG namespace is a name, not a fetch).
        Assert.DoesNotMatch(@"(src|href)\s*=\s*""(https?:)?//", html);
        Assert.DoesNotContain("@import", html);
        Assert.DoesNotContain("url(", html);
        Assert.Equal(2, Regex.Matches(html, "<script").Count);   // the frame data and the page's own script
        Assert.Contains("IEC 60034 / NEMA MG 1", html);
        Assert.Contains("finite-element analysis", html);

        // Every figure is well-formed SVG: the five plots and the animation.
        var svgs = Regex.Matches(html, "<svg.*?</svg>", RegexOptions.Singleline);
        Assert.Equal(6, svgs.Count);
        foreach (Match svg in svgs) XDocument.Parse(svg.Value);

        // The animation's frames: one electrical period per drive, a staircase level per slot.
        var json = Regex.Match(html, "<script type=\"application/json\" id=\"ws-frames\">(.*?)</script>", RegexOptions.Singleline).Groups[1].Value;
        using var frames = JsonDocument.Parse(json);
        int slots = frames.RootElement.GetProperty("slots").GetInt32();
        foreach (var drive in frames.RootElement.GetProperty("drives").EnumerateArray())
        {
            var list = drive.GetProperty("frames").EnumerateArray().ToList();
            Assert.Equal(RotatingField.FramesPerPeriod, list.Count);
            Assert.All(list, f => Assert.Equal(slots, f.GetProperty("levels").GetArrayLength()));
        }
    }

    [Fact]
    public void The_report_lists_every_diagnostic_with_its_catalogue_explanation()
    {
        var source = File.ReadAllText(Path.Combine(Repo.Examples, "scooter_hub_12s10p.wind"));
        var compilation = Compilation.Compile(source);
        Assert.NotEmpty(compilation.Diagnostics);   // the fractional-slot winding has sub-harmonics (an info)
        var html = Report(Path.Combine(Repo.Examples, "scooter_hub_12s10p.wind"));
        foreach (var d in compilation.Diagnostics)
        {
            Assert.Contains(WebUtility.HtmlEncode(d.Message), html);
            Assert.Contains(WebUtility.HtmlEncode(d.Descriptor.Explanation), html);
        }
    }

    [Fact]
    public void A_file_without_drives_animates_balanced_unit_currents()
    {
        var source = File.ReadAllText(Path.Combine(Repo.Examples, "pump_skid_single_layer.wind"));
        var noDrive = source[..source.IndexOf("drive rated", StringComparison.Ordinal)];
        var input = Path.Combine(_dir, "no_drive.wind");
        File.WriteAllText(input, noDrive);
        var html = Report(input);
        Assert.Contains("balanced 1 A (no drive in the file)", html);
    }

    [Fact]
    public void A_file_with_errors_gets_no_report()
    {
        var input = Path.Combine(_dir, "broken.wind");
        File.WriteAllText(input, "machine m {\n  slots 12\n");
        var output = Path.Combine(_dir, "broken.html");
        Assert.Equal(1, CliRunner.Run("report", input, "-o", output).Exit);
        Assert.False(File.Exists(output));
    }
}
