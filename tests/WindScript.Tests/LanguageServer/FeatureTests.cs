using System.Text.Json.Nodes;

namespace WindScript.Tests.LanguageServer;

/// <summary>Definition, references, outline, formatting, quick fixes and semantic tokens on the sample machine.</summary>
public class FeatureTests
{
    private static async Task<LspTestClient> OpenAsync(string text, JsonObject? capabilities = null)
    {
        var client = await LspTestClient.StartAsync(capabilities);
        client.Open(Samples.Uri, text);
        await client.DiagnosticsAsync(Samples.Uri);
        return client;
    }

    [Fact]
    public async Task Definition_of_a_reference_is_its_let_and_of_a_phase_is_the_phases_line()
    {
        await using var client = await OpenAsync(Samples.FanMotor);
        var (line, col) = Samples.Find(Samples.FanMotor, "turns n");
        var definition = await client.ResultAsync("textDocument/definition", LspTestClient.At(Samples.Uri, line, col + 6));
        Assert.Equal(Samples.Find(Samples.FanMotor, "let n").Line, (int?)definition!["range"]!["start"]!["line"]);
        Assert.Equal(4, (int?)definition["range"]!["start"]!["character"]);

        var (wLine, wCol) = Samples.Find(Samples.FanMotor, "W = dc");
        var phase = await client.ResultAsync("textDocument/definition", LspTestClient.At(Samples.Uri, wLine, wCol));
        var (pLine, pCol) = Samples.Find(Samples.FanMotor, "phases U V W");
        Assert.Equal(pLine, (int?)phase!["range"]!["start"]!["line"]);
        Assert.Equal(pCol + "phases U V ".Length, (int?)phase["range"]!["start"]!["character"]);
    }

