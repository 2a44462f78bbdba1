using System.Text.Json;
using WindScript.Emit;
using WindScript.Review;
using WindScript.Tests.Support;

namespace WindScript.Tests.Review;

public sealed class DiffTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-diff-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string MillFan => File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind"));

    private string Write(string name, string text)
    {
        var path = Path.Combine(_dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void Formatting_and_comment_changes_are_no_physical_change_and_exit_0()
    {
        // Comments dropped or reworded, indentation and spacing changed, blank lines added.
        var messy = string.Join("\n", MillFan.Split('\n')
            .Select(line => line.Contains('#') ? line[..line.IndexOf('#')] + (line.StartsWith('#') ? "" : "   # reworded") : line)
            .Select(line => line.Replace("  ", "      ").Replace(" U ", "   U ")))
            + "\n\n# trailing note\n";
        Assert.NotEqual(MillFan, messy);
        var r = CliRunner.Run("diff", Write("a.wind", MillFan), Write("b.wind", messy));
        Assert.True(r.Exit == 0, r.Out + r.Err);
        Assert.Contains("no physical change", r.Out);
    }

    [Fact]
    public void The_same_winding_written_as_explicit_coils_is_identical_to_its_slot_pattern()
    {
        var design = Wind.Design(MillFan);
        var explicitForm = WindEmitter.Emit(design, new EmitOptions { PreferPatterns = false });
        Assert.Contains("coil U:", explicitForm);
        Assert.DoesNotContain("top:", explicitForm);
        var diff = WindingComparison.Compare(MillFan, "a", explicitForm, "b");
        Assert.True(diff.Identical, string.Join(", ", diff.ChangedSections));
    }

    [Fact]
    public void Moving_the_rotor_outside_is_reported_in_words_not_as_a_number()
    {
        // The side of the gap the rotor lies on is a choice, not a figure: "inside -> outside", never "0 -> 1".
        var hub = File.ReadAllText(Path.Combine(Repo.Examples, "scooter_hub_12s10p.wind"));
        var inner = hub.Replace("rotor outside", "rotor inside");
        Assert.NotEqual(hub, inner);
        var r = CliRunner.Run("diff", Write("a.wind", inner), Write("b.wind", hub));
        Assert.Equal(1, r.Exit);
        Assert.Matches(@"~ rotor\s+inside\s+outside", r.Out);
        Assert.DoesNotContain("1 = yes", r.Out);
        var json = CliRunner.Run("diff", "--format", "json", Write("a.wind", inner), Write("b.wind", hub));
        using var doc = JsonDocument.Parse(json.Out);
        var rotor = doc.RootElement.GetProperty("machineChoices").EnumerateArray().Single(x => x.GetProperty("name").GetString() == "rotor");
        Assert.Equal(("inside", "outside", true), (rotor.GetProperty("old").GetString(), rotor.GetProperty("new").GetString(), rotor.GetProperty("changed").GetBoolean()));
        Assert.Contains("machine", doc.RootElement.GetProperty("changed").EnumerateArray().Select(x => x.GetString()));
    }

    [Fact]
    public void One_changed_pattern_entry_reports_exactly_its_slot_and_the_coil_side_it_returns_to()
    {
        // Slot 4's top coil side goes from U to V; with pitch 10 its return side is slot 14, bottom layer.
        var changed = MillFan.Replace("top: U U U U -W", "top: U U U V -W");
        Assert.NotEqual(MillFan, changed);
        var r = CliRunner.Run("diff", "--format", "json", Write("a.wind", MillFan), Write("b.wind", changed));
        Assert.Equal(1, r.Exit);
        using var doc = JsonDocument.Parse(r.Out);
        var slots = doc.RootElement.GetProperty("slots").GetProperty("changes").EnumerateArray()
            .Select(s => (s.GetProperty("slot").GetInt32(), s.GetProperty("layerName").GetString(), s.GetProperty("old").GetString(), s.GetProperty("new").GetString()))
            .ToArray();
        // The pattern repeats twice, so the second pole pair's slot 28 changes as well.
        Assert.Equal(
            [(4, "top", "+U 6", "+V 6"), (14, "bottom", "-U 6", "-V 6"), (28, "top", "+U 6", "+V 6"), (38, "bottom", "-U 6", "-V 6")],
            slots);
        Assert.False(doc.RootElement.GetProperty("identical").GetBoolean());
    }

    [Fact]
    public void One_explicit_coil_moved_to_another_phase_reports_exactly_its_two_coil_sides()
    {
        var design = Wind.Design(MillFan);
        var explicitForm = WindEmitter.Emit(design, new EmitOptions { PreferPatterns = false });
        // The first coil of U goes in slot 1 (top) and returns in slot 11 (bottom).
        var line = explicitForm.Split('\n').First(l => l.TrimStart().StartsWith("coil U: 1 -> 11", StringComparison.Ordinal));
        var changed = explicitForm.Replace(line, line.Replace("coil U:", "coil W:"));
        var diff = WindingComparison.Compare(explicitForm, "a", changed, "b");
        Assert.Equal([(1, 0, "+U 6", "+W 6"), (11, 1, "-U 6", "-W 6")], diff.Slots.Select(s => (s.Slot, s.Layer, s.Old, s.New)));
        Assert.Contains("series turns", diff.ChangedSections);
        Assert.Equal([45.0, 48, 51], diff.SeriesTurns.Select(r => r.New!.Value));   // 6 turns over 2 paths moved from U to W
        Assert.Empty(diff.Machine.Where(r => r.Changed));
    }

    [Theory]
    [InlineData(10, 11)]
    [InlineData(10, 9)]
    [InlineData(12, 10)]
    public void A_pitch_change_changes_every_winding_factor_as_the_closed_form_says(int before, int after)
    {
        // Pyrhonen, Jokinen, Hrabovcova, Design of Rotating Electrical Machines (2nd ed.), ch. 2:
        // k_w = k_d·k_p with k_d = sin(n·q·α/2) / (q·sin(n·α/2)), α = 2πp/Q the slot angle, and
        // k_p = sin(n·(y/τ_p)·π/2), τ_p = Q/(2p) the pole pitch in slots. Here Q = 48, p = 2, q = 4.
        const int slots = 48, p = 2, q = 4;
        double alpha = 2 * Math.PI * p / slots, tau = slots / (2.0 * p);
        double Kd(int n) => Math.Abs(Math.Sin(n * q * alpha / 2) / (q * Math.Sin(n * alpha / 2)));
        double Kp(int n, int y) => Math.Abs(Math.Sin(n * y / tau * Math.PI / 2));

        var old = MillFan.Replace("pitch 10 slots", $"pitch {before} slots");
        var @new = MillFan.Replace("pitch 10 slots", $"pitch {after} slots");
        var diff = WindingComparison.Compare(old, "a", @new, "b");
        Assert.False(diff.Identical);
        var rows = diff.WindingFactors[0].Rows;
        foreach (int n in new[] { 1, 3, 5, 7, 9, 11, 13 })
        {
            var row = rows.Single(r => r.Order == n * p);
            Assert.Equal(n, row.NewElectricalOrder!.Value, 12);
            Assert.Equal(Kd(n) * Kp(n, before), row.Old!.Value, 9);
            Assert.Equal(Kd(n) * Kp(n, after), row.New!.Value, 9);
            Assert.Equal(Kd(n) * (Kp(n, after) - Kp(n, before)), row.Delta!.Value, 9);
        }
        // Every phase of a regular winding has the same factors.
        Assert.All(diff.WindingFactors, phase => Assert.All(phase.Rows.Zip(rows), x => Assert.Equal(x.Second.New!.Value, x.First.New!.Value, 12)));
        // Even orders stay absent: a double-layer integral-slot winding has half-wave symmetry.
        Assert.DoesNotContain(rows, r => r.Order / p % 2 == 0 && r.Order % p == 0);
    }

    [Fact]
    public void Diagnostics_that_appear_are_reported_by_code_and_message_and_count_as_a_difference()
    {
        var changed = MillFan.Replace("series_turns 48", "series_turns 50");
        var diff = WindingComparison.Compare(MillFan, "a", changed, "b");
        var appeared = Assert.Single(diff.Diagnostics);
        Assert.True(appeared.Added);
        Assert.StartsWith("WS3", appeared.Code);
        Assert.Equal(["diagnostics"], diff.ChangedSections.ToArray());
        // ...and the reverse comparison reports it as gone.
        Assert.False(Assert.Single(WindingComparison.Compare(changed, "a", MillFan, "b").Diagnostics).Added);
    }

    [Fact]
    public void Renaming_the_machine_and_phases_is_reported_but_is_not_physical()
    {
        var renamed = MillFan.Replace("machine mill_fan", "machine mill_fan_b").Replace("phases U V W", "phases A B C")
            .Replace("U", "A").Replace("-W", "-C").Replace(" V", " B").Replace("-V", "-B").Replace(" W", " C");
        var r = CliRunner.Run("diff", Write("a.wind", MillFan), Write("b.wind", renamed));
        Assert.True(r.Exit == 0, r.Out + r.Err);
        Assert.Contains("mill_fan_b", r.Out);
    }

    [Fact]
    public void A_geometry_change_shows_in_the_machine_section_and_in_the_inductances()
    {
        var changed = MillFan.Replace("gap 0.7 mm", "gap 0.8 mm");
        var diff = WindingComparison.Compare(MillFan, "a", changed, "b");
        var gap = Assert.Single(diff.Machine, r => r.Changed);
        Assert.Equal(("air gap", 0.7, 0.8), (gap.Name, gap.Old!.Value, gap.New!.Value), new GapComparer());
        Assert.Empty(diff.Slots);
        // Winding-function inductances scale as r/(k_C·δ) with r the mean gap radius (Lipo, Analysis of
        // Synchronous Machines): the same turns functions, so the ratio is fixed by the geometry alone.
        var self = diff.FieldAndInductance.First(r => r.Name == "self inductance U");
        var effective = diff.FieldAndInductance.First(r => r.Name == "effective gap");
        double radiusOld = 105 - 0.35, radiusNew = 105 - 0.4;   // bore radius minus half the gap, mm
        Assert.Equal(radiusNew / radiusOld * effective.Old!.Value / effective.New!.Value, self.New!.Value / self.Old!.Value, 9);
    }

    private sealed class GapComparer : IEqualityComparer<(string, double, double)>
    {
        public bool Equals((string, double, double) x, (string, double, double) y) =>
            x.Item1 == y.Item1 && Math.Abs(x.Item2 - y.Item2) < 1e-9 && Math.Abs(x.Item3 - y.Item3) < 1e-9;

        public int GetHashCode((string, double, double) obj) => obj.Item1.GetHashCode();
    }

    [Fact]
    public void A_changed_drive_lists_the_phase_currents_that_changed()
    {
        var changed = MillFan.Replace("38 A rms", "40 A rms");
        var drive = Assert.Single(WindingComparison.Compare(MillFan, "a", changed, "b").Drives);
        Assert.Equal(DriveChangeKind.Changed, drive.Kind);
        Assert.Equal(3, drive.Details.Length);
        Assert.Contains("53.7401 A peak", drive.Details[0].Old);   // 38·√2
        Assert.Contains("56.5685 A peak", drive.Details[0].New);   // 40·√2
    }

    [Fact]
    public void Usage_errors_exit_2()
    {
        Assert.Equal(2, CliRunner.Run("diff", Write("a.wind", MillFan)).Exit);
        Assert.Equal(2, CliRunner.Run("diff", Write("a.wind", MillFan), Path.Combine(_dir, "missing.wind")).Exit);
        Assert.Equal(2, CliRunner.Run("diff", "a", "b", "c").Exit);
        Assert.Equal(2, CliRunner.Run("diff", "--format", "xml", Write("a.wind", MillFan), Write("b.wind", MillFan)).Exit);
    }

    [Fact]
    public void Git_arguments_for_an_added_file_compare_against_no_file_and_exit_0()
    {
        var path = Write("b.wind", MillFan);
        var r = CliRunner.Run("diff", "motors/fan.wind", "/dev/null", ".", ".", path, new string('0', 40), "100644");
        Assert.True(r.Exit == 0, r.Out + r.Err);
        Assert.Contains("windscript diff a/motors/fan.wind b/motors/fan.wind", r.Out);
        Assert.Contains("new file", r.Out);
        Assert.Contains("slots Q", r.Out);
    }

    [Fact]
    public void Json_output_carries_every_section()
    {
        var r = CliRunner.Run("diff", "--format", "json", Write("a.wind", MillFan), Write("b.wind", MillFan.Replace("pitch 10", "pitch 11")));
        using var doc = JsonDocument.Parse(r.Out);
        foreach (var name in new[] { "identical", "changed", "names", "machine", "slots", "coils", "seriesTurns", "windingFactors", "mmf", "fieldAndInductance", "drives", "diagnostics" })
            Assert.True(doc.RootElement.TryGetProperty(name, out _), name);
        var thd = doc.RootElement.GetProperty("mmf").GetProperty("figures").EnumerateArray().First(f => f.GetProperty("name").GetString()!.StartsWith("THD"));
        Assert.True(thd.GetProperty("changed").GetBoolean());
    }
}
