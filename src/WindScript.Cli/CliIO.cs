namespace WindScript.Cli;

/// <summary>The streams a command talks to (the console, or strings in tests).</summary>
public sealed record CliIO(TextReader In, TextWriter Out, TextWriter Err, bool ErrIsTerminal = false)
{
    /// <summary>
    /// Standard output as bytes, for commands that stream a lot of already-encoded text (sweep);
    /// null in tests, where such commands fall back to <see cref="Out"/>.
    /// </summary>
    public Stream? RawOut { get; init; }

    public static CliIO Console => new(System.Console.In, System.Console.Out, System.Console.Error, !System.Console.IsErrorRedirected)
    {
        RawOut = System.Console.OpenStandardOutput(),
    };
}
