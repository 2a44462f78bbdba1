namespace WindScript.Tests.LanguageServer;

/// <summary>
/// LSP positions count UTF-16 code units (LSP 3.17, "Text Documents": position encoding
/// utf-16). Expected columns here are counted by hand: a tab is one unit, 'ö' and 'ß' one each,
/// '😀' (U+1F600, outside the BMP) two.
/// </summary>
public class PositionTests
{
    [Fact]
    public async Task Diagnostic_columns_count_utf16_units_after_tabs_and_non_ascii()
    {
        await using var client = await LspTestClient.StartAsync();
        const string text = "# Lüfter für Öl — 😀 test\n\tlet größe = 3\n\tlet 😀 = 1\n";
        client.Open(Samples.Uri, text);
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri);

        var unused = diagnostics.First(d => (string?)d!["code"] == "WS2003")!;
        Assert.Equal(1, (int?)unused["range"]!["start"]!["line"]);
        Assert.Equal(5, (int?)unused["range"]!["start"]!["character"]);   // "\tlet " = 5 units
        Assert.Equal(10, (int?)unused["range"]!["end"]!["character"]);    // "größe" = 5 units

        var bad = diagnostics.First(d => (string?)d!["code"] == "WS1001")!;
        Assert.Equal(2, (int?)bad["range"]!["start"]!["line"]);
        Assert.Equal(5, (int?)bad["range"]!["start"]!["character"]);
        Assert.Equal(7, (int?)bad["range"]!["end"]!["character"]);        // the emoji is two units wide
    }

    [Fact]
    public async Task Incremental_edits_address_text_after_surrogate_pairs_in_utf16_units()
    {
        await using var client = await LspTestClient.StartAsync();
        const string text = "# 😀😀 x\nlet a = 1\n";
        client.Open(Samples.Uri, text);
        await client.DiagnosticsAsync(Samples.Uri, 1);
        // Units 2..6 are the two emoji; replace them by "ab". Counting code points would cut elsewhere.
        client.Change(Samples.Uri, 2, 0, 2, 0, 6, "ab");
        await client.DiagnosticsAsync(Samples.Uri, 2);
        // Format to read the server's text back: the comment line must now read "# ab x".
        client.ChangeAll(Samples.Uri, 3, "# 😀😀 x\nlet   a = 1\n");
        client.Change(Samples.Uri, 4, 0, 2, 0, 6, "ab");
        var edits = (await client.ResultAsync("textDocument/formatting", LspTestClient.Doc(Samples.Uri)))!.AsArray();
        var edit = Assert.Single(edits)!;
        Assert.Equal(1, (int?)edit["range"]!["start"]!["line"]);
        var hover = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 1, 6));
        Assert.Contains("let   a = 1", (string?)hover!["contents"]!["value"]);
        var definition = await client.ResultAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri));
        Assert.Equal(1, (int?)definition![0]!["range"]!["start"]!["line"]);
    }

    [Fact]
    public async Task Hover_and_definition_find_names_after_tabs_and_non_ascii_letters()
    {
        await using var client = await LspTestClient.StartAsync();
        const string text = "\tlet größe = 3 mm # Maß\n\tlet b = größe + größe # 😀 ok\n\tlet c = b\n";
        client.Open(Samples.Uri, text);
        await client.DiagnosticsAsync(Samples.Uri);
        // Second 'größe' on line 1: "\tlet b = größe + " is 17 units.
        var definition = await client.ResultAsync("textDocument/definition", LspTestClient.At(Samples.Uri, 1, 19));
        Assert.Equal(0, (int?)definition!["range"]!["start"]!["line"]);
        Assert.Equal(5, (int?)definition["range"]!["start"]!["character"]);
        Assert.Equal(10, (int?)definition["range"]!["end"]!["character"]);
        var references = (await client.ResultAsync("textDocument/references", new System.Text.Json.Nodes.JsonObject
        {
            ["textDocument"] = new System.Text.Json.Nodes.JsonObject { ["uri"] = Samples.Uri },
            ["position"] = LspTestClient.Position(0, 6),
            ["context"] = new System.Text.Json.Nodes.JsonObject { ["includeDeclaration"] = false },
        }))!.AsArray();
        Assert.Equal([9, 17], references.Select(r => (int)r!["range"]!["start"]!["character"]!).Order());
        var hover = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 1, 19));
        Assert.Equal(17, (int?)hover!["range"]!["start"]!["character"]);
        Assert.Contains("3 mm", (string?)hover["contents"]!["value"]);
    }

    [Fact]
    public async Task Positions_past_the_end_of_a_line_or_file_are_clamped()
    {
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, "let a = 1\nlet b = a\n");
        await client.DiagnosticsAsync(Samples.Uri);
        // Character 500 on line 0 means the end of line 0 (not line 1): appending there edits line 0.
        client.Change(Samples.Uri, 2, 0, 500, 0, 500, " mm");
        var diagnostics = await client.DiagnosticsAsync(Samples.Uri, 2);
        Assert.DoesNotContain(diagnostics, d => (string?)d!["code"] == "WS1001");
        Assert.Null(await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, 900, 0)));
    }
}
