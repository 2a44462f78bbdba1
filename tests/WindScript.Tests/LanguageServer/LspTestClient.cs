using System.IO.Pipes;
using System.Text;
using System.Text.Json.Nodes;
using System.Threading.Channels;
using WindScript.LanguageServer.Rpc;
using Server = WindScript.LanguageServer.LanguageServer;

namespace WindScript.Tests.LanguageServer;

/// <summary>
/// Drives the real server in-process over OS pipes, as an editor would over stdio: framed
/// JSON-RPC both ways, responses matched by id, notifications queued in arrival order.
/// </summary>
public sealed class LspTestClient : IAsyncDisposable
{
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(20);

    private readonly AnonymousPipeServerStream _toServer = new(PipeDirection.Out);
    private readonly AnonymousPipeServerStream _fromServer = new(PipeDirection.Out);
    private readonly AnonymousPipeClientStream _serverInput;
    private readonly AnonymousPipeClientStream _clientInput;
    private readonly Dictionary<string, TaskCompletionSource<JsonObject>> _pending = [];
    private readonly Channel<JsonObject> _notifications = Channel.CreateUnbounded<JsonObject>();
    private readonly Lock _gate = new();
    private readonly Task _reader;
    private int _nextId;

    public LspTestClient(IReadOnlyDictionary<string, Func<JsonObject, JsonNode?>>? extraRequests = null)
    {
        _serverInput = new AnonymousPipeClientStream(PipeDirection.In, _toServer.ClientSafePipeHandle);
        _clientInput = new AnonymousPipeClientStream(PipeDirection.In, _fromServer.ClientSafePipeHandle);
        ServerTask = Task.Run(() => Server.RunAsync(_serverInput, _fromServer, TextWriter.Null, extraRequests, CancellationToken.None));
        _reader = Task.Run(ReadAllAsync);
    }

    /// <summary>The server's run; completes with its exit code.</summary>
    public Task<int> ServerTask { get; }

    public static async Task<LspTestClient> StartAsync(JsonObject? capabilities = null)
    {
        var client = new LspTestClient();
        await client.InitializeAsync(capabilities);
        return client;
    }

    public async Task<JsonObject> InitializeAsync(JsonObject? capabilities = null)
    {
        var response = await RequestAsync("initialize", new JsonObject
        {
            ["processId"] = null,
            ["rootUri"] = null,
            ["capabilities"] = capabilities ?? new JsonObject
            {
                ["textDocument"] = new JsonObject
                {
                    ["hover"] = new JsonObject { ["contentFormat"] = new JsonArray("markdown", "plaintext") },
                    ["documentSymbol"] = new JsonObject { ["hierarchicalDocumentSymbolSupport"] = true },
                },
            },
        });
        Notify("initialized", new JsonObject());
        return response;
    }

    // ---- sending ------------------------------------------------------------------------------

    public void SendRaw(byte[] bytes)
    {
        lock (_gate)
        {
            _toServer.Write(bytes);
            _toServer.Flush();
        }
    }

    public void SendRaw(string text) => SendRaw(Encoding.UTF8.GetBytes(text));

    public void SendBody(string json)
    {
        var body = Encoding.UTF8.GetBytes(json);
        SendRaw([.. Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n"), .. body]);
    }

    public void Notify(string method, JsonNode? parameters) =>
        SendBody(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = method, ["params"] = parameters?.DeepClone() }.ToJsonString());

    /// <summary>Sends a request and waits for its response (the whole response object: result or error).</summary>
    public Task<JsonObject> RequestAsync(string method, JsonNode? parameters)
    {
        int id = Interlocked.Increment(ref _nextId);
        return RequestWithIdAsync(id, method, parameters);
    }

    public Task<JsonObject> RequestWithIdAsync(JsonNode id, string method, JsonNode? parameters)
    {
        var waiter = Expect(id);
        SendBody(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = method, ["params"] = parameters?.DeepClone() }.ToJsonString());
        return WithTimeout(waiter, $"response to {method}");
    }

    /// <summary>Registers interest in the response with this id (use before sending it raw).</summary>
    public Task<JsonObject> Expect(JsonNode? id)
    {
        var tcs = new TaskCompletionSource<JsonObject>(TaskCreationOptions.RunContinuationsAsynchronously);
        lock (_pending) _pending[Key(id)] = tcs;
        return tcs.Task;
    }

    public Task<JsonObject> ExpectAsync(JsonNode? id, string what) => WithTimeout(Expect(id), what);

    public async Task<JsonNode?> ResultAsync(string method, JsonNode? parameters)
    {
        var response = await RequestAsync(method, parameters);
        Assert.True(response["error"] is null, $"{method} failed: {response["error"]?.ToJsonString()}");
        return response["result"];
    }

