using System.Text.RegularExpressions;
using WindScript.Reporting.Drawing;
using WindScript.Reporting.Shop;
using WindScript.Tests.Support;

namespace WindScript.Tests.Reporting.Shop;

/// <summary>
/// The shop sheet against facts outside its own code: the pitch the file declares, the series
/// turns of the conductor model (and the file's own series_turns statement), IEC 60034-8 terminal
/// marks, and the direction of the rotating field for a positive-sequence supply.
/// </summary>
public class ShopSheetTests
{
    private static (WindScript.Model.WindingDesign Design, ShopSheet Sheet) Load(string example)
    {
        var c = Compilation.Compile(File.ReadAllText(Path.Combine(Repo.Examples, example)), example);
        var d = c.Design!;
        return (d, ShopSheetBuilder.Build(d, example));
    }

    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    [Theory]
    [InlineData("mill_fan_lap.wind", "1-11")]   // pitch 10 slots: a coil in slots 1 and 11
    [InlineData("scooter_hub_12s10p.wind", "1-2")]  // pitch 1 slot: around one tooth
    [InlineData("pump_skid_single_layer.wind", "1-7")]  // full pitch 6 slots
    public void Pitch_is_written_in_shop_notation_from_the_declared_pitch(string example, string pitch)
    {
        var (d, s) = Load(example);
        Assert.Equal(d.Winding.DeclaredPitch, int.Parse(pitch.Split('-')[1]) - 1);
        Assert.All(s.Coils, c => Assert.Equal(pitch, c.Pitch));
    }

