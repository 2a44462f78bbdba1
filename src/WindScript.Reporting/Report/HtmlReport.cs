using System.Globalization;
using System.Net;
using System.Text;
using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Reporting.Drawing;
using WindScript.Reporting.Plots;
using WindScript.Review;

namespace WindScript.Reporting.Report;

/// <summary>
/// One self-contained HTML page for a winding: machine summary, the rotating-field animation,
/// every plot as inline SVG, the diagnostics with their explanations, the assumptions and the
/// cautions. Needs no network: the script, styles and frame data are inside the page, and the
/// text uses the reader's own sans-serif font.
/// </summary>
public static class HtmlReport
{
    /// <summary>The section ids, in page order (tests check every one is present).</summary>
    public static readonly IReadOnlyList<(string Id, string Title)> Sections =
    [
        ("summary", "Machine summary"),
        ("rotating-field", "Rotating field"),
        ("layout", "Slot layout"),
        ("star", "Star of slots"),
        ("mmf", "Air-gap MMF"),
        ("spectrum", "Harmonic spectrum"),
        ("field", "Air-gap field"),
        ("diagnostics", "Diagnostics"),
        ("assumptions", "Assumptions and notes"),
        ("cautions", "Cautions"),
    ];

    public static string Render(Compilation compilation, string displayName)
    {
        var design = compilation.Design ?? throw new ArgumentException("The compilation has no design.", nameof(compilation));
        var analysis = MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = ReviewSide.MaxElectricalOrder });
        var side = new ReviewSide(displayName, compilation, analysis);
        var excitation = Excitation.Resolve(design, null)!;
        var animation = RotatingField.Build(design);

        var o = new StringBuilder();
        o.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        o.Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        // Nothing may be fetched: no external scripts, styles, fonts or images.
        o.Append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:\">\n");
        o.Append($"<title>WindScript report: {H(design.Name)}</title>\n<style>\n{Resource("report.css")}</style>\n</head>\n<body>\n<main>\n");
        o.Append($"<header>\n<h1>WindScript report: {H(design.Name)}</h1>\n<p class=\"file\">{H(displayName)} · winding {H(design.Winding.Name)}</p>\n</header>\n");
        o.Append($"<div class=\"caution\" role=\"note\"><strong>Caution.</strong> {H(Cautions.Text)}</div>\n");
        o.Append("<nav><ul>\n");
        foreach (var (id, title) in Sections) o.Append($"<li><a href=\"#{id}\">{H(title)}</a></li>\n");
        o.Append("</ul></nav>\n");

        Section(o, "summary");
        Summary(o, design, side);
        End(o);

        Section(o, "rotating-field");
        o.Append("<p>The air-gap MMF F(θ, t) over one electrical period of the drive's current, with its travelling working wave. ");
        o.Append("The ring is the gap seen from the shaft end (angles counter-clockwise from the start of slot 1); the spokes mark the crests of the working wave.</p>\n");
        o.Append("<div class=\"controls\">\n<button type=\"button\" id=\"ws-play\" aria-pressed=\"false\">Play</button>\n");
        o.Append($"<label for=\"ws-time\">time</label><input type=\"range\" id=\"ws-time\" min=\"0\" max=\"{RotatingField.FramesPerPeriod - 1}\" step=\"1\" value=\"0\">\n");
        o.Append("<label for=\"ws-drive\">drive</label><select id=\"ws-drive\">");
        var driveNames = design.Drives.IsEmpty ? ["balanced 1 A (no drive in the file)"] : design.Drives.Select(d => d.Name).ToArray();
        for (int i = 0; i < driveNames.Length; i++) o.Append($"<option value=\"{i}\">{H(driveNames[i])}</option>");
        o.Append("</select>\n</div>\n<div id=\"ws-readout\" aria-live=\"polite\"></div>\n");
        o.Append("<figure id=\"ws-animation\" data-frame=\"0\" data-drive=\"0\">\n");
        o.Append(SvgRenderer.Render(animation.Scene, xmlDeclaration: false));
        o.Append("</figure>\n");
        o.Append($"<script type=\"application/json\" id=\"ws-frames\">{animation.Json}</script>\n");
        End(o);

        var gap = analysis.Gap;
        Figure(o, "layout", LayoutPlot.Draw(design), "Solid cells are go sides (+), light cells return sides (−); the arcs below are the coils' end connections.");
        Figure(o, "star", StarPlot.Draw(design), "Slot EMF phasors at their electrical angles (Bianchi and Dai Pre, 2006), coloured by the phase of the top-layer coil side; thick arrows are the phase resultants.");
        Figure(o, "mmf", MmfPlot.Draw(excitation, 0), $"F(θ) at t = 0 for {excitation.Name}: the staircase the slot currents make, and its working wave.");
        Figure(o, "spectrum", SpectrumPlot.Draw(excitation), "Winding factors (numeric, from the coil sides) and the MMF waves of the strongest current frequency; forward waves travel towards increasing slot number.");
        Figure(o, "field", FieldPlot.Draw(excitation, gap, 0), "Radial flux density: the thin-gap staircase with Carter's coefficient and the exact 2-D field of the smooth gap at the rotor surface (the gap ring shows the 2-D field at mid-gap, on its own purple–green scale); flux lines for iron of uniform high permeability. The ideal model has no saturation and no rotor reaction." + FieldFigureCaution(analysis, excitation.Drive.Name));

        Section(o, "diagnostics");
        Diagnostics(o, compilation);
        End(o);

        Section(o, "assumptions");
        o.Append("<ul>\n");
        foreach (var a in analysis.Assumptions) o.Append($"<li>{H(a)}</li>\n");
        o.Append("</ul>\n");
        if (!analysis.Notes.IsEmpty)
        {
            o.Append("<h3>Notes on this file</h3>\n<ul>\n");
            foreach (var n in analysis.Notes) o.Append($"<li>{H(n)}</li>\n");
            o.Append("</ul>\n");
        }
        End(o);

        Section(o, "cautions");
        o.Append($"<p>{H(Cautions.Text)}</p>\n");
        End(o);

        o.Append("<footer>Generated by windscript report. Figures follow the assumptions above; named published sources are given with the diagnostics.</footer>\n");
        o.Append("</main>\n<script>\n").Append(Resource("report.js")).Append("</script>\n</body>\n</html>\n");
        return o.ToString();
    }

    private static void Summary(StringBuilder o, WindingDesign d, ReviewSide side)
    {
        var a = side.Analysis!;
        o.Append("<div class=\"tables\">\n");
        Table(o, "Machine", [
            ("machine", d.Name), ("phases", string.Join(" ", d.Phases.Select(p => p.Name))),
            ("slots per pole per phase q", FigureFormat.Number(a.Machine.SlotsPerPolePerPhase)),
            .. FigureTables.Machine(null, d).Where(r => r.New is not null).Select(r => (r.Name, Value(r.New, r.Unit))),
            .. FigureTables.MachineChoices(null, d).Select(r => (r.Name, r.New!)),
        ]);
        var pitches = d.Winding.Coils.Select(c => c.PitchSlots(d.Slots)).Distinct().Order().Select(x => x.ToString(CultureInfo.InvariantCulture));
        Table(o, "Winding", [
            ("winding", d.Winding.Name),
            ("coil pitch", string.Join(", ", pitches) + $" slots (pole pitch {FigureFormat.Number((double)d.Slots / d.Poles)})"),
            ("regular winding", a.Winding.Regular is { } regular ? $"q = {regular.SlotsPerPolePerPhase}, pitch {regular.CoilPitch} (closed-form factors apply)" : "no (factors numeric only)"),
            .. FigureTables.MmfFigures(null, a).Where(r => r.New is not null).Select(r => (r.Name, Value(r.New, r.Unit))),
        ]);
        o.Append("</div>\n");

        o.Append("<h3>Phases</h3>\n<table><tr><th>phase</th><th>coils</th><th>series turns</th><th>axis (deg el.)</th><th>winding factor (order p)</th></tr>\n");
        foreach (var ph in a.Phases)
        {
            double? kw = ph.Harmonics.FirstOrDefault(h => h.Order == d.PolePairs)?.WindingFactor;
            o.Append($"<tr><td>{H(ph.Name)}</td><td class=\"n\">{d.Winding.Coils.Count(c => c.Phase == ph.Index)}</td><td class=\"n\">{FigureFormat.Number(ph.SeriesTurns)}</td>" +
                     $"<td class=\"n\">{FigureFormat.Number(ph.AxisElectricalDegrees)}</td><td class=\"n\">{FigureFormat.Factor(kw ?? 0)}</td></tr>\n");
        }
        o.Append("</table>\n");

        var factors = FigureTables.WindingFactors(ReviewSide.Absent(""), side);
        if (factors.Length > 0)
        {
            o.Append($"<h3>Winding factors (phase {H(factors[0].Phase)})</h3>\n<table><tr><th>order ν</th><th>n = ν/p</th><th>winding factor</th>");
            bool closedForm = a.Winding.Regular is not null;
            if (closedForm) o.Append("<th>distribution k<sub>d</sub></th><th>pitch k<sub>p</sub></th>");
            o.Append("</tr>\n");
            var harmonics = a.Phases[0].Harmonics.ToDictionary(h => h.Order);
            foreach (var r in factors[0].Rows)
            {
                o.Append($"<tr><td class=\"n\">{r.Order}</td><td class=\"n\">{FigureFormat.Number(r.NewElectricalOrder)}</td><td class=\"n\">{FigureFormat.Factor(r.New)}</td>");
                if (closedForm)
                {
                    harmonics.TryGetValue(r.Order, out var h);
                    o.Append($"<td class=\"n\">{FigureFormat.Factor(h?.DistributionFactor)}</td><td class=\"n\">{FigureFormat.Factor(h?.PitchFactor)}</td>");
                }
                o.Append("</tr>\n");
            }
            o.Append("</table>\n");
        }

        var field = FigureTables.FieldAndInductance(null, a).Where(r => r.New is not null).ToList();
        if (field.Count > 0) Table(o, "Air gap, inductances and EMF", [.. field.SelectMany(r => WithCaution(r, a))]);

        if (!d.Drives.IsEmpty)
        {
            o.Append("<h3>Drives</h3>\n<table><tr><th>drive</th><th>current</th><th></th></tr>\n");
            foreach (var drive in d.Drives)
                foreach (var (key, value) in DriveComparison.Describe(drive, d))
                    o.Append($"<tr><td>{H(drive.Name)}</td><td>{H(DriveComparison.Label(key, d))}</td><td>{H(value)}</td></tr>\n");
            o.Append("</table>\n");
        }
    }

    private static void Diagnostics(StringBuilder o, Compilation compilation)
    {
        if (compilation.Diagnostics.Count == 0)
        {
            o.Append("<p>No diagnostics: the checker found nothing to report.</p>\n");
            return;
        }
        o.Append($"<p>{compilation.Diagnostics.Count} finding{(compilation.Diagnostics.Count == 1 ? "" : "s")}, each with the catalogue's explanation.</p>\n");
        foreach (var d in compilation.Diagnostics)
        {
            var at = compilation.Source.GetPosition(d.Span.Start);
            string severity = d.Severity.ToString().ToLowerInvariant();
            o.Append($"<article class=\"diag {severity}\">\n<h3>{severity} {H(d.Code)} at line {at.Line + 1}, column {at.Character + 1}: {H(d.Descriptor.Title)}</h3>\n");
            o.Append($"<p>{H(d.Message)}</p>\n");
            o.Append($"<details><summary>Explanation</summary><p class=\"explanation\">{H(d.Descriptor.Explanation)}</p></details>\n</article>\n");
        }
    }

    private static void Figure(StringBuilder o, string id, Scene scene, string caption)
    {
        Section(o, id);
        o.Append("<figure>\n").Append(SvgRenderer.Render(scene, xmlDeclaration: false));
        o.Append($"<figcaption>{H(caption)}</figcaption>\n</figure>\n");
        End(o);
    }

    private static void Table(StringBuilder o, string title, IReadOnlyList<(string Name, string Value)> rows)
    {
        o.Append($"<div><h3>{H(title)}</h3>\n<table>\n");
        foreach (var (name, value) in rows)
        {
            // A caution sits in the row right below the figure it qualifies.
            string cls = name.StartsWith(CautionRow, StringComparison.Ordinal) ? " class=\"figure-caution\"" : "";
            o.Append($"<tr{cls}><th scope=\"row\">{H(name)}</th><td>{H(value)}</td></tr>\n");
        }
        o.Append("</table></div>\n");
    }

    private const string CautionRow = "caution: ";

    private static string FieldFigureCaution(AnalysisResult a, string driveName) =>
        a.Drives.FirstOrDefault(d => d.Name == driveName) is { } drive && DriveCaution(drive) is { } caution ? $" Caution for drive {driveName}: {caution}." : "";

    /// <summary>A field row of a drive, followed by the caution its peak gap field calls for (above what iron carries), if any.</summary>
    private static IEnumerable<(string Name, string Value)> WithCaution(FigureRow row, AnalysisResult a)
    {
        yield return (row.Name, Value(row.New, row.Unit));
        foreach (var drive in a.Drives)
            if (row.Name == FigureTables.FundamentalFieldRow(drive.Name) && DriveCaution(drive) is { } caution)
                yield return (CautionRow + "drive " + drive.Name, caution);
    }

    private static string? DriveCaution(DriveAnalysis drive) =>
        drive.PeakField is { } peak ? FieldCaution.For(peak) : drive.FundamentalField is { } b1 ? FieldCaution.For(b1) : null;

    private static string Value(double? x, string unit) => FigureFormat.Number(x) + (unit.Length > 0 ? " " + unit : "");

    private static void Section(StringBuilder o, string id) =>
        o.Append($"<section id=\"{id}\">\n<h2>{H(Sections.First(s => s.Id == id).Title)}</h2>\n");

    private static void End(StringBuilder o) => o.Append("</section>\n");

    private static string H(string text) => WebUtility.HtmlEncode(text);

    internal static string Resource(string name)
    {
        using var stream = typeof(HtmlReport).Assembly.GetManifestResourceStream("WindScript.Reporting." + name)
            ?? throw new InvalidOperationException($"Missing embedded resource {name}.");
        using var reader = new StreamReader(stream, Encoding.UTF8);
        return reader.ReadToEnd();
    }
}
