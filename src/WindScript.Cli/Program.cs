using WindScript.Cli;

// Even setting up the console can fail (too many open files): that too is one line and exit 2.
// No filter on the catch, and reporting guarded once more: with no descriptors left, any code
// that needs one more assembly loaded fails in turn.
try
{
    return CliApp.Run(args, CliIO.Console);
}
catch (Exception e)
{
    try
    {
        return CliApp.ReportStartupFault(e);
    }
    catch (Exception)
    {
        return ExitCodes.Usage;
    }
}
