using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Diagnostics;

namespace WindScript.Cli.Commands;

/// <summary><c>windscript eval FILE</c>: evaluate a winding and print its figures.</summary>
public static class EvalCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to evaluate");
        var command = new Command("eval", "Evaluate a winding: machine, phases, turns, slot layout") { file };
        command.SetAction(parse => Run(io, parse.GetValue(file)!));
        return command;
    }

    public static int Run(CliIO io, string path)
    {
        if (InputFile.Read(path, io.In, io.Err) is not { } input) return ExitCodes.Usage;
        var compilation = Compilation.Compile(input.Text, input.Path);
        DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
        if (compilation.Design is not { } design)
        {
            io.Err.WriteLine($"{input.DisplayName}: cannot evaluate: the file does not describe a complete machine and winding");
            return ExitCodes.Findings;
        }
        EvalText.WriteSummary(io.Out, design);
        return compilation.Diagnostics.Any(d => d.Severity == Severity.Error) ? ExitCodes.Findings : ExitCodes.Ok;
    }
}
