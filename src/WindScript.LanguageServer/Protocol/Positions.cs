using System.Text.Json.Nodes;
using WindScript.Text;

namespace WindScript.LanguageServer.Protocol;

/// <summary>
/// LSP positions (zero-based line, character in UTF-16 code units) to and from core offsets.
/// C# strings count UTF-16 code units too, so a character index is an offset into the line.
/// </summary>
public static class Positions
{
    /// <summary>The offset of an LSP position; a character past the end of its line means the end of the line (LSP 3.17).</summary>
    public static int ToOffset(SourceText source, int line, int character)
    {
        if (line < 0) return 0;
        if (line >= source.LineCount) return source.Length;
        int start = source.LineStart(line);
        // In long arithmetic: a character of 2^31 - 1 must mean the end of the line, not overflow.
        return (int)Math.Min((long)start + Math.Max(0, character), LineContentEnd(source, line));
    }

    public static int ToOffset(SourceText source, JsonNode? position)
    {
        if (position is not JsonObject p) throw new Rpc.RpcException(Rpc.RpcErrorCodes.InvalidParams, "a position is missing");
        return ToOffset(source, Json.Int(p, "line"), Json.Int(p, "character"));
    }

    /// <summary>The end of a line's text, before its line break.</summary>
    public static int LineContentEnd(SourceText source, int line)
    {
        int end = line + 1 < source.LineCount ? source.LineStart(line + 1) : source.Length;
        var text = source.Text;
        if (end > source.LineStart(line) && text[end - 1] == '\n') end--;
        if (end > source.LineStart(line) && text[end - 1] == '\r') end--;
        return end;
    }

    public static JsonObject Position(SourceText source, int offset)
    {
        var p = source.GetPosition(offset);
        return new JsonObject { ["line"] = p.Line, ["character"] = p.Character };
    }

    public static JsonObject Range(SourceText source, TextSpan span) => new()
    {
        ["start"] = Position(source, span.Start),
        ["end"] = Position(source, span.End),
    };

    public static JsonObject Location(string uri, SourceText source, TextSpan span) => new()
    {
        ["uri"] = uri,
        ["range"] = Range(source, span),
    };

    /// <summary>The span an LSP range covers (start and end clamped into the text).</summary>
    public static TextSpan ToSpan(SourceText source, JsonNode? range)
    {
        if (range is not JsonObject r) throw new Rpc.RpcException(Rpc.RpcErrorCodes.InvalidParams, "a range is missing");
        int start = ToOffset(source, r["start"]);
        int end = ToOffset(source, r["end"]);
        return TextSpan.FromBounds(Math.Min(start, end), Math.Max(start, end));
    }
}
