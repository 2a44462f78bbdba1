using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Review;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript diff OLD NEW [--format text|json]</c>: what changed between two winding files in
/// physical terms. Exit 0 when physically identical, 1 when they differ, 2 on usage errors.
/// Also runs as git's external diff driver: given git's seven arguments (path old-file old-hex
/// old-mode new-file new-hex new-mode; nine for a rename) it prints the same report and exits 0
/// whether or not the files differ, as git requires of a driver.
/// </summary>
public static class DiffCommand
{
    /// <summary>What git passes for the missing side of an added or deleted file.</summary>
    public const string NoFile = "/dev/null";

    public static Command Create(CliIO io)
    {
        var files = new Argument<string[]>("files")
        {
            Description = "OLD NEW ('-' reads standard input, /dev/null stands for no file), or the arguments git passes to an external diff driver",
            Arity = new ArgumentArity(2, 9),
        };
        var format = CommonOptions.Format(OutputFormat.Text, OutputFormat.Text, OutputFormat.Json);
        var command = new Command("diff", "Compare two winding files in physical terms: exit 0 when identical, 1 when they differ") { files, format };
        command.SetAction(parse => Run(io, parse.GetValue(files)!, OutputFormats.Parse(parse.GetValue(format)!)));
        return command;
    }

    public static int Run(CliIO io, string[] args, OutputFormat format)
    {
        string oldPath, newPath, oldLabel, newLabel;
        bool git;
        switch (args.Length)
        {
            case 2:
                (oldPath, newPath, oldLabel, newLabel, git) = (args[0], args[1], Display(args[0]), Display(args[1]), false);
                break;
            case 7 or 9:
                // path old-file old-hex old-mode new-file new-hex new-mode [new-path rename-message]
                string path = args[0], renamed = args.Length == 9 ? args[7] : args[0];
                (oldPath, newPath, oldLabel, newLabel, git) = (args[1], args[4], "a/" + path, "b/" + renamed, true);
                break;
            default:
                io.Err.WriteLine($"windscript diff: expected two files (OLD NEW) or git's 7 external-diff arguments, got {args.Length}");
                return ExitCodes.Usage;
        }
        if (oldPath == "-" && newPath == "-")
        {
            io.Err.WriteLine("windscript diff: standard input can be read only once: give at most one side as '-'");
            return ExitCodes.Usage;
        }
        if (Read(io, oldPath, oldLabel) is not { } old || Read(io, newPath, newLabel) is not { } @new) return ExitCodes.Usage;
        var diff = WindingComparison.Compare(old, @new);
        if (format == OutputFormat.Json) DiffJson.Write(io.Out, diff);
        else DiffText.Write(io.Out, diff);
        if (git) return ExitCodes.Ok;
        return diff.Identical ? ExitCodes.Ok : ExitCodes.Findings;
    }

    private static ReviewSide? Read(CliIO io, string path, string label)
    {
        if (path == NoFile) return ReviewSide.Absent(label);
        if (InputFile.Read(path, io.In, io.Err) is not { } file) return null;
        return ReviewSide.FromText(file.Text, label);
    }

    private static string Display(string path) => path == "-" ? "<stdin>" : path;
}
