using System.CommandLine;
using WindScript.Cli.Files;
using WindScript.Cli.Output;
using WindScript.Reporting.Shop;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript shop FILE [--html SHEET.html] [--pdf SHEET.pdf] [--csv DIR] [--paper a4|letter]</c>:
/// the winding shop's documents from one file: a printable, script-free HTML sheet (coil, group,
/// connection, lead and point tables and the developed winding diagram), the same sheet as PDF
/// through a headless Chromium, and the tables as CSV files (DIR/coils.csv, groups.csv, ...).
/// Everything is built before anything is written; each file is written atomically and never over an input.
/// </summary>
public static class ShopCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to make the shop's documents from");
        var html = new Option<string?>("--html", "-o") { Description = "Write the printable sheet as HTML to this file" };
        var pdf = new Option<string?>("--pdf") { Description = "Write the sheet as PDF to this file (printed by a headless Chromium)" };
        var csv = new Option<string?>("--csv") { Description = "Write the tables as CSV files into this existing directory (coils.csv, groups.csv, ...)" };
        var paper = new Option<string>("--paper") { Description = "Paper for print and PDF, landscape: a4 or letter", DefaultValueFactory = _ => "a4" };
        paper.AcceptOnlyFromAmong("a4", "letter");
        var browser = new Option<string?>("--browser") { Description = $"Chromium to print the PDF with (default: ${ChromiumPdf.BrowserVariable}, else chromium on PATH)" };
        var command = new Command("shop", "Write the winding shop's sheet (HTML, PDF) and tables (CSV): coils, groups, connections, leads, developed diagram")
        {
            file, html, pdf, csv, paper, browser,
        };
        command.SetAction(parse => Run(io, parse.GetValue(file)!, parse.GetValue(html), parse.GetValue(pdf), parse.GetValue(csv),
            parse.GetValue(paper) == "letter" ? Paper.Letter : Paper.A4, parse.GetValue(browser)));
        return command;
    }

    public static int Run(CliIO io, string path, string? htmlPath, string? pdfPath, string? csvDirectory, Paper paper, string? browserName)
    {
        if (htmlPath is null && pdfPath is null && csvDirectory is null)
        {
            io.Err.WriteLine("windscript shop: say what to write: --html FILE, --pdf FILE and/or --csv DIR");
            return ExitCodes.Usage;
        }
        if (csvDirectory is not null && !Directory.Exists(csvDirectory))
        {
            io.Err.WriteLine($"windscript shop: --csv: no such directory '{csvDirectory}'");
            return ExitCodes.Usage;
        }
        string? browser = null;
        if (pdfPath is not null && (browser = ChromiumPdf.Find(browserName)) is null)
        {
            io.Err.WriteLine($"windscript shop: --pdf needs a Chromium to print with: install chromium, or name it with --browser or ${ChromiumPdf.BrowserVariable}");
            return ExitCodes.Usage;
        }

        var (loaded, exit) = DesignInput.Load(io, path);
        if (loaded is null) return exit;
        var sheet = ShopSheetBuilder.Build(loaded.Design, loaded.File.DisplayName);
        string page = ShopHtml.Render(sheet, paper);

        // Build every output first: a failed print leaves no half set of files.
        var outputs = new List<(string Option, string Path, byte[] Bytes)>();
        var utf8 = new System.Text.UTF8Encoding(false);
        if (htmlPath is not null) outputs.Add(("--html", htmlPath, utf8.GetBytes(page)));
        if (csvDirectory is not null)
            foreach (var table in ShopTables.All(sheet))
                outputs.Add(("--csv", Path.Combine(csvDirectory, ShopCsv.FileName(table)), utf8.GetBytes(ShopCsv.Write(table))));
        if (pdfPath is not null)
        {
            if (ChromiumPdf.Print(browser!, page, TimeSpan.FromSeconds(120), out string error) is not { } bytes)
            {
                io.Err.WriteLine($"windscript shop: --pdf: {error}; nothing written");
                return ExitCodes.Usage;
            }
            outputs.Add(("--pdf", pdfPath, bytes));
        }
        foreach (var (option, target, bytes) in outputs)
        {
            int written = OutputWriting.Write(io, "shop " + option, target, () => OutputFile.WriteAllBytes(target, bytes, [path]));
            if (written != ExitCodes.Ok) return written;
        }
        return ExitCodes.Ok;
    }
}
