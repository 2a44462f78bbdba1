using System.Text;

namespace WindScript.LanguageServer.Rpc;

/// <summary>One framed message as read from the wire: its body, or why it could not be read.</summary>
public readonly record struct Frame(byte[]? Body, string? Error);

/// <summary>
/// Reads LSP base-protocol frames: header lines ("Content-Length: N"), a blank line, then N
/// bytes of UTF-8 JSON. Bad headers are reported as a frame error and reading resumes at the
/// next header block, so a confused client cannot stop the server.
/// </summary>
public sealed class MessageReader(Stream input)
{
    /// <summary>Larger bodies are skipped with an error (a megabyte of winding text is already enormous).</summary>
    public const int MaxBodyBytes = 64 * 1024 * 1024;

    private const int MaxHeaderLine = 8 * 1024;

    private readonly byte[] _buffer = new byte[64 * 1024];
    private int _start, _end;

    /// <summary>The next frame, or null at the end of the input.</summary>
    public async ValueTask<Frame?> ReadAsync(CancellationToken cancel = default)
    {
        int? length = null;
        bool sawHeader = false;
        string? error = null;
        while (true)
        {
            var line = await ReadLineAsync(cancel);
            if (line is null) return sawHeader ? new Frame(null, "the input ended inside a message header") : null;
            if (line.Length == 0)
            {
                if (!sawHeader) continue; // stray blank lines between messages
                if (error is not null) return new Frame(null, error);
                if (length is not { } n) return new Frame(null, "a message header had no Content-Length");
                if (n > MaxBodyBytes)
                {
                    await SkipAsync(n, cancel);
                    return new Frame(null, $"a message of {n} bytes exceeds the limit of {MaxBodyBytes} bytes");
                }
                var body = await ReadExactlyAsync(n, cancel);
                return body is null ? new Frame(null, "the input ended inside a message body") : new Frame(body, null);
            }
            sawHeader = true;
            int colon = line.IndexOf(':');
            if (colon <= 0)
            {
                error ??= $"a message header line is not 'Name: value': '{Truncate(line)}'";
                continue;
            }
            var name = line[..colon].Trim();
            var value = line[(colon + 1)..].Trim();
            if (name.Equals("Content-Length", StringComparison.OrdinalIgnoreCase))
            {
                if (int.TryParse(value, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int n) && n >= 0) length = n;
                else error ??= $"Content-Length is not a byte count: '{Truncate(value)}'";
            }
            // Content-Type and unknown headers are accepted and ignored (the body is always UTF-8 JSON).
        }
    }

    private static string Truncate(string s) => s.Length <= 60 ? s : s[..60] + "...";

    private async ValueTask<bool> FillAsync(CancellationToken cancel)
    {
        if (_start == _end) _start = _end = 0;
        else if (_end == _buffer.Length)
        {
            Buffer.BlockCopy(_buffer, _start, _buffer, 0, _end - _start);
            _end -= _start;
            _start = 0;
        }
        int read = await input.ReadAsync(_buffer.AsMemory(_end), cancel);
        _end += read;
        return read > 0;
    }

    /// <summary>A header line without its line break; over-long lines are cut (and will not parse as a header).</summary>
    private async ValueTask<string?> ReadLineAsync(CancellationToken cancel)
    {
        var line = new StringBuilder();
        while (true)
        {
            for (int i = _start; i < _end; i++)
            {
                if (_buffer[i] != (byte)'\n') continue;
                int stop = i > _start && _buffer[i - 1] == (byte)'\r' ? i - 1 : i;
                Append(line, _start, stop);
                _start = i + 1;
                return line.ToString();
            }
            Append(line, _start, _end);
            _start = _end;
            if (!await FillAsync(cancel)) return line.Length > 0 ? line.ToString() : null;
        }
    }

    private void Append(StringBuilder line, int from, int to)
    {
        int room = MaxHeaderLine - line.Length;
        if (room > 0) line.Append(Encoding.ASCII.GetString(_buffer, from, Math.Min(room, to - from)));
    }

    private async ValueTask<byte[]?> ReadExactlyAsync(int count, CancellationToken cancel)
    {
        var body = new byte[count];
        int filled = 0;
        while (filled < count)
        {
            if (_start == _end && !await FillAsync(cancel)) return null;
            int n = Math.Min(count - filled, _end - _start);
            Buffer.BlockCopy(_buffer, _start, body, filled, n);
            _start += n;
            filled += n;
        }
        return body;
    }

    private async ValueTask SkipAsync(long count, CancellationToken cancel)
    {
        while (count > 0)
        {
            if (_start == _end && !await FillAsync(cancel)) return;
            int n = (int)Math.Min(count, _end - _start);
            _start += n;
            count -= n;
        }
    }
}
