using WindScript.Cli.Files;
using WindScript.Cli.Output;
using WindScript.Diagnostics;
using WindScript.Model;

namespace WindScript.Cli.Commands;

/// <summary>
/// Reads and compiles one file for a command that draws from it (plot, report): prints the
/// diagnostics, and refuses a file with errors, since a picture of a half-understood winding
/// would mislead.
/// </summary>
public static class DesignInput
{
    public sealed record Loaded(InputFile File, Compilation Compilation, WindingDesign Design);

    /// <summary>The compiled file, or the exit code to return. Warnings and errors go to standard error (infos do not).</summary>
    public static (Loaded? Loaded, int Exit) Load(CliIO io, string path)
    {
        if (InputFile.Read(path, io.In, io.Err) is not { } input) return (null, ExitCodes.Usage);
        var compilation = Compilation.Compile(input.Text, input.Path);
        DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics.Where(d => d.Severity >= Severity.Warning));
        if (compilation.HasErrors || compilation.Design is not { } design)
        {
            io.Err.WriteLine($"{input.DisplayName}: nothing drawn: {(compilation.HasErrors ? "fix the errors first" : "the file does not describe a complete machine and winding")}");
            return (null, ExitCodes.Findings);
        }
        return (new Loaded(input, compilation, design), ExitCodes.Ok);
    }
}
