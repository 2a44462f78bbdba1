using System.Text;
using Microsoft.Win32.SafeHandles;

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

    /// <summary>
    /// The process's streams. Standard output is written through a plain file stream on
    /// descriptor 1 rather than the console stream, because the console stream silently drops
    /// write errors: a full disk or a closed descriptor must fail (exit 2), and a reader that has
    /// gone (<c>| head</c>) must stop the work at once.
    /// </summary>
    public static CliIO Console
    {
        get
        {
            var raw = StandardOutput();
            var output = new StreamWriter(raw, new UTF8Encoding(false), 1 << 14, leaveOpen: true) { AutoFlush = false };
            return new CliIO(System.Console.In, output, System.Console.Error, !System.Console.IsErrorRedirected)
            {
                RawOut = raw,
                Environment = System.Environment.GetEnvironmentVariable,
            };
        }
    }

    private static Stream StandardOutput()
    {
        if (OperatingSystem.IsWindows()) return System.Console.OpenStandardOutput();
        try
        {
            return new StandardOutputStream(new FileStream(new SafeFileHandle(1, ownsHandle: false), FileAccess.Write, bufferSize: 0));
        }
        catch (Exception e) when (e is IOException or ArgumentException or UnauthorizedAccessException)
        {
            return new FailingStream(new IOException($"standard output is not open ({IoFailure.Describe(e)})"));
        }
    }

    /// <summary>Standard output, whose write failures say that they are about standard output.</summary>
    private sealed class StandardOutputStream(Stream inner) : Stream
    {
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => 0;
        public override long Position { get => 0; set { } }
        public override void Flush() => Guard(inner.Flush);
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => Guard(() => inner.Write(buffer, offset, count));
        public override void Write(ReadOnlySpan<byte> buffer)
        {
            try
            {
                inner.Write(buffer);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw Explain(e);
            }
        }

        private static void Guard(Action write)
        {
            try
            {
                write();
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw Explain(e);
            }
        }

        // The system reports a closed descriptor as "access denied"; keep the errno (broken pipe) for the caller.
        private static IOException Explain(Exception e) => e is UnauthorizedAccessException
            ? new IOException("cannot write standard output: it is closed or not writable", e)
            : new IOException($"cannot write standard output: {IoFailure.Describe(e)}", e) { HResult = e.HResult };
    }

    /// <summary>Standard output when descriptor 1 is closed: every write reports that.</summary>
    private sealed class FailingStream(IOException failure) : Stream
    {
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => 0;
        public override long Position { get => 0; set { } }
        public override void Flush() { }
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw failure;
    }
}
