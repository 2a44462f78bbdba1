using System.Diagnostics;
using System.IO.Pipes;
using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Rpc;

namespace WindScript.Benchmarks.LanguageServer;

/// <summary>
/// The language server in-process, driven over OS pipes exactly as an editor drives
/// <c>windscript lsp</c> over stdio. A keystroke is one incremental didChange, timed until the
/// publishDiagnostics for that version arrives.
/// </summary>
public sealed class LspSession : IDisposable
{
    private const string Uri = "file:///bench/big_generator.wind";
    private readonly AnonymousPipeServerStream _toServer = new(PipeDirection.Out);
    private readonly AnonymousPipeServerStream _fromServer = new(PipeDirection.Out);
    private readonly AnonymousPipeClientStream _serverIn;
    private readonly AnonymousPipeClientStream _clientIn;
    private readonly MessageReader _reader;
    private readonly Task<int> _server;
    private int _version = 1;

    public LspSession(string text)
    {
        _serverIn = new AnonymousPipeClientStream(PipeDirection.In, _toServer.ClientSafePipeHandle);
        _clientIn = new AnonymousPipeClientStream(PipeDirection.In, _fromServer.ClientSafePipeHandle);
        _reader = new MessageReader(_clientIn);
        _server = Task.Run(() => WindScript.LanguageServer.LanguageServer.RunAsync(_serverIn, _fromServer));
        Send(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = 1, ["method"] = "initialize", ["params"] = new JsonObject { ["capabilities"] = new JsonObject() } });
        Next(m => m["id"] is not null);
        Send(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = "initialized", ["params"] = new JsonObject() });
        Send(new JsonObject
        {
            ["jsonrpc"] = "2.0", ["method"] = "textDocument/didOpen",
            ["params"] = new JsonObject { ["textDocument"] = new JsonObject { ["uri"] = Uri, ["languageId"] = "windscript", ["version"] = 1, ["text"] = text } },
        });
        OpenDiagnostics = Next(IsDiagnostics(1))["params"]!["diagnostics"]!.AsArray().Count;
    }

    /// <summary>How many diagnostics the document had when opened.</summary>
    public int OpenDiagnostics { get; }

    /// <summary>
    /// Types or deletes one digit of the turns value on line 1 ("let n = 4" ↔ "let n = 45"), which
    /// every coil uses, so each keystroke is re-checked for real. Returns the milliseconds until
    /// the diagnostics of the new version arrived.
    /// </summary>
    public double Keystroke()
    {
        _version++;
        bool typing = _version % 2 == 0;
        var change = new JsonObject
        {
            ["range"] = new JsonObject
            {
                ["start"] = new JsonObject { ["line"] = 1, ["character"] = 9 },
                ["end"] = new JsonObject { ["line"] = 1, ["character"] = typing ? 9 : 10 },
            },
            ["text"] = typing ? "5" : "",
        };
        var started = Stopwatch.GetTimestamp();
        Send(new JsonObject
        {
            ["jsonrpc"] = "2.0", ["method"] = "textDocument/didChange",
            ["params"] = new JsonObject { ["textDocument"] = new JsonObject { ["uri"] = Uri, ["version"] = _version }, ["contentChanges"] = new JsonArray(change) },
        });
        Next(IsDiagnostics(_version));
        return Stopwatch.GetElapsedTime(started).TotalMilliseconds;
    }

    /// <summary>Shutdown and exit, as the protocol asks; returns the server's exit code.</summary>
    public int Shutdown()
    {
        Send(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = 2, ["method"] = "shutdown" });
        Next(m => (int?)m["id"] == 2);
        Send(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = "exit" });
        return _server.GetAwaiter().GetResult();
    }

    public void Dispose()
    {
        _toServer.Dispose();
        _fromServer.Dispose();
        _serverIn.Dispose();
        _clientIn.Dispose();
    }

    private void Send(JsonObject message)
    {
        var body = Encoding.UTF8.GetBytes(message.ToJsonString());
        _toServer.Write(Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n"));
        _toServer.Write(body);
        _toServer.Flush();
    }

    private JsonObject Next(Func<JsonObject, bool> match)
    {
        while (_reader.ReadAsync().AsTask().GetAwaiter().GetResult() is { } frame)
        {
            if (frame.Body is null) throw new InvalidOperationException(frame.Error);
            var m = JsonNode.Parse(frame.Body)!.AsObject();
            if (match(m)) return m;
        }
        throw new EndOfStreamException("the server closed its output");
    }

    private static Func<JsonObject, bool> IsDiagnostics(int version) =>
        m => (string?)m["method"] == "textDocument/publishDiagnostics" && (int?)m["params"]!["version"] == version;
}
