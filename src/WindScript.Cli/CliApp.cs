using System.CommandLine;
using WindScript.Cli.Commands;

namespace WindScript.Cli;

/// <summary>Builds the command tree and runs it with stable exit codes; users never see a stack trace.</summary>
public static class CliApp
{
    public static int Run(string[] args, CliIO io)
    {
        try
        {
            var root = new RootCommand("WindScript: specify, check, evaluate and review stator windings as text.")
            {
                CheckCommand.Create(io),
                EvalCommand.Create(io),
                FmtCommand.Create(io),
                ExplainCommand.Create(io),
                SynthCommand.Create(io),
                SweepCommand.Create(io),
                DiffCommand.Create(io),
                ShowCommand.Create(io),
                PlotCommand.Create(io),
                ReportCommand.Create(io),
            };
            var parse = root.Parse(args);
            if (parse.Errors.Count > 0)
            {
                foreach (var error in parse.Errors) io.Err.WriteLine($"windscript: {error.Message}");
                io.Err.WriteLine("Run 'windscript --help' for usage.");
                return ExitCodes.Usage;
            }
            return parse.Invoke(new InvocationConfiguration { Output = io.Out, Error = io.Err, EnableDefaultExceptionHandler = false });
        }
        catch (Exception e)
        {
            io.Err.WriteLine($"windscript: internal error: {e.GetType().Name}: {e.Message}");
            io.Err.WriteLine("This is a bug in WindScript; please report it with the input that caused it.");
            return ExitCodes.Internal;
        }
    }
}
