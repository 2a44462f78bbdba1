namespace WindScript.Cli;

/// <summary>
/// A file written as a stream and published only when complete: the bytes go to a hidden
/// temporary file beside the target, which is flushed to disk and renamed over the target on
/// <see cref="Commit"/>. A task killed before that leaves no half-written part under the target's
/// name (at most a <c>.NAME.PID.tmp</c> file, which the next run of the same part does not read).
/// </summary>
public sealed class PartFile : IDisposable
{
    private readonly string _target, _temp;
    private FileStream? _stream;

    public PartFile(string path)
    {
        _target = Path.GetFullPath(path);
        var dir = Path.GetDirectoryName(_target)!;
        _temp = Path.Combine(dir, $".{Path.GetFileName(_target)}.{System.Environment.ProcessId}.tmp");
        _stream = new FileStream(_temp, FileMode.Create, FileAccess.ReadWrite, FileShare.None, 1 << 16);
    }

    /// <summary>The stream to write (seekable, so writers that go back to patch a header can use it).</summary>
    public Stream Stream => _stream ?? throw new ObjectDisposedException(nameof(PartFile));

    /// <summary>Flushes to disk and renames the temporary file to the target, replacing any earlier part.</summary>
    public void Commit()
    {
        var stream = _stream ?? throw new ObjectDisposedException(nameof(PartFile));
        stream.Flush(flushToDisk: true);
        stream.Dispose();
        _stream = null;
        File.Move(_temp, _target, overwrite: true);
    }

    public void Dispose()
    {
        if (_stream is null) return;
        _stream.Dispose();
        _stream = null;
        try { File.Delete(_temp); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }

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
