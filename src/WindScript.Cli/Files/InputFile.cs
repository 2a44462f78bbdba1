using System.Text;

namespace WindScript.Cli.Files;

/// <summary>A source read from a path, or from standard input when the path is "-".</summary>
public sealed record InputFile(string Path, string Text)
{
    public bool IsStdin => Path == "-";

    /// <summary>The name shown in messages.</summary>
    public string DisplayName => IsStdin ? "<stdin>" : Path;

    /// <summary>
    /// Reads a file, or reports a usage error (returns null) when it cannot be read. Reads at most
    /// <see cref="InputLimits.MaxFileBytes"/>: a larger input (or an endless one, /dev/zero) is refused.
    /// </summary>
    public static InputFile? Read(string path, TextReader stdin, TextWriter stderr)
    {
        try
        {
            string? text = path == "-" ? ReadBounded(stdin) : ReadBounded(path);
            if (text is null)
            {
                stderr.WriteLine($"windscript: cannot read '{Shown(path)}': larger than {InputLimits.MaxFileBytes / 1024} KiB, the limit for a winding file");
                return null;
            }
            return new InputFile(path, text);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            stderr.WriteLine($"windscript: cannot read '{Shown(path)}': {Describe(path, e)}");
            return null;
        }
    }

    private static string Shown(string path) => path == "-" ? "<stdin>" : path;

    private static string? ReadBounded(string path)
    {
        if (Directory.Exists(path)) throw new IOException("is a directory");
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite, 1 << 16);
        using var reader = new StreamReader(stream, new UTF8Encoding(false), detectEncodingFromByteOrderMarks: true);
        return ReadBounded(reader);
    }

    /// <summary>At most the limit's worth of characters (a UTF-8 file within the byte limit has no more), or null when there is more.</summary>
    private static string? ReadBounded(TextReader reader)
    {
        var text = new StringBuilder();
        var buffer = new char[1 << 16];
        int read;
        while ((read = reader.Read(buffer, 0, buffer.Length)) > 0)
        {
            text.Append(buffer, 0, read);
            if (text.Length > InputLimits.MaxFileBytes) return null;
        }
        return text.ToString();
    }

    private static string Describe(string path, Exception e) => e switch
    {
        FileNotFoundException => "no such file",
        DirectoryNotFoundException => "no such directory",
        UnauthorizedAccessException when Directory.Exists(path) => "is a directory",
        UnauthorizedAccessException => "permission denied",
        _ => e.Message,
    };
}
