using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Review;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript show FILE</c>: the physical content of a winding file, one fact per line, for
/// git's textconv (<c>git log -p</c>). Exits 0 for any readable file, broken or not (a broken
/// file shows its diagnostics), because git stops on a failing textconv.
/// </summary>
public static class ShowCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to show");
        var command = new Command("show", "Print what a winding file means physically, one fact per line (a textconv for git)") { file };
        command.SetAction(parse => Run(io, parse.GetValue(file)!));
        return command;
    }

    public static int Run(CliIO io, string path)
    {
        if (InputFile.Read(path, io.In, io.Err) is not { } input) return ExitCodes.Usage;
        foreach (var line in PhysicalFacts.Of(ReviewSide.FromText(input.Text, input.Path))) io.Out.WriteLine(line);
        return ExitCodes.Ok;
    }
}
