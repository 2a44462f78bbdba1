using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace WindScript.LanguageServer.Rpc;

/// <summary>Writes JSON-RPC messages with Content-Length framing; safe to call from several threads.</summary>
public sealed class MessageWriter(Stream output)
{
    private readonly Lock _gate = new();

    public void Write(JsonNode message)
    {
        using var body = new MemoryStream();
        using (var json = new Utf8JsonWriter(body))
            message.WriteTo(json);
        var header = Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n");
        lock (_gate)
        {
            output.Write(header);
            output.Write(body.GetBuffer().AsSpan(0, (int)body.Length));
            output.Flush();
        }
    }

    public void Respond(JsonNode? id, JsonNode? result) =>
        Write(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = id?.DeepClone(), ["result"] = result });

    public void RespondError(JsonNode? id, int code, string message) =>
        Write(new JsonObject
        {
            ["jsonrpc"] = "2.0",
            ["id"] = id?.DeepClone(),
            ["error"] = new JsonObject { ["code"] = code, ["message"] = message },
        });

    public void Notify(string method, JsonNode? @params) =>
        Write(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = method, ["params"] = @params });
}
