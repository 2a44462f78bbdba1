using System.Text.Json.Nodes;
using WindScript.LanguageServer.Rpc;

namespace WindScript.Tests.LanguageServer;

/// <summary>The JSON-RPC and LSP lifecycle rules (JSON-RPC 2.0 spec; LSP 3.17 "Base Protocol" and "Lifecycle Messages").</summary>
public class ProtocolTests
{
    [Fact]
    public async Task Initialize_announces_utf16_incremental_sync_and_the_features()
    {
        await using var client = new LspTestClient();
        var response = await client.InitializeAsync();
        var caps = response["result"]!["capabilities"]!;
        Assert.Equal("utf-16", (string?)caps["positionEncoding"]);
        Assert.Equal(2, (int?)caps["textDocumentSync"]!["change"]);
        Assert.True((bool?)caps["textDocumentSync"]!["openClose"]);
        foreach (var feature in new[] { "hoverProvider", "definitionProvider", "referencesProvider", "documentSymbolProvider", "documentFormattingProvider" })
            Assert.True((bool?)caps[feature], feature);
        Assert.NotNull(caps["completionProvider"]);
        Assert.Equal("quickfix", (string?)caps["codeActionProvider"]!["codeActionKinds"]![0]);
        Assert.Equal("windscript", (string?)response["result"]!["serverInfo"]!["name"]);
    }

