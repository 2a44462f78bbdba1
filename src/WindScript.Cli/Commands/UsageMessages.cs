using System.CommandLine;
using System.Text.RegularExpressions;

namespace WindScript.Cli.Commands;

/// <summary>Usage errors in the user's words: one line that names the option and what it takes.</summary>
public static partial class UsageMessages
{
    /// <summary>System.CommandLine names .NET types ("as expected type 'System.Int32'"); say what the value must be.</summary>
    public static string Reword(string message)
    {
        message = ExpectedType().Replace(message, m => m.Groups[1].Value switch
        {
            "System.Int32" or "System.Nullable`1[System.Int32]" => "as a whole number",
            "System.Double" => "as a number",
            "System.Boolean" => "as true or false",
            var other => $"as {other}",
        });
        return message.Replace("\r", "").Replace('\n', ' ').TrimEnd('.');
    }

    /// <summary>The first parse error in one line, naming the option it is about.</summary>
    public static string Describe(System.CommandLine.Parsing.ParseError error)
    {
        string message = Reword(error.Message);
        if (error.SymbolResult is System.CommandLine.Parsing.OptionResult { Option: var option } && !message.Contains(option.Name, StringComparison.Ordinal))
            message = $"{option.Name}: {message}";
        return message;
    }

    /// <summary>
    /// "--flag=VALUE" for an option that takes no value: System.CommandLine would split it and
    /// read VALUE as a file name; say what is wrong instead.
    /// </summary>
    public static string? ValueForFlag(ParseResult parse, IReadOnlyList<string> args)
    {
        foreach (var arg in args)
        {
            int equals = arg.IndexOf('=');
            if (!arg.StartsWith("--", StringComparison.Ordinal) || equals < 0) continue;
            string name = arg[..equals], value = arg[(equals + 1)..];
            var flag = parse.CommandResult.Command.Options.FirstOrDefault(o => o.Name == name || o.Aliases.Contains(name));
            if (flag is Option<bool> && !bool.TryParse(value, out _)) return $"{name} takes no value (or true/false), not '{value}'";
        }
        return null;
    }

    /// <summary>A value given to a command's file arguments that looks like an option nobody defined.</summary>
    public static string? UnknownOption(ParseResult parse)
    {
        foreach (var argument in parse.CommandResult.Command.Arguments)
        {
            var values = parse.GetResult(argument)?.Tokens.Select(t => t.Value) ?? [];
            if (values.FirstOrDefault(v => v.Length > 1 && v[0] == '-') is { } unknown) return unknown;
        }
        return null;
    }

    /// <summary>Adds a range check that stays silent when the value did not even parse (that error is already reported).</summary>
    public static void InRange(Option<int> option, int min, int max)
    {
        option.Validators.Add(result =>
        {
            if (result.Tokens.Count == 0) return;
            if (!int.TryParse(result.Tokens[^1].Value, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out int value)) return;
            if (value < min || value > max) result.AddError($"{option.Name} must be from {min} to {max}, not {result.Tokens[^1].Value}");
        });
    }

    /// <inheritdoc cref="InRange(Option{int}, int, int)"/>
    public static void InRange(Option<int?> option, int min, int max)
    {
        option.Validators.Add(result =>
        {
            if (result.Tokens.Count == 0) return;
            if (!int.TryParse(result.Tokens[^1].Value, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out int value)) return;
            if (value < min || value > max) result.AddError($"{option.Name} must be from {min} to {max}, not {result.Tokens[^1].Value}");
        });
    }

    [GeneratedRegex(@"as expected type '([^']+)'")]
    private static partial Regex ExpectedType();
}
