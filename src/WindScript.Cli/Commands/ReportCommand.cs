using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Reporting.Report;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript report FILE -o OUT.html</c>: one self-contained HTML page (no network needed) with
/// the machine summary, the rotating-field animation, every plot, the diagnostics with their
/// explanations and the cautions. Written atomically.
/// </summary>
public static class ReportCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to report on");
        var output = new Option<string>("--output", "-o") { Description = "Output file (.html)", Required = true };
        var command = new Command("report", "Write a self-contained HTML report with plots and an animation of the rotating field") { file, output };
        command.SetAction(parse => Run(io, parse.GetValue(file)!, parse.GetValue(output)!));
        return command;
    }

    public static int Run(CliIO io, string path, string output)
    {
        var (loaded, exit) = DesignInput.Load(io, path);
        if (loaded is null) return exit;
        var html = HtmlReport.Render(loaded.Compilation, loaded.File.DisplayName);
        return OutputWriting.Write(io, "report --output", output, () => OutputFile.WriteAllText(output, html, [path]));
    }
}
