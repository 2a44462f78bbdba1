using System.Collections.Concurrent;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Threading.Channels;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Features;
using WindScript.LanguageServer.Protocol;
using WindScript.LanguageServer.Rpc;

namespace WindScript.LanguageServer;

/// <summary>
/// The WindScript language server: LSP 3.17 over a pair of streams (stdin/stdout in
/// <c>windscript lsp</c>, pipes in tests). One reader task frames and parses messages; one loop
/// handles them in order, so every request sees every change sent before it. Each message is
/// handled in isolation: a failure answers that request with a JSON-RPC error and the server
/// keeps serving. Diagnostics are published whenever the inbox is empty, for every document
/// changed since its last publication, so a burst of edits is checked once, at its end.
/// </summary>
public sealed class LanguageServer
{
    private enum State { Uninitialized, Running, ShuttingDown }

    private readonly MessageWriter _writer;
    private readonly TextWriter? _log;
    private readonly DocumentStore _documents = new();
    private readonly HashSet<string> _unpublished = new(StringComparer.Ordinal);
    // Requests read but not yet handled, by id, with whether the client has cancelled them since.
    private readonly ConcurrentDictionary<string, bool> _queued = new(StringComparer.Ordinal);
    private readonly Channel<Incoming> _inbox = Channel.CreateUnbounded<Incoming>(new UnboundedChannelOptions { SingleReader = true, SingleWriter = true });
    private readonly Dictionary<string, Func<JsonObject, JsonNode?>> _requests;
    private readonly Dictionary<string, Action<JsonObject>> _notifications;
    private State _state = State.Uninitialized;
    private ClientCapabilities _client = ClientCapabilities.Default;

    private readonly record struct Incoming(JsonNode? Message, string? Error);

    private LanguageServer(Stream output, TextWriter? log)
    {
        _writer = new MessageWriter(output);
        _log = log;
        _requests = new(StringComparer.Ordinal)
        {
            ["initialize"] = Initialize,
            ["shutdown"] = _ => { _state = State.ShuttingDown; return null; },
            ["textDocument/hover"] = p => WithDocument(p, d => Hover.Handle(d, p, _client)),
            ["textDocument/definition"] = p => WithDocument(p, d => Navigation.Definition(d, p)),
            ["textDocument/references"] = p => WithDocument(p, d => Navigation.References(d, p)),
            ["textDocument/documentHighlight"] = p => WithDocument(p, d => Navigation.Highlights(d, p)),
            ["textDocument/documentSymbol"] = p => WithDocument(p, d => DocumentSymbols.Handle(d, _client)),
            ["textDocument/formatting"] = p => WithDocument(p, DocumentFormatting.Handle),
            ["textDocument/completion"] = p => WithDocument(p, d => Completion.Handle(d, p)),
            ["textDocument/codeAction"] = p => WithDocument(p, d => CodeActions.Handle(d, p)),
            ["textDocument/semanticTokens/full"] = p => WithDocument(p, SemanticTokens.Handle),
            ["textDocument/prepareRename"] = p => WithDocument(p, d => Rename.Prepare(d, p)),
            ["textDocument/rename"] = p => WithDocument(p, d => Rename.Handle(d, p)),
        };
        _notifications = new(StringComparer.Ordinal)
        {
            ["initialized"] = _ => { },
            ["textDocument/didOpen"] = DidOpen,
            ["textDocument/didChange"] = DidChange,
            ["textDocument/didClose"] = DidClose,
            ["textDocument/didSave"] = _ => { },
        };
    }

    /// <summary>
    /// Serves until the client sends 'exit' or closes the input. Returns the process exit code
    /// LSP asks for: 0 if 'shutdown' came before the end, 1 otherwise.
    /// </summary>
    public static Task<int> RunAsync(Stream input, Stream output, TextWriter? log = null, CancellationToken cancel = default) =>
        RunAsync(input, output, log, extraRequests: null, cancel);

    /// <summary>As above, with extra request handlers (tests use one that throws, to check isolation).</summary>
    internal static Task<int> RunAsync(Stream input, Stream output, TextWriter? log,
        IReadOnlyDictionary<string, Func<JsonObject, JsonNode?>>? extraRequests, CancellationToken cancel)
    {
        var server = new LanguageServer(output, log);
        foreach (var (method, handler) in extraRequests ?? new Dictionary<string, Func<JsonObject, JsonNode?>>())
            server._requests[method] = handler;
        _ = Task.Run(() => server.ReadAllAsync(input, cancel), CancellationToken.None);
        // The parser recurses per nested bracket and a stack overflow would end the process:
        // handle messages on a thread with a generous stack (the core bounds nesting: SyntaxTree.MaxNesting).
        var exit = new TaskCompletionSource<int>(TaskCreationOptions.RunContinuationsAsynchronously);
        var thread = new Thread(() =>
        {
            try { exit.SetResult(server.Serve(cancel)); }
            catch (Exception e) { exit.SetException(e); }
        }, HandlerStackBytes) { IsBackground = true, Name = "windscript-lsp" };
        thread.Start();
        return exit.Task;
    }

