using WindScript.Cli.Files;

namespace WindScript.Cli;

/// <summary>
/// One sweep part (<c>-o part-{K}.jsonl</c>), written as a stream under the output rules of
/// <see cref="OutputFile"/>: a temporary file beside the target, renamed over it on <see cref="Commit"/>
/// (a task killed before that leaves the earlier part, and the next run removes the stale temporary);
/// never over an input; through symbolic links; the target's mode and owner kept; directories and
/// special files refused, devices and pipes (<c>-o /dev/stdout</c>) written as a stream.
/// </summary>
public sealed class PartFile : IDisposable
{
    private readonly PendingOutput _output;

    /// <exception cref="OutputRefusedException">the rules forbid writing the path (the message says why)</exception>
    public PartFile(string path, IEnumerable<string>? inputs = null) => _output = OutputFile.Open(path, inputs);

    /// <summary>The stream to write: seekable for a file (writers that go back to patch a header can use it), not for a pipe or device.</summary>
    public Stream Stream => _output.Stream;

    /// <summary>Flushes to disk and renames the temporary file to the target, replacing any earlier part.</summary>
    public void Commit() => _output.Commit();

    /// <summary>Without a commit: removes the temporary file and leaves any earlier part as it was.</summary>
    public void Dispose() => _output.Dispose();

    /// <summary>
    /// The path with <c>{K}</c> replaced by the shard number (zero-padded to the width of N, so
    /// that names sort in shard order) and <c>{N}</c> by the number of shards.
    /// </summary>
    public static string Expand(string path, int k, int n)
    {
        int width = n.ToString(System.Globalization.CultureInfo.InvariantCulture).Length;
        return path.Replace("{K}", k.ToString(System.Globalization.CultureInfo.InvariantCulture).PadLeft(width, '0'))
                   .Replace("{N}", n.ToString(System.Globalization.CultureInfo.InvariantCulture));
    }
}