    [Fact]
    public async Task Requests_before_initialize_are_refused_with_ServerNotInitialized()
    {
        await using var client = new LspTestClient();
        var response = await client.RequestAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 0, 0));
        Assert.Equal(RpcErrorCodes.ServerNotInitialized, (int?)response["error"]!["code"]);
        // and initialize still works afterwards
        var init = await client.InitializeAsync();
        Assert.NotNull(init["result"]);
    }

    [Fact]
    public async Task Initialize_twice_is_an_invalid_request()
    {
        await using var client = await LspTestClient.StartAsync();
        var again = await client.RequestAsync("initialize", new JsonObject { ["capabilities"] = new JsonObject() });
        Assert.Equal(RpcErrorCodes.InvalidRequest, (int?)again["error"]!["code"]);
    }

    [Fact]
    public async Task Unknown_method_gets_MethodNotFound_and_the_server_keeps_serving()
    {
        await using var client = await LspTestClient.StartAsync();
        var response = await client.RequestAsync("textDocument/noSuchThing", new JsonObject());
        Assert.Equal(RpcErrorCodes.MethodNotFound, (int?)response["error"]!["code"]);
        client.Notify("$/noSuchNotification", new JsonObject()); // ignored, no answer
        client.Open(Samples.Uri, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri));
    }

    [Fact]
    public async Task String_ids_are_echoed_back()
    {
        await using var client = await LspTestClient.StartAsync();
        var response = await client.RequestWithIdAsync("abc-1", "shutdown", null);
        Assert.Equal("abc-1", (string?)response["id"]);
        Assert.True(response.ContainsKey("result"));
        Assert.Null(response["result"]);
    }

    [Fact]
    public async Task Malformed_json_gets_a_ParseError_with_a_null_id_and_the_server_carries_on()
    {
        await using var client = await LspTestClient.StartAsync();
        var pending = client.ExpectAsync(null, "parse error response");
        client.SendBody("{\"jsonrpc\":\"2.0\",\"id\":7,\"method\":"); // cut short
        var error = await pending;
        Assert.Equal(RpcErrorCodes.ParseError, (int?)error["error"]!["code"]);
        Assert.Null(error["id"]);
        // Then a valid request is still answered.
        var ok = await client.RequestAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri));
        Assert.Null(ok["error"]);
    }

    [Fact]
    public async Task Bad_frames_are_reported_and_skipped()
    {
        await using var client = await LspTestClient.StartAsync();
        var pending = client.ExpectAsync(null, "frame error");
        client.SendRaw("Content-Length: twelve\r\n\r\n");
        var error = await pending;
        Assert.Equal(RpcErrorCodes.ParseError, (int?)error["error"]!["code"]);
        var ok = await client.RequestAsync("shutdown", null);
        Assert.Null(ok["error"]);
    }

    [Theory]
    [InlineData("[1,2,3]")]
    [InlineData("{\"jsonrpc\":\"2.0\",\"id\":5}")]
    [InlineData("{\"jsonrpc\":\"2.0\",\"id\":{\"x\":1},\"method\":\"shutdown\"}")]
    public async Task Messages_that_are_not_requests_get_InvalidRequest(string body)
    {
        await using var client = await LspTestClient.StartAsync();
        var id = JsonNode.Parse(body) is JsonObject o && o["id"] is JsonValue v ? v.DeepClone() : null;
        var pending = client.ExpectAsync(id, "invalid request error");
        client.SendBody(body);
        var response = await pending;
        Assert.Equal(RpcErrorCodes.InvalidRequest, (int?)response["error"]!["code"]);
    }

    [Fact]
    public async Task Wrongly_typed_params_give_InvalidParams_not_a_crash()
    {
        await using var client = await LspTestClient.StartAsync();
        var response = await client.RequestAsync("textDocument/hover", new JsonObject { ["textDocument"] = "not an object" });
        Assert.Equal(RpcErrorCodes.InvalidParams, (int?)response["error"]!["code"]);
        client.Open(Samples.Uri, Samples.FanMotor);
        var missingPosition = await client.RequestAsync("textDocument/hover", LspTestClient.Doc(Samples.Uri));
        Assert.Equal(RpcErrorCodes.InvalidParams, (int?)missingPosition["error"]!["code"]);
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
    }

    [Fact]
    public async Task A_handler_that_throws_answers_with_InternalError_and_the_server_keeps_serving()
    {
        var faulty = new Dictionary<string, Func<JsonObject, JsonNode?>> { ["test/explode"] = _ => throw new InvalidOperationException("boom") };
        await using var client = new LspTestClient(faulty);
        await client.InitializeAsync();
        var response = await client.RequestAsync("test/explode", new JsonObject());
        Assert.Equal(RpcErrorCodes.InternalError, (int?)response["error"]!["code"]);
        Assert.Contains("boom", (string?)response["error"]!["message"]);
        client.Open(Samples.Uri, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri));
        Assert.Equal(0, await client.ShutdownAndExitAsync());
    }

    [Fact]
    public async Task Requests_for_documents_never_opened_get_empty_answers()
    {
        await using var client = await LspTestClient.StartAsync();
        const string other = "file:///nowhere/never_opened.wind";
        Assert.Null(await client.ResultAsync("textDocument/hover", LspTestClient.At(other, 1, 1)));
        Assert.Null(await client.ResultAsync("textDocument/definition", LspTestClient.At(other, 1, 1)));
        Assert.Null(await client.ResultAsync("textDocument/formatting", LspTestClient.Doc(other)));
        Assert.Null(await client.ResultAsync("textDocument/completion", LspTestClient.At(other, 0, 0)));
        // A change to it is ignored (logged), not fatal.
        client.ChangeAll(other, 2, "let x = 1");
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
    }

    [Fact]
    public async Task Shutdown_then_exit_ends_with_code_0_and_refuses_requests_in_between()
    {
        await using var client = await LspTestClient.StartAsync();
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
        var late = await client.RequestAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 0, 0));
        Assert.Equal(RpcErrorCodes.InvalidRequest, (int?)late["error"]!["code"]);
        client.Notify("exit", null);
        Assert.Equal(0, await client.ServerTask.WaitAsync(LspTestClient.Timeout));
    }

    [Fact]
    public async Task Exit_without_shutdown_ends_with_code_1()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Notify("exit", null);
        Assert.Equal(1, await client.ServerTask.WaitAsync(LspTestClient.Timeout));
    }

    [Fact]
    public async Task End_of_input_stops_the_server()
    {
        var client = new LspTestClient();
        await client.InitializeAsync();
        Assert.Equal(1, await client.CloseInputAsync());
        await client.DisposeAsync();
    }

    [Fact]
    public async Task A_request_cancelled_before_it_is_handled_gets_RequestCancelled()
    {
        await using var client = await LspTestClient.StartAsync();
        // Queue a slow burst, a request, and its cancellation in one write so both arrive before the request is handled.
        var big = string.Concat(Enumerable.Repeat("let a = 1\n", 20000));
        client.Open("file:///big.wind", big);
        var request = new JsonObject { ["jsonrpc"] = "2.0", ["id"] = 99, ["method"] = "textDocument/documentSymbol", ["params"] = LspTestClient.Doc("file:///big.wind") }.ToJsonString();
        var cancel = new JsonObject { ["jsonrpc"] = "2.0", ["method"] = "$/cancelRequest", ["params"] = new JsonObject { ["id"] = 99 } }.ToJsonString();
        var pending = client.ExpectAsync(99, "cancelled response");
        client.SendRaw(Frame(request) + Frame(cancel));
        var response = await pending;
        // Either it was cancelled in time, or it had already been answered: both are valid, but never a crash.
        if (response["error"] is { } error) Assert.Equal(RpcErrorCodes.RequestCancelled, (int?)error["code"]);
        else Assert.NotNull(response["result"]);
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
    }

    [Fact]
    public async Task Cancelling_an_answered_request_leaves_nothing_behind()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor);
        var first = await client.RequestWithIdAsync(42, "textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri));
        Assert.Null(first["error"]);
        client.Notify("$/cancelRequest", new JsonObject { ["id"] = 42 }); // too late: already answered
        // A later request with the same id is answered normally, not taken as cancelled.
        var again = await client.RequestWithIdAsync(42, "textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri));
        Assert.Null(again["error"]);
    }

    private static string Frame(string body) => $"Content-Length: {System.Text.Encoding.UTF8.GetByteCount(body)}\r\n\r\n{body}";
}
