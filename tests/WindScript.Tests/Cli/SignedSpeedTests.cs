using System.Globalization;
using System.Text.Json;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// Wave speeds carry their direction in every output, and frequencies come back as written.
/// A negative-sequence supply (U W V) turns the working wave backward: it moves at −120 f / (2p)
/// rpm (synchronous speed, common practice), and the 5th electrical harmonic, forward under a
/// positive-sequence supply's reverse, now runs forward at +1/5 of it.
/// </summary>
public class SignedSpeedTests
{
    private const string Machine = """
        machine signed_test {
          slots 24
          poles 4
          phases U V W
          bore 100 mm
          stack 60 mm
          gap 0.6 mm
        }
        winding w {
          layers 2
          turns 10
          pitch 5 slots
          top: U U -W -W V V -U -U W W -V -V repeat 2
        }
        """;

    private static JsonElement Eval(string drive, string format = "json")
    {
        var r = CliRunner.RunWithInput(Machine + "\n" + drive, "eval", "-", "--format", format);
        Assert.True(r.Exit == 0, r.Err);
        return JsonDocument.Parse(r.Out).RootElement.Clone();
    }

    [Fact]
    public void Negative_sequence_drive_has_a_backward_working_wave_with_negative_speed()
    {
        var root = Eval("drive reverse {\n  balanced sine 10 A peak at 60 Hz sequence U W V\n}\n");
        var waves = root.GetProperty("drives")[0].GetProperty("harmonics").EnumerateArray().ToArray();
        var working = waves.Single(w => w.GetProperty("order").GetInt32() == 2);
        Assert.Equal("backward", working.GetProperty("kind").GetString());
        Assert.Equal(-1800, working.GetProperty("speedRpm").GetDouble(), 9);          // −120·60/4
        Assert.Equal(-2 * Math.PI * 60 / 2, working.GetProperty("speedRadPerSecond").GetDouble(), 9);
        var fifth = waves.Single(w => w.GetProperty("order").GetInt32() == 10);
        Assert.Equal("forward", fifth.GetProperty("kind").GetString());
        Assert.Equal(360, fifth.GetProperty("speedRpm").GetDouble(), 9);
        foreach (var w in waves)
        {
            double speed = w.GetProperty("speedRpm").GetDouble();
            string kind = w.GetProperty("kind").GetString()!;
            if (kind == "backward") Assert.True(speed < 0);
            if (kind == "forward") Assert.True(speed > 0);
        }
    }

    [Fact]
    public void Frequencies_come_back_as_written_in_json_and_csv()
    {
        var root = Eval("drive d {\n  balanced sine 10 A peak at 60 Hz sequence U V W\n}\n");
        var drive = root.GetProperty("drives")[0];
        Assert.Equal("60", drive.GetProperty("harmonics")[0].GetProperty("frequencyHz").GetRawText());
        var csv = CliRunner.RunWithInput(Machine + "\ndrive d {\n  balanced sine 10 A peak at 60 Hz sequence U W V\n}\n", "eval", "-", "--format", "csv");
        Assert.True(csv.Exit == 0, csv.Err);
        Assert.DoesNotContain("59.99999", csv.Out);
        var header = csv.Out.Split('\n')[0].Split(',');
        int speedColumn = Array.IndexOf(header, "speedRpm"), kindColumn = Array.IndexOf(header, "waveKind");
        var backward = csv.Out.Split('\n').Select(l => l.Split(',')).First(c => c.Length > kindColumn && c[kindColumn].Trim() == "backward");
        Assert.True(double.Parse(backward[speedColumn], CultureInfo.InvariantCulture) < 0);
    }
}
