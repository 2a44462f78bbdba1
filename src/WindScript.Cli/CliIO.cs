namespace WindScript.Cli;

/// <summary>The streams a command talks to (the console, or strings in tests).</summary>
public sealed record CliIO(TextReader In, TextWriter Out, TextWriter Err, bool ErrIsTerminal = false)
{
    public static CliIO Console => new(System.Console.In, System.Console.Out, System.Console.Error, !System.Console.IsErrorRedirected);
}