    // ---- documents ----------------------------------------------------------------------------

    public void Open(string uri, string text, int version = 1) =>
        Notify("textDocument/didOpen", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = uri, ["languageId"] = "windscript", ["version"] = version, ["text"] = text },
        });

    public void ChangeAll(string uri, int version, string text) =>
        Notify("textDocument/didChange", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = uri, ["version"] = version },
            ["contentChanges"] = new JsonArray(new JsonObject { ["text"] = text }),
        });

    public void Change(string uri, int version, int startLine, int startChar, int endLine, int endChar, string text) =>
        Notify("textDocument/didChange", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = uri, ["version"] = version },
            ["contentChanges"] = new JsonArray(new JsonObject { ["range"] = Range(startLine, startChar, endLine, endChar), ["text"] = text }),
        });

    public static JsonObject Position(int line, int character) => new() { ["line"] = line, ["character"] = character };

    public static JsonObject Range(int startLine, int startChar, int endLine, int endChar) =>
        new() { ["start"] = Position(startLine, startChar), ["end"] = Position(endLine, endChar) };

    public static JsonObject At(string uri, int line, int character) => new()
    {
        ["textDocument"] = new JsonObject { ["uri"] = uri },
        ["position"] = Position(line, character),
    };

    public static JsonObject Doc(string uri) => new() { ["textDocument"] = new JsonObject { ["uri"] = uri } };

    // ---- receiving ----------------------------------------------------------------------------

    /// <summary>The next notification with this method, skipping others (log messages and the like).</summary>
    public async Task<JsonObject> NextNotificationAsync(string method, Func<JsonObject, bool>? match = null)
    {
        using var cts = new CancellationTokenSource(Timeout);
        try
        {
            while (true)
            {
                var n = await _notifications.Reader.ReadAsync(cts.Token);
                if ((string?)n["method"] == method && (match is null || match(n))) return n;
            }
        }
        catch (OperationCanceledException)
        {
            throw new TimeoutException($"no {method} notification within {Timeout.TotalSeconds} s");
        }
    }

    /// <summary>The diagnostics of the next publication for a document (optionally for a given version).</summary>
    public async Task<JsonArray> DiagnosticsAsync(string uri, int? version = null)
    {
        var n = await NextNotificationAsync("textDocument/publishDiagnostics",
            m => (string?)m["params"]!["uri"] == uri && (version is null || (int?)m["params"]!["version"] == version));
        return n["params"]!["diagnostics"]!.AsArray();
    }

    public async Task<int> ShutdownAndExitAsync()
    {
        var response = await RequestAsync("shutdown", null);
        Assert.Null(response["error"]);
        Notify("exit", null);
        return await WithTimeout(ServerTask, "server exit");
    }

    private async Task ReadAllAsync()
    {
        var reader = new MessageReader(_clientInput);
        try
        {
            while (await reader.ReadAsync() is { } frame)
            {
                Assert.Null(frame.Error);
                var message = JsonNode.Parse(frame.Body!)!.AsObject();
                Assert.Equal("2.0", (string?)message["jsonrpc"]);
                if (message.ContainsKey("method")) { _notifications.Writer.TryWrite(message); continue; }
                TaskCompletionSource<JsonObject>? tcs;
                lock (_pending)
                {
                    var key = Key(message["id"]);
                    if (_pending.Remove(key, out tcs)) { }
                }
                tcs?.TrySetResult(message);
            }
        }
        catch (IOException)
        {
        }
        finally
        {
            _notifications.Writer.TryComplete();
        }
    }

    private static string Key(JsonNode? id) => id?.ToJsonString() ?? "null";

    private static async Task<T> WithTimeout<T>(Task<T> task, string what)
    {
        if (await Task.WhenAny(task, Task.Delay(Timeout)) != task) throw new TimeoutException($"no {what} within {Timeout.TotalSeconds} s");
        return await task;
    }

    /// <summary>Closes the server's input (as an editor that quits would) and waits for it to stop.</summary>
    public async Task<int> CloseInputAsync()
    {
        _toServer.Dispose();
        return await WithTimeout(ServerTask, "server exit after end of input");
    }

    public async ValueTask DisposeAsync()
    {
        _toServer.Dispose();
        try { await Task.WhenAny(ServerTask, Task.Delay(Timeout)); } catch { /* the test has its verdict already */ }
        _fromServer.Dispose();
        _serverInput.Dispose();
        _clientInput.Dispose();
        try { await _reader; } catch { /* ditto */ }
    }
}
