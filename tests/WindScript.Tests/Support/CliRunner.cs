using WindScript.Cli;

namespace WindScript.Tests.Support;

/// <summary>Runs the CLI in-process with captured streams.</summary>
public static class CliRunner
{
    public sealed record Result(int Exit, string Out, string Err);

    public static Result RunWithInput(string stdin, params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int exit = CliApp.Run(args, new CliIO(new StringReader(stdin), output, error));
        return new Result(exit, output.ToString(), error.ToString());
    }

    public static Result Run(params string[] args) => RunWithInput("", args);
}
