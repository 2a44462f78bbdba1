using WindScript.Cli.Output;
using System.Buffers;
using System.Buffers.Text;
using System.Text;
using System.Text.Json;
using WindScript.Sweep;

namespace WindScript.Cli.Output;

/// <summary>
/// One way of writing sweep records as bytes. An instance belongs to one worker thread.
/// Numbers: winding factors and q with 6 decimals, the leakage with 6 significant digits,
/// trailing zeros dropped; the same record always gives the same bytes.
/// </summary>
public abstract class SweepFormat
{
    public static SweepFormat Create(OutputFormat format, int orders) => format switch
    {
        OutputFormat.Csv => new SweepCsv(orders),
        _ => new SweepJsonLines(),
    };

    /// <summary>Text written once before the records (the CSV header), or empty.</summary>
    public abstract string Header { get; }

    public abstract void Write(SweepRecord record, IBufferWriter<byte> output);

    /// <summary>Formats a number into <paramref name="destination"/>: 'F' with 6 decimals or 'G' with 6 digits, trailing zeros removed.</summary>
    public static int Number(double value, Span<byte> destination, bool significant = false)
    {
        if (!double.IsFinite(value)) value = 0;
        if (!significant && Math.Abs(value) < 1e12) return FixedSix(value, destination);
        var format = significant ? new StandardFormat('G', 6) : new StandardFormat('F', 6);
        if (!Utf8Formatter.TryFormat(value, destination, out int length, format)) throw new InvalidOperationException("number buffer too small");
        int exponent = destination[..length].IndexOf((byte)'E');
        int mantissaEnd = exponent < 0 ? length : exponent;
        if (destination[..mantissaEnd].IndexOf((byte)'.') >= 0)
        {
            int end = mantissaEnd;
            while (destination[end - 1] == (byte)'0') end--;
            if (destination[end - 1] == (byte)'.') end--;
            if (end < mantissaEnd)
            {
                destination[mantissaEnd..length].CopyTo(destination[end..]);
                length -= mantissaEnd - end;
            }
        }
        if (length == 2 && destination[0] == (byte)'-' && destination[1] == (byte)'0') { destination[0] = (byte)'0'; length = 1; }
        return length;
    }

    // 'F6' without the general formatter: the value rounded to millionths as an integer, then its
    // digits (about ten times faster; the sweep writes tens of thousands of these).
    private static int FixedSix(double value, Span<byte> destination)
    {
        long micro = (long)Math.Round(Math.Abs(value) * 1e6, MidpointRounding.AwayFromZero);
        int at = 0;
        if (micro == 0) { destination[0] = (byte)'0'; return 1; }
        if (value < 0) destination[at++] = (byte)'-';
        long whole = micro / 1_000_000, fraction = micro % 1_000_000;
        Utf8Formatter.TryFormat(whole, destination[at..], out int n);
        at += n;
        if (fraction == 0) return at;
        destination[at++] = (byte)'.';
        int digits = 6;
        while (fraction % 10 == 0) { fraction /= 10; digits--; }
        for (int i = digits - 1; i >= 0; i--)
        {
            destination[at + i] = (byte)('0' + fraction % 10);
            fraction /= 10;
        }
        return at + digits;
    }
}

/// <summary>JSON Lines: one object per layout, written with <see cref="Utf8JsonWriter"/> (no reflection, safe under Native AOT).</summary>
public sealed class SweepJsonLines : SweepFormat
{
    private static readonly JsonEncodedText Slots = JsonEncodedText.Encode("slots"), Poles = JsonEncodedText.Encode("poles"),
        Phases = JsonEncodedText.Encode("phases"), Layers = JsonEncodedText.Encode("layers"), Pitch = JsonEncodedText.Encode("pitch"),
        Q = JsonEncodedText.Encode("q"), Periodicity = JsonEncodedText.Encode("periodicity"), Cogging = JsonEncodedText.Encode("coggingOrder"),
        Paths = JsonEncodedText.Encode("maxParallelPaths"), Leakage = JsonEncodedText.Encode("differentialLeakage"),
        Sub = JsonEncodedText.Encode("subharmonics"), Lowest = JsonEncodedText.Encode("lowestOrder"), Even = JsonEncodedText.Encode("evenHarmonics"),
        Adjacent = JsonEncodedText.Encode("adjacentOrders"), Factors = JsonEncodedText.Encode("windingFactors");

    private Utf8JsonWriter? _json;

    public override string Header => "";

