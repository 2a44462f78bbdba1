using WindScript.Cli.Files;

namespace WindScript.Cli.Commands;

/// <summary>Runs a command's file write and turns a refusal or an I/O failure into one line and exit 2.</summary>
public static class OutputWriting
{
    public static int Write(CliIO io, string command, string path, Action write)
    {
        try
        {
            write();
            return ExitCodes.Ok;
        }
        catch (OutputRefusedException e)
        {
            io.Err.WriteLine($"windscript {command}: {e.Message}");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException && !IoFailure.IsBrokenPipe(e))
        {
            io.Err.WriteLine($"windscript {command}: cannot write '{path}': {IoFailure.Describe(e)}");
        }
        return ExitCodes.Usage;
    }
}
