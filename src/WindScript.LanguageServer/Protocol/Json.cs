using System.Text.Json;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Rpc;

namespace WindScript.LanguageServer.Protocol;

/// <summary>Reading request parameters: a missing or mistyped field is an InvalidParams error, never a crash.</summary>
public static class Json
{
    public static JsonObject Object(JsonNode? node, string what = "params") =>
        node as JsonObject ?? throw new RpcException(RpcErrorCodes.InvalidParams, $"{what} must be an object");

    public static string String(JsonObject o, string name) =>
        TryString(o, name) ?? throw new RpcException(RpcErrorCodes.InvalidParams, $"'{name}' must be a string");

    public static string? TryString(JsonObject o, string name) =>
        o[name] is JsonValue v && v.GetValueKind() == JsonValueKind.String ? v.GetValue<string>() : null;

    public static int Int(JsonObject o, string name) =>
        TryInt(o, name) ?? throw new RpcException(RpcErrorCodes.InvalidParams, $"'{name}' must be an integer");

    public static int? TryInt(JsonObject o, string name)
    {
        if (o[name] is not JsonValue v || v.GetValueKind() != JsonValueKind.Number) return null;
        if (v.TryGetValue(out int i)) return i;
        if (v.TryGetValue(out long l)) return (int)Math.Clamp(l, int.MinValue, int.MaxValue);
        if (v.TryGetValue(out double d) && !double.IsNaN(d)) return (int)Math.Clamp(d, int.MinValue, int.MaxValue);
        return null;
    }

    public static bool Bool(JsonObject o, string name) =>
        o[name] is JsonValue v && v.GetValueKind() == JsonValueKind.True;

    /// <summary>params.textDocument.uri, which nearly every request carries.</summary>
    public static string DocumentUri(JsonObject p) => String(Object(p["textDocument"], "textDocument"), "uri");
}
