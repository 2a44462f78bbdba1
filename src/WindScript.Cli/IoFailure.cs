namespace WindScript.Cli;

/// <summary>
/// How the CLI tells an I/O fault (the user's environment) from a bug, and how it words one.
/// Uses only types of the core library (no LINQ, no Regex): with no file descriptors left, code
/// that needs one more assembly loaded fails in turn, and this is the code that must not fail.
/// </summary>
public static class IoFailure
{
    private const int BrokenPipeErrno = 32;   // EPIPE on Linux and macOS
    private const int TooManyOpenFilesErrno = 24;   // EMFILE

    /// <summary>The conventional status of a process stopped by SIGPIPE (128 + 13), which shells treat as quiet.</summary>
    public const int BrokenPipeExit = 141;

    /// <summary>The reader of our output has gone (<c>| head -1</c>): stop at once, quietly.</summary>
    public static bool IsBrokenPipe(Exception e)
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
            if (x is IOException io && (io.HResult == BrokenPipeErrno || io.Message.Contains("Broken pipe", StringComparison.OrdinalIgnoreCase))) return true;
        return false;
    }

    /// <summary>An I/O fault anywhere in the exception (a sweep worker wraps its failure), or null for a bug.</summary>
    public static Exception? Find(Exception e)
    {
        if (e is IOException or UnauthorizedAccessException || IsTooManyOpenFiles(e)) return e;
        if (e is AggregateException aggregate)
        {
            foreach (var inner in aggregate.InnerExceptions)
                if (Find(inner) is { } found) return found;
            return null;
        }
        return e.InnerException is { } next ? Find(next) : null;
    }

    /// <summary>One line: the system's own words, without exception types or stack.</summary>
    public static string Describe(Exception e)
    {
        if (e is UnauthorizedAccessException) return "permission denied";
        if (IsTooManyOpenFiles(e)) return "too many open files (raise the limit, e.g. 'ulimit -n 1024')";
        // An assembly that cannot be opened: with a sound installation, the process has run out of file descriptors.
        if (e is FileNotFoundException { FileName: { } name } && name.Contains("Version=", StringComparison.Ordinal))
            return $"cannot open part of windscript ({name.Split(',')[0]}): too many open files, or a damaged installation";
        string message = e.Message.Split('\n')[0].Trim();
        // .NET appends " : 'PATH'" to the system's message; the caller names the path itself.
        int quote = message.LastIndexOf(" : '", StringComparison.Ordinal);
        if (quote > 0 && message.EndsWith('\'')) message = message[..quote];
        return message.TrimEnd('.').Trim();
    }

    // By errno and message, not by type: naming Win32Exception would load another assembly.
    private static bool IsTooManyOpenFiles(Exception e) =>
        e.HResult == TooManyOpenFilesErrno && e is System.Runtime.InteropServices.ExternalException
        || e.Message.Contains("Too many open files", StringComparison.Ordinal);
}
