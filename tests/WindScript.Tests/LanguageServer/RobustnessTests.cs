using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Rpc;

namespace WindScript.Tests.LanguageServer;

/// <summary>The server survives what real editors and broken clients send: floods, huge files, junk.</summary>
public class RobustnessTests
{
    [Fact]
    public async Task A_fast_stream_of_edits_ends_with_diagnostics_for_the_final_text()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor);
        await client.DiagnosticsAsync(Samples.Uri, 1);
        // Type "let spare = 1" one character at a time at the end of line 0, then delete it again, then type it once more:
        // 39 edits sent without waiting for anything.
        var (line, _) = Samples.Find(Samples.FanMotor, "let bore_d");
        const string typed = "\nlet spare = 1";
        int version = 1;
        int col = "let bore_d = 150 mm".Length;
        for (int round = 0; round < 3; round++)
        {
            if (round == 1)
            {
                client.Change(Samples.Uri, ++version, line, col, line + 1, "let spare = 1".Length, "");
                continue;
            }
            int c = col, l = line;
            foreach (char ch in typed)
            {
                client.Change(Samples.Uri, ++version, l, c, l, c, ch.ToString());
                if (ch == '\n') { l++; c = 0; } else c++;
            }
        }
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri, version);
        var unused = Assert.Single(diagnostics)!;
        Assert.Equal("WS2003", (string?)unused["code"]);
        Assert.Equal(line + 1, (int?)unused["range"]!["start"]!["line"]);
        // and it still answers requests about the final text
        var hover = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, line + 1, 5));
        Assert.Contains("let spare = 1", (string?)hover!["contents"]!["value"]);
    }

    [Fact]
    public async Task Thousands_of_edits_sent_at_once_are_all_applied()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let x = 0\n");
        await client.DiagnosticsAsync(Samples.Uri, 1);
        var frames = new StringBuilder();
        for (int v = 2; v <= 3001; v++)
        {
            // Each edit replaces the number with the version: only the last one survives.
            var change = new JsonObject
            {
                ["jsonrpc"] = "2.0",
                ["method"] = "textDocument/didChange",
                ["params"] = new JsonObject
                {
                    ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri, ["version"] = v },
                    ["contentChanges"] = new JsonArray(new JsonObject { ["text"] = $"let x = {v} mm\nlet y = x + 1\n" }),
                },
            }.ToJsonString();
            frames.Append($"Content-Length: {Encoding.UTF8.GetByteCount(change)}\r\n\r\n{change}");
        }
        client.SendRaw(frames.ToString());
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri, 3001);
        // 'x + 1' adds a plain number to a length: exactly one arithmetic error on the final text.
        Assert.Contains(diagnostics, d => (string?)d!["code"] == "WS2016");
        var hover = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 0, 4));
        Assert.Contains("3001 mm", (string?)hover!["contents"]!["value"]);
    }

    [Fact]
    public async Task A_huge_document_is_checked_and_the_server_stays_responsive()
    {
        await using var client = await LspTestClient.StartAsync();
        var text = new StringBuilder(Samples.FanMotor);
        for (int i = 0; i < 10_000; i++) text.Append("# filler line ").Append(i).Append(" with a comment that is about seventy characters long\n");
        for (int i = 0; i < 5_000; i++) text.Append("let v").Append(i).Append(" = ").Append(i).Append(" mm\n"); // 5,000 unused-name warnings
        Assert.True(text.Length is > 800_000 and <= InputLimits.MaxFileBytes);
        client.Open(Samples.Uri, text.ToString());
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri);
        Assert.Equal(5_000, diagnostics.Count);
        var symbols = (await client.ResultAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri)))!.AsArray();
        Assert.Equal(5_000 + 6, symbols.Count);
        Assert.Null((await client.RequestAsync("shutdown", null))["error"]);
    }

    [Fact]
    public async Task Junk_frames_and_junk_bytes_do_not_stop_the_server()
    {
        await using var client = await LspTestClient.StartAsync();
        var random = new Random(7);
        for (int i = 0; i < 50; i++)
        {
            var junk = new byte[random.Next(1, 200)];
            random.NextBytes(junk);
            client.SendRaw([.. Encoding.ASCII.GetBytes($"Content-Length: {junk.Length}\r\n\r\n"), .. junk]);
        }
        client.SendBody("null");
        client.SendBody("\"a string\"");
        client.SendBody("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":42}}");
        client.SendBody("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didChange\",\"params\":{\"textDocument\":{\"uri\":\"file:///x\"},\"contentChanges\":7}}");
        client.SendRaw("\r\n\r\nthis is not a header\r\n\r\n");
        var ok = await client.RequestAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri));
        Assert.Null(ok["error"]);
        client.Open(Samples.Uri, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri));
        Assert.Equal(0, await client.ShutdownAndExitAsync());
    }

    [Theory]
    [InlineData(60)]       // deep but checked: within the core's bound
    [InlineData(200_000)]  // would overflow the stack of a recursive parser: refused with one diagnostic
    public async Task Deeply_nested_brackets_never_crash_the_server(int depth)
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let a = " + new string('(', depth) + "1" + new string(')', depth) + "\n");
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri);
        if (depth > WindScript.Syntax.SyntaxTree.MaxNesting)
        {
            var only = Assert.Single(diagnostics)!;
            Assert.Equal("WS1003", (string?)only["code"]);
            var hover = await client.RequestAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 0, 4));
            Assert.Null(hover["error"]); // answered (with nothing to show), not failed
        }
        else
        {
            Assert.Contains(diagnostics, d => (string?)d!["code"] == "WS2003"); // 'a' unused: the file was checked
        }
        client.ChangeAll(Samples.Uri, 2, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri, 2));
        Assert.Equal(0, await client.ShutdownAndExitAsync());
    }

    [Fact]
    public async Task The_reader_reports_bad_headers_and_reads_on()
    {
        var bytes = Encoding.ASCII.GetBytes("Content-Length: 2\r\nX-Other: 1\r\n\r\n{}garbage-without-colon\r\n\r\nContent-Length: 2\n\n[]");
        var reader = new MessageReader(new MemoryStream(bytes));
        var first = await reader.ReadAsync();
        Assert.Equal("{}", Encoding.UTF8.GetString(first!.Value.Body!));
        var second = await reader.ReadAsync();
        Assert.Null(second!.Value.Body);
        Assert.Contains("not 'Name: value'", second.Value.Error);
        var third = await reader.ReadAsync();
        Assert.Equal("[]", Encoding.UTF8.GetString(third!.Value.Body!)); // bare \n line ends are tolerated
        Assert.Null(await reader.ReadAsync());
    }
}
