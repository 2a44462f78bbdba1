using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Formatting;
using WindScript.Syntax;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript fmt FILE... [--check] [--stdout]</c>: rewrite files in canonical form. A file
/// with syntax errors is never touched; files are replaced atomically.
/// </summary>
public static class FmtCommand
{
    public static Command Create(CliIO io)
    {
        var files = CommonOptions.Files("Winding files to format in place");
        var check = new Option<bool>("--check") { Description = "Change nothing; exit 1 if any file is not in canonical form" };
        var toStdout = new Option<bool>("--stdout") { Description = "Print the formatted text instead of rewriting the file" };
        var command = new Command("fmt", "Format winding files in the canonical form (comments kept)") { files, check, toStdout };
        command.SetAction(parse => Run(io, parse.GetValue(files)!, parse.GetValue(check), parse.GetValue(toStdout)));
        return command;
    }

    public static int Run(CliIO io, string[] paths, bool check, bool toStdout)
    {
        int exit = ExitCodes.Ok;
        foreach (var path in paths)
        {
            if (InputFile.Read(path, io.In, io.Err) is not { } file) { exit = ExitCodes.Usage; continue; }
            var tree = SyntaxTree.Parse(file.Text, file.Path);
            var formatted = Formatter.Format(tree);
            if (formatted is null)
            {
                io.Err.WriteLine($"{file.DisplayName}: not formatted: fix the syntax errors first");
                DiagnosticText.Write(io.Err, file.DisplayName, tree.Source, tree.Diagnostics);
                exit = Math.Max(exit, ExitCodes.Findings);
                continue;
            }
            if (check)
            {
                if (formatted != file.Text)
                {
                    io.Out.WriteLine($"{file.DisplayName}: not in canonical form");
                    exit = Math.Max(exit, ExitCodes.Findings);
                }
                continue;
            }
            if (toStdout || file.IsStdin)
            {
                io.Out.Write(formatted);
                continue;
            }
            // The file is its own input: replacing it is the point, so it is not passed as an input to protect.
            if (formatted != file.Text)
                exit = Math.Max(exit, OutputWriting.Write(io, "fmt", file.Path, () => OutputFile.WriteAllText(file.Path, formatted)));
        }
        return exit;
    }
}
