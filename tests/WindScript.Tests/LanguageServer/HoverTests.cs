using System.Text.Json.Nodes;

namespace WindScript.Tests.LanguageServer;

/// <summary>
/// Hover shows evaluated physics with units. Expected figures are closed-form results for the
/// sample machine (36 slots, 4 poles, 3 phases; common practice): pole pitch Q/2p = 9 slots,
/// q = Q/(2pm) = 3, series turns = 12 coils x 11 turns / 2 paths = 66, synchronous speed
/// n = 60 f / p = 1500 rpm at 50 Hz, peak = sqrt(2) x 12 A rms = 16.97 A.
/// </summary>
public class HoverTests : IAsyncLifetime
{
    private LspTestClient _client = null!;

    public async Task InitializeAsync()
    {
        _client = await LspTestClient.StartAsync();
        _client.Open(Samples.Uri, Samples.FanMotor);
        await _client.DiagnosticsAsync(Samples.Uri);
    }

    public async Task DisposeAsync() => await _client.DisposeAsync();

    private async Task<string> HoverAt(string text, int occurrence = 0, int into = 1)
    {
        var (line, col) = Samples.Find(Samples.FanMotor, text, occurrence);
        var result = await _client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, line, col + into));
        Assert.NotNull(result);
        Assert.Equal("markdown", (string?)result!["contents"]!["kind"]);
        return (string)result["contents"]!["value"]!;
    }

    [Fact]
    public async Task A_let_shows_its_value_with_its_unit()
    {
        var text = await HoverAt("bore_d", occurrence: 0, into: 2);
        Assert.Contains("let bore_d = 150 mm", text);
        Assert.Contains("150 mm", text);
        Assert.Contains("a length", text);
        // and at a reference of it
        var reference = await HoverAt("bore bore_d", into: 6);
        Assert.Contains("value: 150 mm", reference);
    }

    [Fact]
    public async Task A_pattern_entry_shows_its_coils_with_phase_turns_slots_and_layers()
    {
        var text = await HoverAt("top: U", into: 5);
        Assert.Contains("coil +U: slot 1 (top) → slot 8 (bottom), 11 turns, pitch 7 slots (7/9 of the pole pitch)", text);
        Assert.Contains("slot 19 (top) → slot 26 (bottom)", text); // the same entry, second repeat
    }

    [Fact]
    public async Task The_winding_shows_series_turns_per_phase_and_paths()
    {
        var text = await HoverAt("winding main", into: 9);
        Assert.Contains("2 layers, 36 coils, 2 parallel paths", text);
        Assert.Contains("U 66, V 66, W 66", text);
        Assert.Contains("coil pitch 7 slots (pole pitch 9 slots)", text);
    }

    /// <summary>
    /// Closed form for a regular double-layer winding (Pyrhönen, Jokinen, Hrabovcová, Design of
    /// Rotating Electrical Machines, ch. 2): q = 3, α = 20° electrical, y/τp = 7/9 give
    /// kd1 = sin(qα/2)/(q sin(α/2)) = 0.9598, kp1 = sin(7/9 · 90°) = 0.9397, kw1 = 0.9019; the MMF
    /// harmonic ν relative to the fundamental is kwν/(ν kw1): 7th 2.15 %, 17th (slot harmonic) 1/17 = 5.88 %.
    /// Rotating-field theory (common practice): in a balanced three-phase winding the orders 6k+1
    /// travel with the fundamental (forward), the orders 6k-1 against it.
    /// </summary>
    [Fact]
    public async Task The_winding_shows_its_fundamental_winding_factor_and_main_harmonics()
    {
        var text = await HoverAt("winding main", into: 9);
        Assert.Contains("kw1 = 0.9019 (distribution 0.9598 × pitch 0.9397)", text);
        Assert.Contains("7: 2.15 % forward", text);
        Assert.Contains("11: 1.37 % backward", text);
        Assert.Contains("17: 5.88 % backward", text);
        Assert.Contains("19: 5.26 % forward", text);
        Assert.Contains("differential leakage", text);
    }

    /// <summary>
    /// Fractional-slot concentrated winding, 12 slots and 10 poles, double layer: fundamental
    /// winding factor 0.933 (F. Magnussen, C. Sadarangani, 2003; J. Cros, P. Viarouge, 2002).
    /// The tooth-coil layout is the standard one for this slot/pole pair (common practice).
    /// </summary>
    [Fact]
    public async Task A_twelve_slot_ten_pole_tooth_coil_winding_shows_kw1_0_933()
    {
        const string text = """
            machine hub {
              slots 12
              poles 10
              phases U V W
            }

            winding teeth {
              layers 2
              turns 20
              pitch 1 slots
              top: U -U -V V W -W -U U V -V -W W
            }

            """;
        await using var client = await LspTestClient.StartAsync();
        client.Open(Samples.Uri, text);
        await client.DiagnosticsAsync(Samples.Uri);
        var (line, col) = Samples.Find(text, "winding teeth");
        var hover = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, line, col + 9));
        var value = (string)hover!["contents"]!["value"]!;
        Assert.Contains("kw1 = 0.933", value);
        Assert.Contains("coil pitch 1 slot (pole pitch 6/5 slots)", value);
    }

    [Fact]
    public async Task The_machine_shows_slots_per_pole_and_phase_and_periodicity()
    {
        var text = await HoverAt("machine fan_motor", into: 9);
        Assert.Contains("q = 3", text);
        Assert.Contains("t = gcd(Q, p) = 2", text);
        Assert.Contains("lcm(Q, 2p) = 36", text);
        Assert.Contains("slot pitch 20° electrical", text);
    }

    [Fact]
    public async Task A_balanced_drive_shows_currents_and_the_rotating_field_speed()
    {
        var text = await HoverAt("drive rated", into: 7);
        Assert.Contains("U: 16.971 A peak (12 A rms) at 50 Hz, φ = 0°", text);
        Assert.Contains("V: 16.971 A peak (12 A rms) at 50 Hz, φ = -120°", text);
        Assert.Contains("1500 rpm mechanical", text);
        Assert.Contains("sequence U V W", text);
    }

    [Fact]
    public async Task A_dc_drive_is_a_standing_field()
    {
        var text = await HoverAt("U = dc 8 A", into: 6);
        Assert.Contains("U: 8 A dc", text);
        Assert.Contains("standing field", text);
    }

    [Fact]
    public async Task A_phase_name_shows_its_axis_and_series_turns()
    {
        var text = await HoverAt("phases U V W", into: 9); // V
        Assert.Contains("phase 2 of 3; axis at 120° electrical", text);
        Assert.Contains("series turns per phase: 66", text);
    }

    [Fact]
    public async Task A_property_shows_derived_figures()
    {
        var pitch = await HoverAt("pitch 7 slots", into: 1);
        Assert.Contains("7/9 of the pole pitch (9 slots): short-pitched", pitch);
        var bore = await HoverAt("bore bore_d", into: 1);
        Assert.Contains("slot pitch at the bore 13.09 mm", bore); // pi x 150 mm / 36
    }

    [Fact]
    public async Task A_keyword_shows_its_help_and_empty_space_shows_nothing()
    {
        var text = await HoverAt("balanced", into: 2);
        Assert.Contains("balanced sine", text);
        var nothing = await _client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, Samples.Find(Samples.FanMotor, "machine").Line - 1, 0));
        Assert.Null(nothing);
    }

    [Fact]
    public async Task Plain_text_clients_get_plain_text()
    {
        await using var client = await LspTestClient.StartAsync(new JsonObject());
        client.Open(Samples.Uri, Samples.FanMotor);
        await client.DiagnosticsAsync(Samples.Uri);
        var (line, col) = Samples.Find(Samples.FanMotor, "let n");
        var result = await client.ResultAsync("textDocument/hover", LspTestClient.At(Samples.Uri, line, col + 4));
        Assert.Equal("plaintext", (string?)result!["contents"]!["kind"]);
        Assert.DoesNotContain("```", (string?)result["contents"]!["value"]);
    }
}
