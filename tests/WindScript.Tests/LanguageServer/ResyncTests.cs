using System.IO.Pipes;
using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.LanguageServer.Rpc;
using WindScript.Text;

namespace WindScript.Tests.LanguageServer;

/// <summary>
/// Issue 13, finding 3: after one bad frame the server answered none of the next requests, and a
/// position at character 2^31 - 1 overflowed. Now it resynchronises at the next header, and a
/// character past the end of a line means the end of the line (LSP 3.17, "Position").
/// </summary>
public sealed class ResyncTests
{
    private static string Body(int id) => new JsonObject { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = "textDocument/documentSymbol", ["params"] = LspTestClient.Doc(Samples.Uri) }.ToJsonString();

    private static string Frame(string body, int lengthError = 0) => $"Content-Length: {Encoding.UTF8.GetByteCount(body) + lengthError}\r\n\r\n{body}";

    private static async Task AssertTheNextTenRequestsAreAnswered(LspTestClient client, string badFrame)
    {
        var ids = Enumerable.Range(100, 10).ToArray();
        var answers = ids.Select(id => client.ExpectAsync(id, $"answer {id}")).ToArray();
        client.SendRaw(badFrame + string.Concat(ids.Select(id => Frame(Body(id)))));
        foreach (var answer in answers)
        {
            var response = await answer;
            Assert.Null(response["error"]);
            Assert.NotNull(response["result"]);
        }
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
    }

    [Fact]
    public async Task After_a_frame_without_Content_Length_the_next_requests_are_answered()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor);
        await AssertTheNextTenRequestsAreAnswered(client, "Content-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n" + Body(1));
    }

    [Theory]
    [InlineData(10)]
    [InlineData(-10)]
    [InlineData(1)]
    [InlineData(-1)]
    public async Task After_a_Content_Length_that_is_off_the_next_requests_are_answered(int error)
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor);
        await AssertTheNextTenRequestsAreAnswered(client, Frame(Body(1), error));
    }

    [Fact]
    public async Task A_reader_hands_back_the_bytes_past_a_complete_body()
    {
        var bytes = Encoding.UTF8.GetBytes(Frame("{\"a\":1}", 10) + Frame("{\"b\":2}"));
        var reader = new MessageReader(new MemoryStream(bytes));
        var first = await reader.ReadAsync();
        Assert.Equal("{\"a\":1}", Encoding.UTF8.GetString(first!.Value.Body!));
        var second = await reader.ReadAsync();
        Assert.Equal("{\"b\":2}", Encoding.UTF8.GetString(second!.Value.Body!));
        Assert.Null(await reader.ReadAsync());
    }

    [Fact]
    public async Task A_body_that_mentions_a_header_name_is_read_whole()
    {
        // A winding whose comment says Content-Length: the body is one valid JSON value, so nothing is cut.
        string body = "{\"text\":\"# Content-Length: 5\\r\\n\\r\\n\"}";
        var reader = new MessageReader(new MemoryStream(Encoding.UTF8.GetBytes(Frame(body))));
        Assert.Equal(body, Encoding.UTF8.GetString((await reader.ReadAsync())!.Value.Body!));
    }

    [Theory]
    [InlineData(int.MaxValue)]
    [InlineData(int.MaxValue - 1)]
    [InlineData(1000)]
    public void A_character_past_the_end_of_a_line_means_its_end(int character)
    {
        var source = new SourceText("abc\r\ndef\n");
        Assert.Equal(3, Positions.ToOffset(source, 0, character));
        Assert.Equal(8, Positions.ToOffset(source, 1, character));
    }

    [Fact]
    public void An_edit_at_character_2_pow_31_minus_1_applies_at_the_end_of_the_line()
    {
        var changes = new JsonArray(new JsonObject
        {
            ["range"] = LspTestClient.Range(0, int.MaxValue, 0, int.MaxValue),
            ["text"] = " mm",
        });
        Assert.Equal("let x = 5 mm\nlet y = 2\n", TextChanges.Apply("let x = 5\nlet y = 2\n", changes));
    }

    [Fact]
    public async Task A_failing_request_logs_one_line_without_a_stack_trace()
    {
        var log = new StringWriter();
        using var toServer = new AnonymousPipeServerStream(PipeDirection.Out);
        using var fromServer = new AnonymousPipeServerStream(PipeDirection.In);
        using var serverIn = new AnonymousPipeClientStream(PipeDirection.In, toServer.ClientSafePipeHandle);
        using var serverOut = new AnonymousPipeClientStream(PipeDirection.Out, fromServer.ClientSafePipeHandle);
        var extra = new Dictionary<string, Func<JsonObject, JsonNode?>> { ["test/fail"] = _ => throw new InvalidOperationException("boom") };
        var run = WindScript.LanguageServer.LanguageServer.RunAsync(serverIn, serverOut, log, extra, CancellationToken.None);
        var drain = fromServer.CopyToAsync(Stream.Null);
        string Request(int id, string method) => Frame(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = method, ["params"] = new JsonObject() }.ToJsonString());
        var bytes = Encoding.UTF8.GetBytes(Request(1, "initialize") + Request(2, "test/fail") + Request(3, "shutdown")
            + Frame("{\"jsonrpc\":\"2.0\",\"method\":\"exit\"}"));
        await toServer.WriteAsync(bytes);
        await toServer.FlushAsync();
        await run.WaitAsync(TimeSpan.FromSeconds(20));
        string text = log.ToString();
        Assert.Contains("test/fail failed: InvalidOperationException: boom", text);
        Assert.DoesNotContain("   at ", text);
    }
}
