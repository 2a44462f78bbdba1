using System.Text.RegularExpressions;
using WindScript.Reporting.Report;
using WindScript.Tests.LanguageServer;
using WindScript.Tests.Support;

namespace WindScript.Tests.Reporting;

/// <summary>
/// A gap field above what iron carries is flagged beside the figure, in eval, the report and hover.
/// The limit, about 2 T where electrical steel saturates, is common practice. The mill fan's rated
/// drive (38 A rms on an ideal-iron gap, no rotor reaction) gives about 2.03 T; its no-load drive about 0.8 T.
/// </summary>
public class FieldCautionTests
{
    private static string MillFan => File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind"));

    [Fact]
    public void Eval_flags_the_rated_drive_beside_its_peak_field_and_not_the_no_load_drive()
    {
        var r = CliRunner.RunWithInput(MillFan, "eval", "-");
        Assert.Equal(0, r.Exit);
        var rated = Section(r.Out, "drive rated");
        var noLoad = Section(r.Out, "drive no_load");
        Assert.Matches(@"peak field, flux tube[^\n]*\n\s+caution\s+a peak gap field of 2\.0\d T is above what iron carries", rated);
        Assert.DoesNotContain("caution", noLoad);
    }

    [Fact]
    public void The_report_puts_the_caution_in_the_row_below_the_drive_field_and_in_the_field_figure()
    {
        var html = HtmlReport.Render(Compilation.Compile(MillFan, "mill_fan_lap.wind"), "mill_fan_lap.wind");
        Assert.Matches(@"drive rated: fundamental B at t = 0</th><td>[^<]+</td></tr>\n<tr class=""figure-caution""><th scope=""row"">caution: drive rated</th><td>a peak gap field of 2\.0\d T", html);
        Assert.DoesNotContain("caution: drive no_load", html);
        Assert.Matches(@"<figcaption>Radial flux density:[^<]*Caution for drive rated: a peak gap field of 2\.0\d T", html);

        // Half the current stays below the limit everywhere: no caution row, no figure caution.
        var half = MillFan.Replace("balanced sine 38 A rms", "balanced sine 19 A rms");
        Assert.NotEqual(MillFan, half);
        var calm = HtmlReport.Render(Compilation.Compile(half, "half.wind"), "half.wind");
        Assert.DoesNotContain("figure-caution\"", calm);
        Assert.DoesNotContain("Caution for drive", calm);
    }

    [Fact]
    public async Task Hover_on_the_drive_shows_the_caution_under_its_field()
    {
        const string uri = "file:///work/mill_fan_lap.wind";
        await using var client = await LspTestClient.StartAsync();
        client.Open(uri, MillFan);
        await client.DiagnosticsAsync(uri);
        var (line, col) = Samples.Find(MillFan, "drive rated");
        var result = await client.ResultAsync("textDocument/hover", LspTestClient.At(uri, line, col + 7));
        var text = (string)result!["contents"]!["value"]!;
        Assert.Matches(@"peak gap field at t = 0:[^\n]*\n+caution: a peak gap field of 2\.0\d T", text);
    }

    private static string Section(string text, string heading)
    {
        int at = text.IndexOf(heading + " at t", StringComparison.Ordinal);
        Assert.True(at >= 0, $"no '{heading}' in eval output");
        int next = text.IndexOf("\ndrive ", at + heading.Length, StringComparison.Ordinal);
        return next < 0 ? text[at..] : text[at..next];
    }
}
