namespace WindScript.Cli;

/// <summary>The streams a command talks to (the console, or strings in tests).</summary>
public sealed record CliIO(TextReader In, TextWriter Out, TextWriter Err, bool ErrIsTerminal = false)
{
    /// <summary>
    /// Standard output as bytes, for commands that stream a lot of already-encoded text (sweep);
    /// null in tests, where such commands fall back to <see cref="Out"/>.
    /// </summary>
    public Stream? RawOut { get; init; }

    /// <summary>Looks an environment variable up (null when unset); tests pass a dictionary, so none of the process's variables leak in.</summary>
    public Func<string, string?> Environment { get; init; } = _ => null;

    public static CliIO Console => new(System.Console.In, System.Console.Out, System.Console.Error, !System.Console.IsErrorRedirected)
    {
        RawOut = System.Console.OpenStandardOutput(),
        Environment = System.Environment.GetEnvironmentVariable,
    };
}