    [Fact]
    public async Task References_of_a_phase_cover_pattern_entries_and_drive_lines()
    {
        await using var client = await OpenAsync(Samples.FanMotor);
        var (line, col) = Samples.Find(Samples.FanMotor, "phases U V W");
        var references = (await client.ResultAsync("textDocument/references", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri },
            ["position"] = LspTestClient.Position(line, col + 7),
            ["context"] = new JsonObject { ["includeDeclaration"] = true },
        }))!.AsArray();
        // declaration + 6 entries of U in the pattern (3 U, 3 -U) + balanced sequence + 'U = dc'
        Assert.Equal(1 + 6 + 1 + 1, references.Count);
        Assert.All(references, r => Assert.Equal(Samples.Uri, (string?)r!["uri"]));
    }

    [Fact]
    public async Task Document_symbols_outline_machine_winding_drives_and_values()
    {
        await using var client = await OpenAsync(Samples.FanMotor.Replace("  top:", "  group outer {\n    top:").Replace("repeat 2\n", "repeat 2\n  }\n"));
        var symbols = (await client.ResultAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri)))!.AsArray();
        Assert.Equal(["n", "bore_d", "fan_motor", "main", "rated", "standstill"], symbols.Select(s => (string)s!["name"]!));
        var winding = symbols.Single(s => (string?)s!["name"] == "main")!;
        Assert.Equal("outer", (string?)winding["children"]![0]!["name"]);
        Assert.Contains("36 slots, 4 poles, 3 phases", (string?)symbols.Single(s => (string?)s!["name"] == "fan_motor")!["detail"]);
        foreach (var s in symbols) Assert.True(Inside(s!["selectionRange"]!, s["range"]!));
    }

    [Fact]
    public async Task Clients_without_hierarchy_get_flat_symbol_information()
    {
        await using var client = await OpenAsync(Samples.FanMotor, new JsonObject());
        var symbols = (await client.ResultAsync("textDocument/documentSymbol", LspTestClient.Doc(Samples.Uri)))!.AsArray();
        Assert.All(symbols, s => Assert.NotNull(s!["location"]));
        Assert.Contains(symbols, s => (string?)s!["name"] == "rated");
    }

    [Fact]
    public async Task Formatting_returns_the_canonical_text_as_a_minimal_edit()
    {
        var messy = Samples.FanMotor.Replace("  slots 36", "      slots    36").Replace("  poles 4", "\tpoles 4");
        await using var client = await OpenAsync(messy);
        var edits = (await client.ResultAsync("textDocument/formatting", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri },
            ["options"] = new JsonObject { ["tabSize"] = 2, ["insertSpaces"] = true },
        }))!.AsArray();
        var edit = Assert.Single(edits)!;
        Assert.Equal(Samples.FanMotor, Apply(messy, edit));
        Assert.Equal(Samples.Find(messy, "slots    36").Line, (int?)edit["range"]!["start"]!["line"]);
    }

    [Fact]
    public async Task Formatting_a_canonical_or_broken_file_returns_no_edits()
    {
        await using var client = await OpenAsync(Samples.FanMotor);
        Assert.Empty((await client.ResultAsync("textDocument/formatting", LspTestClient.Doc(Samples.Uri)))!.AsArray());
        client.ChangeAll(Samples.Uri, 2, Samples.FanMotor.Replace("slots 36", "slots 36 {{"));
        await client.DiagnosticsAsync(Samples.Uri, 2);
        Assert.Empty((await client.ResultAsync("textDocument/formatting", LspTestClient.Doc(Samples.Uri)))!.AsArray());
    }

    [Fact]
    public async Task A_quick_fix_adds_the_missing_unit()
    {
        var text = Samples.FanMotor.Replace("gap 0.5 mm", "gap 0.5");
        await using var client = await OpenAsync(text);
        var (line, col) = Samples.Find(text, "gap 0.5");
        var actions = (await client.ResultAsync("textDocument/codeAction", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri },
            ["range"] = LspTestClient.Range(line, col + 4, line, col + 4),
            ["context"] = new JsonObject { ["diagnostics"] = new JsonArray() },
        }))!.AsArray();
        var action = Assert.Single(actions)!;
        Assert.Equal("quickfix", (string?)action["kind"]);
        Assert.Equal("Add the unit 'mm'", (string?)action["title"]);
        Assert.Equal("WS2010", (string?)action["diagnostics"]![0]!["code"]);
        var edit = action["edit"]!["changes"]![Samples.Uri]![0]!;
        Assert.Equal(Samples.FanMotor, Apply(text, edit));
    }

    [Fact]
    public async Task No_quick_fix_away_from_a_fixable_diagnostic()
    {
        await using var client = await OpenAsync(Samples.FanMotor.Replace("gap 0.5 mm", "gap 0.5"));
        var actions = (await client.ResultAsync("textDocument/codeAction", new JsonObject
        {
            ["textDocument"] = new JsonObject { ["uri"] = Samples.Uri },
            ["range"] = LspTestClient.Range(0, 0, 0, 1),
            ["context"] = new JsonObject { ["diagnostics"] = new JsonArray() },
        }))!.AsArray();
        Assert.Empty(actions);
    }

    [Fact]
    public async Task Semantic_tokens_mark_phases_values_units_and_comments()
    {
        await using var client = await OpenAsync("let n = 11 # turns\n");
        var response = await client.ResultAsync("textDocument/semanticTokens/full", LspTestClient.Doc(Samples.Uri));
        var data = response!["data"]!.AsArray().Select(x => (int)x!).ToArray();
        // keyword 'let' (0,0,3), variable 'n' declared (0,4,1), number '11' (0,8,2), comment (0,11,7)
        Assert.Equal(new[] { 0, 0, 3, 0, 0, 0, 4, 1, 3, 3, 0, 4, 2, 1, 0, 0, 3, 7, 6, 0 }, data);
    }

    [Fact]
    public async Task Renaming_a_phase_changes_every_use_and_the_file_stays_clean()
    {
        await using var client = await OpenAsync(Samples.FanMotor);
        var (line, col) = Samples.Find(Samples.FanMotor, "phases U V W");
        var position = LspTestClient.At(Samples.Uri, line, col + 7);
        var prepared = await client.ResultAsync("textDocument/prepareRename", position);
        Assert.Equal("U", (string?)prepared!["placeholder"]);
        position["newName"] = "A";
        var edits = (await client.ResultAsync("textDocument/rename", position))!["changes"]![Samples.Uri]!.AsArray();
        Assert.Equal(9, edits.Count); // the declaration, 6 pattern entries, the sequence, 'U = dc'
        var renamed = edits.Reverse().Aggregate(Samples.FanMotor, (text, edit) => Apply(text, edit!));
        Assert.Contains("phases A V W", renamed);
        Assert.Contains("top: A A A -W -W -W V V V -A -A -A", renamed);
        client.ChangeAll(Samples.Uri, 2, renamed);
        Assert.Empty(await client.DiagnosticsAsync(Samples.Uri, 2));
    }

    [Theory]
    [InlineData("coil")]   // reserved
    [InlineData("2x")]     // not a name
    [InlineData("n")]      // already a value's name
    public async Task Renaming_to_an_invalid_or_taken_name_is_refused(string newName)
    {
        await using var client = await OpenAsync(Samples.FanMotor);
        var (line, col) = Samples.Find(Samples.FanMotor, "let bore_d");
        var position = LspTestClient.At(Samples.Uri, line, col + 5);
        position["newName"] = newName;
        var response = await client.RequestAsync("textDocument/rename", position);
        Assert.Equal(WindScript.LanguageServer.Rpc.RpcErrorCodes.RequestFailed, (int?)response["error"]!["code"]);
    }

    private static bool Inside(JsonNode inner, JsonNode outer) =>
        Compare(inner["start"]!, outer["start"]!) >= 0 && Compare(inner["end"]!, outer["end"]!) <= 0;

    private static int Compare(JsonNode a, JsonNode b) =>
        (int)a["line"]! != (int)b["line"]! ? ((int)a["line"]!).CompareTo((int)b["line"]!) : ((int)a["character"]!).CompareTo((int)b["character"]!);

    /// <summary>Applies one LSP text edit to a text, counting positions in UTF-16 units, as an editor would.</summary>
    public static string Apply(string text, JsonNode edit)
    {
        int Offset(JsonNode p)
        {
            int line = (int)p["line"]!, ch = (int)p["character"]!, at = 0;
            for (int i = 0; i < line; i++) at = text.IndexOf('\n', at) + 1;
            return at + ch;
        }
        int start = Offset(edit["range"]!["start"]!), end = Offset(edit["range"]!["end"]!);
        return text[..start] + (string)edit["newText"]! + text[end..];
    }
}