    [Fact]
    public void A_coil_returning_towards_lower_slots_is_written_with_its_span_not_its_forward_distance()
    {
        // Shop notation counts the slots a coil spans: a coil from slot 44 back to slot 1 of 48 slots spans 5 slot
        // pitches the short way ("1-6", common practice), not 43.
        var text = "machine m {\n  slots 48\n  poles 8\n  phases U\n}\nwinding w {\n  layers 1\n  coil U: 1 -> 44 turns 3\n}\n";
        var d = Compilation.Compile(text, "t.wind").Design!;
        var coil = Assert.Single(ShopSheetBuilder.Build(d, "t.wind").Coils);
        Assert.Equal("1-6", coil.Pitch);
        Assert.Equal(-5, coil.Span);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_coil_is_in_one_group_every_group_in_one_path_and_paths_chain_by_jumpers(string example)
    {
        var (d, s) = Load(example);
        Assert.Equal(d.Winding.Coils.Length, s.Coils.Count);
        Assert.Equal(d.Winding.Coils.Sum(c => c.Turns), s.Coils.Sum(c => c.Turns));
        var inGroups = s.Groups.SelectMany(g => g.Coils).Order().ToList();
        Assert.Equal(Enumerable.Range(1, s.Coils.Count), inGroups);
        Assert.Equal(Enumerable.Range(1, s.Groups.Count), s.Paths.SelectMany(p => p.Groups).Order());
        // A path of n groups in series needs n - 1 jumpers, each from the end of one group to the next.
        Assert.Equal(s.Paths.Sum(p => p.Groups.Count - 1), s.Jumpers.Count);
        foreach (var j in s.Jumpers)
        {
            var from = s.Groups[j.FromGroup - 1];
            var to = s.Groups[j.ToGroup - 1];
            Assert.Equal((j.Phase, j.Path), (from.Phase, from.Path));
            Assert.Equal((j.Phase, j.Path), (to.Phase, to.Path));
            Assert.Equal(from.SlotAt(j.FromEnd), j.FromSlot);
            Assert.Equal(to.SlotAt(j.ToEnd), j.ToSlot);
        }
        foreach (var g in s.Groups)
        {
            Assert.Equal(s.Coils[g.Coils[0] - 1].StartSlot, g.StartSlot);
            Assert.Equal(s.Coils[g.Coils[^1] - 1].FinishSlot, g.FinishSlot);
        }
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Series_turns_per_path_agree_with_the_conductor_model(string example)
    {
        var (d, s) = Load(example);
        var table = ShopTables.Phases(s);
        for (int k = 0; k < d.Phases.Length; k++)
            Assert.Equal(d.SeriesTurns(k).ToString(System.Globalization.CultureInfo.InvariantCulture), table.Rows[k][6]);
        if (d.Winding.DeclaredSeriesTurns is { } declared) Assert.Equal(declared.ToString(System.Globalization.CultureInfo.InvariantCulture), table.Rows[0][6]);
    }

    [Fact]
    public void Three_phase_leads_carry_the_IEC_60034_8_marks_and_the_finishes_form_the_star()
    {
        // IEC 60034-8: U1 V1 W1 the phase starts, U2 V2 W2 the finishes (from memory of the standard's scheme).
        var (_, s) = Load("mill_fan_lap.wind");
        Assert.Equal(["U1", "V1", "W1", "U2", "V2", "W2"], s.Leads.Select(l => l.Mark).Distinct());
        Assert.Equal(2, s.Leads.Count(l => l.Mark == "U1"));   // two parallel paths join at each terminal
        var star = Assert.Single(s.Joints);
        Assert.Equal(["U2", "V2", "W2"], star.Marks);
    }

    [Fact]
    public void The_field_travels_towards_increasing_slots_when_the_phase_belts_follow_in_supply_order()
    {
        // Common practice (rotating-field theory): belts U, V, W following one another 120 electrical
        // degrees apart in the direction of increasing slot numbers, fed U-V-W, make a field that travels
        // that way; exchanging two phases reverses it.
        var (_, forward) = Load("mill_fan_lap.wind");
        Assert.Equal(1, forward.Rotation.SlotDirection);
        var text = File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind"))
            .Replace("top: U U U U -W -W -W -W V V V V -U -U -U -U W W W W -V -V -V -V", "top: U U U U -V -V -V -V W W W W -U -U -U -U V V V V -W -W -W -W");
        var swapped = Compilation.Compile(text, "swapped.wind").Design!;
        Assert.Equal(-1, ShopSheetBuilder.Build(swapped, "swapped.wind").Rotation.SlotDirection);
    }

    [Fact]
    public void Strands_are_one_when_the_file_states_none_and_the_sheet_says_so()
    {
        // The example states its conductor (#15): read it without the conductor block.
        var text = System.Text.RegularExpressions.Regex.Replace(File.ReadAllText(Path.Combine(Repo.Examples, "pump_skid_single_layer.wind")), @"conductor \w+ \{[^}]*\}", "");
        var s = ShopSheetBuilder.Build(Compilation.Compile(text, "pump.wind").Design!, "pump.wind");
        Assert.All(s.Coils, c => Assert.Equal(1, c.Strands));
        Assert.Contains(s.Notes, n => n.Contains("strand", StringComparison.Ordinal));
    }

    [Fact]
    public void Strands_and_wire_come_from_the_conductor_block_when_the_file_states_one()
    {
        var path = Path.Combine(Repo.Cases, "conductors_clean_round.wind");
        var d = Compilation.Compile(File.ReadAllText(path), path).Design!;
        var s = ShopSheetBuilder.Build(d, path);
        Assert.All(s.Coils, c => Assert.Equal(2, c.Strands));   // the file says "strands 2"
        Assert.Equal("round wire 0.9 mm bare, grade 2, copper, 2 in hand", s.Wire);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void The_diagram_marks_every_coil_link_jumper_lead_terminal_and_slot(string example)
    {
        var (d, s) = Load(example);
        string svg = SvgRenderer.Render(DevelopedDiagram.Draw(s));
        int Count(string attribute) => Regex.Matches(svg, $" data-{attribute}=\"").Count;
        Assert.Equal(d.Winding.Coils.Length, Count("coil"));
        Assert.Equal(s.Groups.Sum(g => g.Coils.Count - 1), Count("link"));
        Assert.Equal(s.Jumpers.Count, Count("jumper"));
        Assert.Equal(s.Leads.Count, Count("lead"));
        Assert.Equal(s.Leads.Select(l => l.Mark).Distinct().Count(), Count("terminal"));
        Assert.Equal(d.Slots, Count("slot"));
        Assert.DoesNotContain("NaN", svg);
    }

    [Theory]
    [InlineData(Paper.A4, "size: A4 landscape")]
    [InlineData(Paper.Letter, "size: letter landscape")]
    public void The_page_is_script_free_self_contained_and_sized_for_its_paper(Paper paper, string size)
    {
        var (_, s) = Load("mill_fan_lap.wind");
        string html = ShopHtml.Render(s, paper);
        Assert.DoesNotContain("<script", html);
        Assert.Contains("default-src 'none'", html);
        Assert.DoesNotMatch("(src|href)=\"(https?:)?//", html);
        Assert.Contains(size, html);
        foreach (var id in ShopTables.Ids) Assert.Contains($"<table id=\"{id}\"", html);
        Assert.Contains("IEC 60034", html);   // the cautions
    }
}
