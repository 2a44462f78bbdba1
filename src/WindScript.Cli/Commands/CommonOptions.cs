using System.CommandLine;
using WindScript.Cli.Output;

namespace WindScript.Cli.Commands;

/// <summary>Arguments and options shared by several commands, defined once so they read the same everywhere.</summary>
public static class CommonOptions
{
    public static Argument<string[]> Files(string description) => new("files")
    {
        Description = description + " ('-' reads standard input)",
        Arity = ArgumentArity.OneOrMore,
    };

    public static Argument<string> File(string description) => new("file")
    {
        Description = description + " ('-' reads standard input)",
    };

    /// <summary><c>--format</c> with the command's formats; read it with <see cref="OutputFormats.Parse"/>.</summary>
    public static Option<string> Format(OutputFormat defaultValue, params OutputFormat[] allowed)
    {
        var names = allowed.Select(OutputFormats.Name).ToArray();
        var option = new Option<string>("--format", "-f")
        {
            Description = "Output format: " + string.Join(", ", names),
            DefaultValueFactory = _ => OutputFormats.Name(defaultValue),
        };
        option.AcceptOnlyFromAmong(names);
        return option;
    }
}
