using System.Text.Json.Nodes;

namespace WindScript.Tests.LanguageServer;

/// <summary>Diagnostics follow the text: published on open and after changes, cleared when fixed or closed.</summary>
public class DiagnosticsTests
{
    [Fact]
    public async Task Open_publishes_diagnostics_for_that_version()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor, version: 3);
        var n = await client.NextNotificationAsync("textDocument/publishDiagnostics");
        Assert.Equal(Samples.Uri, (string?)n["params"]!["uri"]);
        Assert.Equal(3, (int?)n["params"]!["version"]);
        Assert.Empty(n["params"]!["diagnostics"]!.AsArray());
    }

    [Fact]
    public async Task An_edit_into_an_error_publishes_it_with_code_severity_and_exact_range_and_the_fix_clears_it()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri, 1));

        var (line, col) = Samples.Find(Samples.FanMotor, "stack 120 mm");
        client.Change(Samples.Uri, 2, line, col + "stack 120".Length, line, col + "stack 120 mm".Length, ""); // drop " mm"
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri, 2);
        var d = Assert.Single(diagnostics)!;
        Assert.Equal("WS2010", (string?)d["code"]);
        Assert.Equal(1, (int?)d["severity"]);
        Assert.Equal("windscript", (string?)d["source"]);
        Assert.Equal(line, (int?)d["range"]!["start"]!["line"]);
        Assert.Equal(col + "stack ".Length, (int?)d["range"]!["start"]!["character"]);
        Assert.Equal(col + "stack 120".Length, (int?)d["range"]!["end"]!["character"]);

        // Put the unit back: the publication for version 3 is empty, so the error does not linger.
        client.Change(Samples.Uri, 3, line, col + "stack 120".Length, line, col + "stack 120".Length, " mm");
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri, 3));
    }

    [Fact]
    public async Task Related_information_points_at_the_first_definition()
    {
        await using var client = await LspTestClient.StartAsync();
        var text = Samples.FanMotor.Replace("let bore_d = 150 mm", "let bore_d = 150 mm\nlet n = 12");
        client.Open(Samples.Uri, text);
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri);
        var duplicate = diagnostics.Single(d => (string?)d!["code"] == "WS2002")!;
        var related = duplicate["relatedInformation"]![0]!;
        Assert.Equal(Samples.Uri, (string?)related["location"]!["uri"]);
        Assert.Equal(Samples.Find(text, "n = 11").Line, (int?)related["location"]!["range"]!["start"]!["line"]);
    }

    [Fact]
    public async Task Unused_names_are_tagged_unnecessary()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, Samples.FanMotor.Replace("let n = 11", "let spare = 3\nlet n = 11"));
        var unused = (await client.DiagnosticsAsync(Samples.Uri)).Single(d => (string?)d!["code"] == "WS2003")!;
        Assert.Equal(2, (int?)unused["severity"]);
        Assert.Equal(1, (int?)unused["tags"]![0]);
    }

    [Fact]
    public async Task Closing_a_document_clears_its_diagnostics()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let x = 1\n");
        Assert.NotEmpty(await client.DiagnosticsAsync(Samples.Uri));
        client.Notify("textDocument/didClose", LspTestClient.Doc(Samples.Uri));
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri));
    }

    [Fact]
    public async Task Several_changes_in_one_notification_apply_in_order()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let a = 1\n");
        await client.DiagnosticsAsync(Samples.Uri, 1);
        client.Notify("textDocument/didChange", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri, ["version"] = 2 },
            ["contentChanges"] = new JsonArray(
                new JsonObject { ["range"] = LspTestClient.Range(0, 4, 0, 5), ["text"] = "bb" },   // let bb = 1
                new JsonObject { ["range"] = LspTestClient.Range(0, 9, 0, 10), ["text"] = "2 mm" }, // let bb = 2 mm
                new JsonObject { ["range"] = LspTestClient.Range(1, 0, 1, 0), ["text"] = "let c = bb\n" }),
        });
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri, 2);
        // bb is now used, c is not: exactly one unused-name warning, on c in line 1.
        var unused = diagnostics.Where(d => (string?)d!["code"] == "WS2003").ToArray();
        var single = Assert.Single(unused)!;
        Assert.Equal(1, (int?)single["range"]!["start"]!["line"]);
        Assert.Equal(4, (int?)single["range"]!["start"]!["character"]);
    }

    [Fact]
    public async Task A_full_text_change_replaces_the_document()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let x = 1\n");
        Assert.NotEmpty(await client.DiagnosticsAsync(Samples.Uri, 1));
        client.ChangeAll(Samples.Uri, 2, Samples.FanMotor);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri, 2));
    }
}