    public override void Write(SweepRecord r, IBufferWriter<byte> output)
    {
        if (_json is null) _json = new Utf8JsonWriter(output);
        else _json.Reset(output);
        var j = _json;
        Span<byte> number = stackalloc byte[64];
        j.WriteStartObject();
        j.WriteNumber(Slots, r.Slots);
        j.WriteNumber(Poles, r.Poles);
        j.WriteNumber(Phases, r.Phases);
        j.WriteNumber(Layers, r.Layers);
        j.WriteNumber(Pitch, r.Pitch);
        j.WritePropertyName(Q);
        j.WriteRawValue(number[..Number(r.SlotsPerPolePerPhase, number)], skipInputValidation: true);
        j.WriteNumber(Periodicity, r.Periodicity);
        j.WriteNumber(Cogging, r.CoggingOrder);
        j.WriteNumber(Paths, r.Sections);
        j.WritePropertyName(Leakage);
        j.WriteRawValue(number[..Number(r.DifferentialLeakage, number, significant: true)], skipInputValidation: true);
        j.WriteBoolean(Sub, r.Subharmonics);
        j.WriteNumber(Lowest, r.LowestOrder);
        j.WriteBoolean(Even, r.EvenHarmonics);
        j.WriteBoolean(Adjacent, r.AdjacentOrders);
        j.WriteStartArray(Factors);
        foreach (double k in r.WindingFactors) j.WriteRawValue(number[..Number(k, number)], skipInputValidation: true);
        j.WriteEndArray();
        j.WriteEndObject();
        j.Flush();
        output.Write("\n"u8);
    }
}

/// <summary>CSV with a header row; the winding factors are the last columns, kw1..kwN (electrical orders).</summary>
public sealed class SweepCsv(int orders) : SweepFormat
{
    public override string Header { get; } =
        "slots,poles,phases,layers,pitch,q,periodicity,coggingOrder,maxParallelPaths,differentialLeakage,subharmonics,lowestOrder,evenHarmonics,adjacentOrders,"
        + string.Join(",", Enumerable.Range(1, orders).Select(n => $"kw{n}")) + "\n";

    public override void Write(SweepRecord r, IBufferWriter<byte> output)
    {
        var span = output.GetSpan(256 + 24 * r.WindingFactors.Length);
        int at = 0;
        void Int(Span<byte> s, int value)
        {
            Utf8Formatter.TryFormat(value, s[at..], out int n);
            at += n;
            s[at++] = (byte)',';
        }
        void Bool(Span<byte> s, bool value)
        {
            (value ? "true,"u8 : "false,"u8).CopyTo(s[at..]);
            at += value ? 5 : 6;
        }
        Int(span, r.Slots);
        Int(span, r.Poles);
        Int(span, r.Phases);
        Int(span, r.Layers);
        Int(span, r.Pitch);
        at += Number(r.SlotsPerPolePerPhase, span[at..]);
        span[at++] = (byte)',';
        Int(span, r.Periodicity);
        Int(span, r.CoggingOrder);
        Int(span, r.Sections);
        at += Number(r.DifferentialLeakage, span[at..], significant: true);
        span[at++] = (byte)',';
        Bool(span, r.Subharmonics);
        Int(span, r.LowestOrder);
        Bool(span, r.EvenHarmonics);
        Bool(span, r.AdjacentOrders);
        for (int i = 0; i < r.WindingFactors.Length; i++)
        {
            at += Number(r.WindingFactors[i], span[at..]);
            span[at++] = (byte)(i == r.WindingFactors.Length - 1 ? '\n' : ',');
        }
        output.Advance(at);
    }
}

/// <summary>
/// Where sweep output goes: a part file when one is given, else straight to the standard output
/// bytes when there is such a stream, else through the text writer (tests). The records are
/// ASCII, so all give the same text.
/// </summary>
internal sealed class RecordOutput
{
    private readonly CliIO _io;
    private readonly Stream? _raw;
    private char[] _scratch = [];

    public RecordOutput(CliIO io, Stream? file = null)
    {
        _io = io;
        _raw = file ?? io.RawOut;
        if (file is null && io.RawOut is not null) io.Out.Flush();   // anything written as text so far goes first
    }

    public void Write(string text)
    {
        if (text.Length == 0) return;
        if (_raw is { } raw) raw.Write(Encoding.UTF8.GetBytes(text));
        else _io.Out.Write(text);
    }

    public void Write(ReadOnlySpan<byte> bytes)
    {
        if (_raw is { } raw)
        {
            raw.Write(bytes);
            return;
        }
        if (_scratch.Length < bytes.Length) _scratch = new char[Math.Max(bytes.Length, 2 * _scratch.Length)];
        int n = Encoding.UTF8.GetChars(bytes, _scratch);
        _io.Out.Write(_scratch, 0, n);
    }

    public void Flush()
    {
        if (_raw is { } raw) raw.Flush();
        else _io.Out.Flush();
    }
}
