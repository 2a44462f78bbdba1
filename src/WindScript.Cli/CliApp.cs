using System.CommandLine;
using WindScript.Cli.Commands;
using WindScript.Cli.Files;

namespace WindScript.Cli;

/// <summary>
/// Builds the command tree and runs it with stable exit codes; users never see a stack trace.
/// A wrong command line and an I/O fault (unreadable or unwritable path, full disk, closed
/// standard output, too many open files) exit 2 with one line; a reader that has gone away
/// (broken pipe) stops the work quietly with 141, as command-line tools do; exit 3 is for bugs.
/// </summary>
public static class CliApp
{
    public static int Run(string[] args, CliIO io)
    {
        try
        {
            int exit = Dispatch(args, io);
            io.Out.Flush();
            return exit;
        }
        catch (Exception e) when (IoFailure.Find(e) is { } fault)
        {
            if (IoFailure.IsBrokenPipe(fault)) return IoFailure.BrokenPipeExit;
            return Report(io, $"windscript: {IoFailure.Describe(fault)}", ExitCodes.Usage);
        }
        catch (OutputRefusedException e)
        {
            return Report(io, $"windscript: {e.Message}", ExitCodes.Usage);
        }
        catch (Exception e)
        {
            return Report(io, $"windscript: internal error: {e.GetType().Name}: {e.Message}\nThis is a bug in WindScript; please report it with the input that caused it.", ExitCodes.Internal);
        }
    }

    private static int Dispatch(string[] args, CliIO io)
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
            ShopCommand.Create(io),
            LspCommand.Create(io),
        };
        var parse = root.Parse(args);
        string command = parse.CommandResult.Command == root ? "windscript" : $"windscript {parse.CommandResult.Command.Name}";
        if (UsageMessages.ValueForFlag(parse, args) is { } flag)
            return Report(io, $"{command}: {flag}", ExitCodes.Usage);
        if (parse.Errors.Count > 0)
            return Report(io, $"{command}: {UsageMessages.Describe(parse.Errors[0])} (see '{command} --help')", ExitCodes.Usage);
        if (UsageMessages.UnknownOption(parse) is { } unknown)
            return Report(io, $"{command}: unknown option '{unknown}' (see '{command} --help'; a file whose name starts with '-' can be given as ./{unknown})", ExitCodes.Usage);
        return parse.Invoke(new InvocationConfiguration { Output = io.Out, Error = io.Err, EnableDefaultExceptionHandler = false });
    }

    private static int Report(CliIO io, string message, int exit)
    {
        try
        {
            io.Err.WriteLine(message);
        }
        catch (Exception)
        {
            // Standard error is gone too: the exit code is all that is left to say it.
        }
        return exit;
    }

    /// <summary>A fault before the streams exist (the console itself could not be set up).</summary>
    public static int ReportStartupFault(Exception exception)
    {
        int exit = ExitCodes.Internal;
        try
        {
            if (IoFailure.Find(exception) is not { } fault)
            {
                Console.Error.WriteLine($"windscript: internal error: {exception.GetType().Name}: {exception.Message}");
                return ExitCodes.Internal;
            }
            if (IoFailure.IsBrokenPipe(fault)) return IoFailure.BrokenPipeExit;
            exit = ExitCodes.Usage;
            Console.Error.WriteLine($"windscript: {IoFailure.Describe(fault)}");
        }
        catch (Exception)
        {
            // Nothing is left to write with; the exit code says it.
        }
        return exit;
    }
}