    private const int HandlerStackBytes = 64 * 1024 * 1024;

    // ---- transport ----------------------------------------------------------------------------

    private async Task ReadAllAsync(Stream input, CancellationToken cancel)
    {
        var reader = new MessageReader(input);
        try
        {
            while (await reader.ReadAsync(cancel) is { } frame)
            {
                if (frame.Body is null)
                {
                    _inbox.Writer.TryWrite(new Incoming(null, frame.Error));
                    continue;
                }
                JsonNode? message;
                try
                {
                    message = JsonNode.Parse(frame.Body);
                }
                catch (JsonException e)
                {
                    _inbox.Writer.TryWrite(new Incoming(null, $"the message is not valid JSON: {e.Message}"));
                    continue;
                }
                // Cancellation is noted on arrival, so a request still waiting in the inbox is skipped;
                // cancelling one already answered (editors do that often) leaves nothing behind.
                if (message is JsonObject o)
                {
                    if (MethodOf(o) == "$/cancelRequest" && o["params"]?["id"] is JsonValue cancelled)
                        _queued.TryUpdate(IdKey(cancelled), true, false);
                    else if (o["id"] is JsonValue id && MethodOf(o) is not null)
                        _queued[IdKey(id)] = false;
                }
                _inbox.Writer.TryWrite(new Incoming(message, null));
            }
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException or OperationCanceledException)
        {
            // The client went away: treat it as the end of the input.
        }
        finally
        {
            _inbox.Writer.TryComplete();
        }
    }

    private int Serve(CancellationToken cancel)
    {
        try
        {
            while (_inbox.Reader.WaitToReadAsync(cancel).AsTask().GetAwaiter().GetResult())
            {
                while (_inbox.Reader.TryRead(out var incoming))
                {
                    if (Handle(incoming) is { } exitCode) return exitCode;
                }
                PublishPendingDiagnostics();
            }
        }
        catch (OperationCanceledException) when (cancel.IsCancellationRequested)
        {
        }
        return _state == State.ShuttingDown ? 0 : 1;
    }

    // ---- dispatch -------------------------------------------------------------------------------

    /// <summary>Handles one message; returns an exit code when the server must stop.</summary>
    private int? Handle(Incoming incoming)
    {
        if (incoming.Error is { } error)
        {
            Log($"unreadable message: {error}");
            TrySend(() => _writer.RespondError(null, RpcErrorCodes.ParseError, error));
            return null;
        }
        if (incoming.Message is not JsonObject message)
        {
            TrySend(() => _writer.RespondError(null, RpcErrorCodes.InvalidRequest, "a JSON-RPC message must be an object"));
            return null;
        }
        var method = MethodOf(message);
        bool isRequest = message.ContainsKey("id");
        var id = message["id"];
        if (method is null)
        {
            // A response to a request of ours (this server sends none), or garbage.
            if (!isRequest || !(message.ContainsKey("result") || message.ContainsKey("error")))
                TrySend(() => _writer.RespondError(id is JsonValue ? id : null, RpcErrorCodes.InvalidRequest, "a JSON-RPC message needs a 'method'"));
            return null;
        }
        if (isRequest && !IsValidId(id))
        {
            if (id is not null) _queued.TryRemove(IdKey(id), out _);
            TrySend(() => _writer.RespondError(null, RpcErrorCodes.InvalidRequest, "a request id must be a string or a number"));
            return null;
        }
        var parameters = message["params"] as JsonObject ?? [];
        return isRequest ? HandleRequest(id!, method, parameters) : HandleNotification(method, parameters);
    }

    private int? HandleRequest(JsonNode id, string method, JsonObject parameters)
    {
        if (_queued.TryRemove(IdKey(id), out bool cancelled) && cancelled)
        {
            TrySend(() => _writer.RespondError(id, RpcErrorCodes.RequestCancelled, "the request was cancelled"));
            return null;
        }
        if (_state == State.Uninitialized && method != "initialize")
        {
            TrySend(() => _writer.RespondError(id, RpcErrorCodes.ServerNotInitialized, "the server has not been initialized"));
            return null;
        }
        if (_state == State.ShuttingDown)
        {
            TrySend(() => _writer.RespondError(id, RpcErrorCodes.InvalidRequest, "the server is shutting down"));
            return null;
        }
        if (!_requests.TryGetValue(method, out var handler))
        {
            TrySend(() => _writer.RespondError(id, RpcErrorCodes.MethodNotFound, $"unknown method '{method}'"));
            return null;
        }
        JsonNode? result;
        try
        {
            result = handler(parameters);
        }
        catch (RpcException e)
        {
            TrySend(() => _writer.RespondError(id, e.Code, e.Message));
            return null;
        }
        catch (Exception e)
        {
            Log($"{method} failed: {e.GetType().Name}: {e.Message}");
            TrySend(() => _writer.RespondError(id, RpcErrorCodes.InternalError, $"{method} failed: {e.GetType().Name}: {e.Message}"));
            return null;
        }
        TrySend(() => _writer.Respond(id, result));
        return null;
    }

