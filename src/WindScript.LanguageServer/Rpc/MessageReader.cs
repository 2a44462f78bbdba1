using System.Text;

namespace WindScript.LanguageServer.Rpc;

/// <summary>One framed message as read from the wire: its body, or why it could not be read.</summary>
public readonly record struct Frame(byte[]? Body, string? Error);

/// <summary>
/// Reads LSP base-protocol frames: header lines ("Content-Length: N"), a blank line, then N
/// bytes of UTF-8 JSON. Bad headers are reported as a frame error and reading resumes at the
/// next header block, so a confused client cannot stop the server. It resynchronises after a
/// wrong frame: a header that starts inside a line (after the rest of a body that was longer
/// than its Content-Length said, or a body sent with no Content-Length) starts a new block; a body
/// with more bytes than its JSON value (Content-Length too large) keeps the value and hands the
/// rest back to be read as the next header.
/// </summary>
public sealed class MessageReader(Stream input)
{
    /// <summary>Larger bodies are skipped with an error (a megabyte of winding text is already enormous).</summary>
    public const int MaxBodyBytes = 64 * 1024 * 1024;

    private const int MaxHeaderLine = 8 * 1024;

    private byte[] _buffer = new byte[64 * 1024];
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
                return body is null ? new Frame(null, "the input ended inside a message body") : CheckBody(body);
            }
            if (HeaderStart(line) is int at && (at > 0 || error is not null || length is not null))
            {
                // A new header block begins here: whatever came before it belonged to a broken frame.
                line = line[at..];
                if (sawHeader && error is null && length is not null) error = "a message header was followed by another without a body";
                error = null;
                length = null;
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

    private static readonly string[] HeaderNames = ["Content-Length:", "Content-Type:"];

    /// <summary>Where a base-protocol header starts in a line, or null.</summary>
    private static int? HeaderStart(string line)
    {
        int? best = null;
        foreach (var name in HeaderNames)
        {
            int at = line.IndexOf(name, StringComparison.OrdinalIgnoreCase);
            if (at >= 0 && (best is null || at < best)) best = at;
        }
        return best;
    }

    /// <summary>
    /// A body is one JSON value. If a complete value ends before the body does, the Content-Length
    /// was too large: the value is the message, and the rest goes back to be read as header.
    /// </summary>
    private Frame CheckBody(byte[] body)
    {
        int end = EndOfFirstValue(body);
        if (end < 0 || end == body.Length) return new Frame(body, null);
        int rest = end;
        while (rest < body.Length && body[rest] is (byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n') rest++;
        if (rest == body.Length) return new Frame(body, null);
        Unread(body.AsSpan(rest));
        return new Frame(body[..end], null);
    }

    /// <summary>The byte offset after the first complete JSON value, or -1 if the body does not hold one.</summary>
    private static int EndOfFirstValue(byte[] body)
    {
        var reader = new System.Text.Json.Utf8JsonReader(body, isFinalBlock: false, state: default);
        try
        {
            if (!reader.Read()) return -1;
            if (reader.TokenType is System.Text.Json.JsonTokenType.StartObject or System.Text.Json.JsonTokenType.StartArray)
                if (!reader.TrySkip()) return -1;
            return (int)reader.BytesConsumed;
        }
        catch (System.Text.Json.JsonException)
        {
            return -1;
        }
    }

    /// <summary>Puts bytes back in front of what is still to be read.</summary>
    private void Unread(ReadOnlySpan<byte> bytes)
    {
        int pending = _end - _start;
        var next = pending + bytes.Length <= _buffer.Length ? new byte[_buffer.Length] : new byte[pending + bytes.Length + _buffer.Length];
        bytes.CopyTo(next);
        Buffer.BlockCopy(_buffer, _start, next, bytes.Length, pending);
        _buffer = next;
        _start = 0;
        _end = bytes.Length + pending;
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
