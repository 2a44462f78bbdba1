using System.Text.Json.Nodes;

namespace WindScript.Tests.LanguageServer;

/// <summary>Completion offers what may be written at the cursor, given the enclosing block and the statement so far.</summary>
public class CompletionTests
{
    /// <summary>Completion labels at the place marked '|' in <paramref name="marked"/>.</summary>
    private static async Task<string[]> LabelsAt(string marked)
    {
        int at = marked.IndexOf('|');
        var text = marked.Remove(at, 1);
        int line = text[..at].Count(ch => ch == '\n');
        int character = at - (at == 0 ? 0 : text.LastIndexOf('\n', at - 1) + 1);
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, text);
        await client.DiagnosticsAsync(Samples.Uri);
        var result = await client.ResultAsync("textDocument/completion", LspTestClient.At(Samples.Uri, line, character));
        var items = result!["items"]!.AsArray();
        foreach (var item in items)
        {
            // Every item replaces exactly the word being typed, on the cursor's line.
            Assert.Equal(line, (int?)item!["textEdit"]!["range"]!["end"]!["line"]);
            Assert.Equal(character, (int?)item["textEdit"]!["range"]!["end"]!["character"]);
        }
        return items.Select(i => (string)i!["label"]!).ToArray();
    }

    private const string Machine = "machine m {\n  slots 12\n  poles 2\n  phases A B C\n}\n";

    [Fact]
    public async Task Top_level_offers_the_blocks()
    {
        var labels = await LabelsAt("|\n");
        Assert.Equal(["machine", "winding", "drive", "slot", "conductor", "let"], labels);
    }

    [Fact]
    public async Task A_machine_block_offers_core_properties_only()
    {
        var labels = await LabelsAt("machine m {\n  slots 12\n  |\n}\n");
        Assert.Contains("poles", labels);
        Assert.Contains("slot_opening", labels);
        Assert.DoesNotContain("coil", labels);
        Assert.DoesNotContain("machine", labels);
    }

    [Fact]
    public async Task A_winding_offers_coils_patterns_loops_and_groups()
    {
        var labels = await LabelsAt(Machine + "winding w {\n  layers 2\n  |\n}\n");
        Assert.Contains("coil", labels);
        Assert.Contains("top:", labels);
        Assert.Contains("group", labels);
        Assert.Contains("for", labels);
        Assert.DoesNotContain("bore", labels);
    }

    [Fact]
    public async Task A_property_that_takes_a_word_offers_its_words()
    {
        // The words come from the vocabulary table (rotor inside|outside), whatever is half typed.
        Assert.Equal(["inside", "outside"], await LabelsAt("machine m {\n  slots 12\n  rotor |\n}\n"));
        Assert.Equal(["inside", "outside"], await LabelsAt("machine m {\n  slots 12\n  rotor out|\n}\n"));
        Assert.Empty(await LabelsAt("machine m {\n  slots 12\n  rotor outside |\n}\n"));
    }

    [Fact]
    public async Task A_half_typed_keyword_still_gets_the_block_keywords()
    {
        var labels = await LabelsAt(Machine + "winding w {\n  layers 2\n  co|\n}\n");
        Assert.Contains("coil", labels);
    }

    [Fact]
    public async Task After_coil_come_the_phase_names()
    {
        Assert.Equal(["A", "B", "C"], await LabelsAt(Machine + "winding w {\n  layers 1\n  coil |\n}\n"));
        Assert.Equal(["A", "B", "C"], await LabelsAt(Machine + "winding w {\n  layers 1\n  coil -|\n}\n"));
    }

    [Fact]
    public async Task After_a_coils_slots_come_turns_and_layer_then_top_or_bottom()
    {
        var labels = await LabelsAt(Machine + "winding w {\n  layers 2\n  coil A: 1 -> 7 |\n}\n");
        Assert.Contains("turns", labels);
        Assert.Contains("layer", labels);
        Assert.Equal(["top", "bottom"], await LabelsAt(Machine + "winding w {\n  layers 2\n  coil A: 1 -> 7 layer |\n}\n"));
    }

    [Fact]
    public async Task A_pattern_line_offers_signed_phases_and_gaps()
    {
        var labels = await LabelsAt(Machine + "winding w {\n  layers 1\n  slots: A |\n}\n");
        Assert.Contains("-B", labels);
        Assert.Contains("C", labels);
        Assert.Contains("_", labels);
        Assert.Contains("repeat", labels);
    }

    [Fact]
    public async Task Units_after_a_number_fit_the_property()
    {
        Assert.Equal(["mm", "cm", "m"], await LabelsAt("machine m {\n  bore 150 |\n}\n"));
        Assert.Equal(["mm", "cm", "m"], await LabelsAt("machine m {\n  bore 150 m|\n}\n"));
        Assert.Equal(["deg", "rad"], await LabelsAt("machine m {\n  phase_shift 120 |\n}\n"));
        Assert.Equal(["slots"], await LabelsAt(Machine + "winding w {\n  pitch 5 |\n}\n"));
    }

    [Fact]
    public async Task A_waveform_is_completed_word_by_word()
    {
        const string head = Machine + "drive d {\n";
        Assert.Contains("A =", await LabelsAt(head + "  |\n}\n"));
        Assert.Equal(["sine", "dc"], await LabelsAt(head + "  A = |\n}\n"));
        Assert.Equal(["A", "kA"], await LabelsAt(head + "  A = sine 10 |\n}\n"));
        Assert.Equal(["peak", "rms"], await LabelsAt(head + "  A = sine 10 A |\n}\n"));
        Assert.Equal(["at"], await LabelsAt(head + "  A = sine 10 A rms |\n}\n"));
        Assert.Equal(["Hz", "rad/s", "rpm"], await LabelsAt(head + "  A = sine 10 A rms at 50 |\n}\n"));
        Assert.Equal(["phase"], await LabelsAt(head + "  A = sine 10 A rms at 50 Hz |\n}\n"));
        Assert.Equal(["deg", "rad"], await LabelsAt(head + "  A = sine 10 A rms at 50 Hz phase 30 |\n}\n"));
        Assert.Equal(["phase", "sequence"], await LabelsAt(head + "  balanced sine 10 A rms at 50 Hz |\n}\n"));
        Assert.Equal(["A", "B", "C"], await LabelsAt(head + "  balanced sine 10 A rms at 50 Hz sequence |\n}\n"));
    }

    [Fact]
    public async Task Expressions_offer_names_in_scope_and_functions()
    {
        var labels = await LabelsAt("let outer = 3\n" + Machine + "winding w {\n  layers 1\n  let inner = 2\n  for k in 0 .. 3 {\n    coil A: |\n  }\n}\nlet later = 1\n");
        Assert.Contains("outer", labels);
        Assert.Contains("inner", labels);
        Assert.Contains("k", labels);
        Assert.Contains("wrap", labels);
        Assert.DoesNotContain("later", labels);
    }

    [Fact]
    public async Task Names_of_other_blocks_are_not_in_scope()
    {
        var labels = await LabelsAt(Machine + "drive d {\n  let amps = 3 A\n}\nwinding w {\n  layers 1\n  turns |\n}\n");
        Assert.DoesNotContain("amps", labels);
    }

    [Fact]
    public async Task Nothing_inside_a_comment()
    {
        Assert.Empty(await LabelsAt("machine m { # sl|\n}\n"));
    }
}
