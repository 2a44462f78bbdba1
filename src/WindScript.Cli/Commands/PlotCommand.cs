using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Analysis;
using WindScript.Reporting.Drawing;
using WindScript.Reporting.Plots;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript plot FILE --kind mmf|spectrum|layout|star|field [--at TIME] [--drive NAME] -o OUT.svg|png</c>:
/// one picture of a winding, written atomically as SVG or PNG (chosen by the extension).
/// </summary>
public static class PlotCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to plot");
        var kind = new Option<string>("--kind", "-k") { Description = "What to draw: " + string.Join(", ", Plotter.Names), Required = true };
        kind.AcceptOnlyFromAmong([.. Plotter.Names]);
        var at = new Option<string>("--at") { Description = "Instant for mmf and field: seconds, or with a unit (2.5 ms, 90 deg of the drive's period)", DefaultValueFactory = _ => "0" };
        var drive = new Option<string?>("--drive", "-d") { Description = "Drive to use (default: the first; balanced 1 A currents if the file has none)" };
        var output = new Option<string>("--output", "-o") { Description = "Output file, .svg or .png", Required = true };
        var command = new Command("plot", "Draw the MMF, harmonic spectrum, slot layout, star of slots or air-gap field as SVG or PNG") { file, kind, at, drive, output };
        command.SetAction(parse => Run(io, parse.GetValue(file)!, parse.GetValue(kind)!, parse.GetValue(at)!, parse.GetValue(drive), parse.GetValue(output)!));
        return command;
    }

    public static int Run(CliIO io, string path, string kindName, string at, string? driveName, string output)
    {
        string extension = Path.GetExtension(output).ToLowerInvariant();
        if (extension is not (".svg" or ".png"))
        {
            io.Err.WriteLine($"windscript plot: --output must end in .svg or .png, not '{output}'");
            return ExitCodes.Usage;
        }
        var kind = Plotter.Parse(kindName)!.Value;
        var (loaded, exit) = DesignInput.Load(io, path);
        if (loaded is null) return exit;
        var design = loaded.Design;
        if (Excitation.Resolve(design, driveName) is not { } excitation)
        {
            io.Err.WriteLine($"windscript plot: --drive: no drive named '{driveName}' (the file has: {(design.Drives.IsEmpty ? "none" : string.Join(", ", design.Drives.Select(d => d.Name)))})");
            return ExitCodes.Usage;
        }
        if (!TimeValue.TryParse(at, excitation.PeriodSeconds, out double time, out string error))
        {
            io.Err.WriteLine($"windscript plot: --at: {error}");
            return ExitCodes.Usage;
        }
        var gap = MachineAnalysis.Evaluate(design).Gap;
        var scene = Plotter.Draw(kind, excitation, gap, time);
        return OutputWriting.Write(io, "plot --output", output, () =>
        {
            if (extension == ".svg") OutputFile.WriteAllText(output, SvgRenderer.Render(scene), [path]);
            else OutputFile.WriteAllBytes(output, PngRenderer.Render(scene), [path]);
        });
    }
}
