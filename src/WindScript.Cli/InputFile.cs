using System.Text;

namespace WindScript.Cli;

/// <summary>A source read from a path, or from standard input when the path is "-".</summary>
public sealed record InputFile(string Path, string Text)
{
    public bool IsStdin => Path == "-";

    /// <summary>The name shown in messages.</summary>
    public string DisplayName => IsStdin ? "<stdin>" : Path;

    /// <summary>Reads a file, or reports a usage error (returns null) when it cannot be read.</summary>
    public static InputFile? Read(string path, TextReader stdin, TextWriter stderr)
    {
        try
        {
            if (path == "-") return new InputFile(path, stdin.ReadToEnd());
            return new InputFile(path, File.ReadAllText(path, Encoding.UTF8));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            stderr.WriteLine($"windscript: cannot read '{path}': {Describe(e)}");
            return null;
        }
    }

    private static string Describe(Exception e) => e switch
    {
        FileNotFoundException => "no such file",
        DirectoryNotFoundException => "no such directory",
        UnauthorizedAccessException => "permission denied",
        _ => e.Message,
    };
}
