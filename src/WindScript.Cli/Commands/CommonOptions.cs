using System.CommandLine;

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

    public static Option<string> Format(string defaultValue, params string[] allowed)
    {
        var option = new Option<string>("--format", "-f")
        {
            Description = "Output format: " + string.Join(", ", allowed),
            DefaultValueFactory = _ => defaultValue,
        };
        option.AcceptOnlyFromAmong(allowed);
        return option;
    }
}
