using System.Globalization;
using System.Text.Json;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

public class EvalCommandTests
{
    private static string Example(string name) => Path.Combine(Repo.Examples, name);

    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    // Every example's JSON validates against schemas/eval.schema.json (JsonSchema.Net); the schema
    // closes every object (additionalProperties false), so it documents every field the output has.
    [Theory]
    [MemberData(nameof(Examples))]
    public void Json_output_of_every_example_validates_against_the_schema(string example)
    {
        var r = CliRunner.Run("eval", Example(example), "--format", "json", "--orders", "9", "--at", "1.5ms");
        Assert.True(r.Exit == 0, r.Err);
        using var doc = JsonDocument.Parse(r.Out);
        Assert.Empty(Schemas.Problems("eval.schema.json", doc.RootElement));
        Assert.Equal(0.0015, doc.RootElement.GetProperty("drives")[0].GetProperty("time").GetDouble(), 12);
    }

    [Fact]
    public void Json_carries_the_figures_the_issue_names()
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json");
        var root = JsonDocument.Parse(r.Out).RootElement;
        var machine = root.GetProperty("machine");
        Assert.Equal(48, machine.GetProperty("slots").GetInt32());
        Assert.Equal(2, machine.GetProperty("periodicity").GetInt32());
        Assert.Equal(48, machine.GetProperty("coggingOrder").GetInt32());
        var u = root.GetProperty("phases")[0];
        Assert.Equal(48, u.GetProperty("conductors").GetArrayLength());
        var h = u.GetProperty("harmonics")[0];
        Assert.Equal(2, h.GetProperty("order").GetInt32());
        Assert.Equal(1, h.GetProperty("electricalOrder").GetDouble());
        // 48 slots, 4 poles, q = 4, pitch 10/12: k_d1·k_p1 = 0.9577 × 0.9659 (Pyrhonen et al. ch. 2).
        Assert.Equal(0.9250, h.GetProperty("windingFactor").GetDouble(), 4);
        Assert.True(root.GetProperty("differentialLeakage").GetDouble() > 0);
        var wave = root.GetProperty("drives")[0].GetProperty("harmonics")[0];
        Assert.Equal("forward", wave.GetProperty("kind").GetString());
        Assert.Equal(JsonValueKind.Array, root.GetProperty("diagnostics").ValueKind);
    }

    [Fact]
    public void A_drive_in_the_reverse_sequence_makes_a_backward_fundamental()
    {
        var text = File.ReadAllText(Example("mill_fan_lap.wind")) + "\ndrive reversed {\n  balanced sine 38 A rms at 50 Hz sequence U W V\n}\n";
        var r = CliRunner.RunWithInput(text, "eval", "-", "--format", "json");
        var reversed = JsonDocument.Parse(r.Out).RootElement.GetProperty("drives").EnumerateArray().Single(d => d.GetProperty("name").GetString() == "reversed");
        var fundamental = reversed.GetProperty("harmonics").EnumerateArray().First(w => w.GetProperty("order").GetInt32() == 2);
        Assert.Equal("backward", fundamental.GetProperty("kind").GetString());
        Assert.Equal("<stdin>", JsonDocument.Parse(r.Out).RootElement.GetProperty("file").GetString());
    }

    [Fact]
    public void Orders_limits_the_highest_electrical_order()
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json", "--orders", "7");
        var orders = JsonDocument.Parse(r.Out).RootElement.GetProperty("phases")[0].GetProperty("harmonics").EnumerateArray()
            .Select(h => h.GetProperty("electricalOrder").GetDouble()).ToArray();
        Assert.Equal([1.0, 3, 5, 7], orders);
    }

    [Fact]
    public void Text_shows_the_analysis_tables_and_assumptions()
    {
        var r = CliRunner.Run("eval", Example("scooter_hub_12s10p.wind"), "--orders", "5");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("winding factors (every phase)", r.Out);
        Assert.Matches(@"\n\s+5\s+1\.000\s+0\.9330\s", r.Out);      // 12 slots / 10 poles: 0.933 (Cros & Viarouge 2002)
        Assert.Contains("differential leakage", r.Out);
        Assert.Contains("Carter coefficient", r.Out);
        Assert.Contains("ideal iron", r.Out);
        Assert.Contains("drive cruise at t = 0 s", r.Out);
    }

    [Fact]
    public void Csv_has_one_row_per_harmonic()
    {
        var r = CliRunner.Run("eval", Example("pump_skid_single_layer.wind"), "--format", "csv", "--orders", "5");
        Assert.True(r.Exit == 0, r.Err);
        var lines = r.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("kind,name,order,electricalOrder,windingFactor", lines[0]);
        int columns = lines[0].Split(',').Length;
        Assert.All(lines, l => Assert.Equal(columns, l.Split(',').Length));
        var fundamental = lines.First(l => l.StartsWith("phase,U,2,")).Split(',');
        Assert.Equal(0.9659, double.Parse(fundamental[4], CultureInfo.InvariantCulture), 4);   // q = 2 single layer: k_d1 (Pyrhonen ch. 2)
    }

    // Conductor figures are rows of their own with a figure name, an SI value and its unit, as wide as the header.
    [Fact]
    public void Csv_carries_conductor_figures_with_their_units()
    {
        var r = CliRunner.Run("eval", Path.Combine(Repo.Cases, "conductors_clean_round.wind"), "--format", "csv");
        Assert.True(r.Exit == 0, r.Err);
        var lines = r.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        int columns = lines[0].Split(',').Length;
        Assert.All(lines, l => Assert.Equal(columns, l.Split(',').Length));
        var row = lines.Select(l => l.Split(',')).First(c => c[0] == "resistance" && c[1] == "U" && c[^3] == "resistance20");
        Assert.Equal("ohm", row[^1]);
        Assert.InRange(double.Parse(row[^2], CultureInfo.InvariantCulture), 0.1, 1);
    }

    [Theory]
    [InlineData("--at", "soon")]
    [InlineData("--orders", "0")]
    [InlineData("--format", "xml")]
    public void Bad_options_are_usage_errors(string option, string value)
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"), option, value);
        Assert.Equal(2, r.Exit);
        Assert.True(r.Err.Contains(option) || r.Err.Contains(value), r.Err);
    }

    [Theory]
    [InlineData("0", 0)]
    [InlineData("0.004", 0.004)]
    [InlineData("2.5ms", 0.0025)]
    [InlineData("250 us", 0.00025)]
    [InlineData("1s", 1)]
    public void At_accepts_seconds_with_an_optional_unit(string text, double seconds)
    {
        Assert.True(WindScript.Reporting.Plots.TimeValue.TryParse(text, null, out double parsed, out _));
        Assert.Equal(seconds, parsed, 15);
    }

    // eval --at takes what plot --at takes: an electrical angle of the drive's period too
    // (mill fan: 50 Hz, so 90 deg is 5 ms), and gives the same instant.
    [Fact]
    public void At_accepts_an_angle_as_plot_does()
    {
        var byAngle = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json", "--at", "90deg");
        var bySeconds = CliRunner.Run("eval", Example("mill_fan_lap.wind"), "--format", "json", "--at", "5ms");
        Assert.True(byAngle.Exit == 0, byAngle.Err);
        var a = JsonDocument.Parse(byAngle.Out).RootElement.GetProperty("drives")[0];
        var b = JsonDocument.Parse(bySeconds.Out).RootElement.GetProperty("drives")[0];
        Assert.Equal(b.GetProperty("time").GetDouble(), a.GetProperty("time").GetDouble(), 15);
        Assert.Equal(b.GetProperty("peakMmf").GetDouble(), a.GetProperty("peakMmf").GetDouble(), 9);
    }
}