    private int? HandleNotification(string method, JsonObject parameters)
    {
        if (method == "exit") return _state == State.ShuttingDown ? 0 : 1;
        if (_state == State.Uninitialized || !_notifications.TryGetValue(method, out var handler)) return null; // dropped, as LSP says
        try
        {
            handler(parameters);
        }
        catch (Exception e)
        {
            Log($"{method} failed: {(e is RpcException ? e.Message : $"{e.GetType().Name}: {e.Message}")}");
        }
        return null;
    }

    private static string? MethodOf(JsonObject message) =>
        message["method"] is JsonValue m && m.GetValueKind() == JsonValueKind.String ? m.GetValue<string>() : null;

    private static bool IsValidId(JsonNode? id) =>
        id is JsonValue v && v.GetValueKind() is JsonValueKind.String or JsonValueKind.Number;

    private static string IdKey(JsonNode id) => id.ToJsonString();

    private JsonNode? WithDocument(JsonObject parameters, Func<Document, JsonNode?> handler) =>
        _documents.Find(Json.DocumentUri(parameters)) is { } document ? handler(document) : null;

    // ---- lifecycle and text synchronisation -----------------------------------------------------

    private JsonNode? Initialize(JsonObject parameters)
    {
        if (_state != State.Uninitialized) throw new RpcException(RpcErrorCodes.InvalidRequest, "initialize was already received");
        _client = ClientCapabilities.From(parameters["capabilities"]);
        _state = State.Running;
        return ServerCapabilities.InitializeResult();
    }

    private void DidOpen(JsonObject parameters)
    {
        var item = Json.Object(parameters["textDocument"], "textDocument");
        var document = _documents.Open(Json.String(item, "uri"), Json.TryInt(item, "version") ?? 0, Json.String(item, "text"));
        _unpublished.Add(document.Uri);
    }

    private void DidChange(JsonObject parameters)
    {
        var item = Json.Object(parameters["textDocument"], "textDocument");
        var uri = Json.String(item, "uri");
        if (_documents.Find(uri) is not { } document)
        {
            Log($"didChange for a document that is not open: {uri}");
            return;
        }
        var changes = parameters["contentChanges"] as JsonArray ?? throw new RpcException(RpcErrorCodes.InvalidParams, "'contentChanges' must be an array");
        document.Update(Json.TryInt(item, "version") ?? document.Version + 1, TextChanges.Apply(document.Text, changes));
        _unpublished.Add(uri);
    }

    private void DidClose(JsonObject parameters)
    {
        var uri = Json.DocumentUri(parameters);
        _documents.Close(uri);
        _unpublished.Remove(uri);
        // Diagnostics of a closed file must not linger in the client.
        TrySend(() => _writer.Notify("textDocument/publishDiagnostics", new JsonObject { ["uri"] = uri, ["diagnostics"] = new JsonArray() }));
    }

    private void PublishPendingDiagnostics()
    {
        if (_unpublished.Count == 0) return;
        foreach (var uri in _unpublished.ToArray())
        {
            _unpublished.Remove(uri);
            if (_documents.Find(uri) is not { } document || document.PublishedVersion == document.Version) continue;
            JsonNode notification;
            try
            {
                notification = DiagnosticConverter.Publication(document);
            }
            catch (Exception e)
            {
                Log(e is RpcException ? $"{uri}: {e.Message}" : $"checking {uri} failed: {e.GetType().Name}: {e.Message}");
                notification = DiagnosticConverter.Failure(document, e);
            }
            document.PublishedVersion = document.Version;
            TrySend(() => _writer.Notify("textDocument/publishDiagnostics", notification));
            // Stop early if the client sent more while this document was checked.
            if (_inbox.Reader.TryPeek(out _)) break;
        }
    }

    // ---- output -----------------------------------------------------------------------------------

    private void TrySend(Action send)
    {
        try
        {
            send();
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException)
        {
            // The client closed its end; the reader will see the end of input and stop the loop.
        }
    }

    private void Log(string message)
    {
        _log?.WriteLine($"windscript lsp: {message}");
        if (_state == State.Running)
            TrySend(() => _writer.Notify("window/logMessage", new JsonObject { ["type"] = 1, ["message"] = message }));
    }
}
