using WindScript.Tests.Support;

namespace WindScript.Tests.Semantics;

public class EvaluatorTests
{
    [Fact]
    public void Series_turns_follow_the_double_layer_rule()
    {
        // Common practice: a double-layer winding has Q coils, so N_ph = Q * N_c / (m * a).
        var d = Wind.Design(Wind.Machine36 + """
            winding w {
              layers 2
              turns 11
              pitch 7 slots
              paths 2
              top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2
            }
            """);
        Assert.Equal(36, d.Winding.Coils.Length);
        for (int p = 0; p < 3; p++) Assert.Equal(36.0 * 11 / (3 * 2), d.SeriesTurns(p));
    }

    [Fact]
    public void The_bottom_layer_is_the_top_layer_shifted_by_the_pitch_and_negated()
    {
        var d = Wind.Design(Wind.Machine36 + """
            winding w {
              layers 2
              turns 5
              pitch 7 slots
              top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2
            }
            """);
        var m = d.Conductors;
        for (int s = 0; s < 36; s++)
            for (int p = 0; p < 3; p++)
                Assert.Equal(-m[p, s, 0], m[p, (s + 7) % 36, 1]);
    }

    [Fact]
    public void A_written_out_bottom_layer_must_agree_with_the_pitch()
    {
        var c = Wind.Compile("""
            machine m {
              slots 6
              poles 2
              phases U V W
            }
            winding w {
              layers 2
              turns 1
              pitch 3 slots
              top: U -W V -U W -V
              bottom: -U W -V U -W V
            }
            """);
        // With pitch 3 the bottom of slot 4 must be -U (closing the coil from top slot 1), not U.
        Assert.Contains(c.Diagnostics, d => d.Code == "WS2017");
    }

    [Fact]
    public void A_single_layer_pattern_pairs_each_go_side_with_a_return_side_one_pitch_on()
    {
        var d = Wind.Design("""
            machine m {
              slots 12
              poles 2
              phases U V W
            }
            winding w {
              layers 1
              turns 4
              pitch 6 slots
              slots: U U -W -W V V -U -U W W -V -V
            }
            """);
        Assert.Equal(6, d.Winding.Coils.Length);
        Assert.All(d.Winding.Coils, c => Assert.Equal(6, c.PitchSlots(12)));
        Assert.Equal([1, 2], d.Winding.Coils.Where(c => c.Phase == 0).Select(c => c.GoSlot));
    }

    [Fact]
    public void A_single_layer_pattern_that_does_not_close_is_reported_at_the_wrong_slot()
    {
        var c = Wind.Compile("""
            machine m {
              slots 12
              poles 2
              phases U V W
            }
            winding w {
              layers 1
              turns 4
              pitch 6 slots
              slots: U U -W -W V V -V -U W W -U -V
            }
            """);
        var d = c.Diagnostics.First(x => x.Code == "WS2017");
        Assert.Equal("-V", c.Source.Slice(d.Span));
        Assert.Equal(9, c.Source.GetPosition(d.Span.Start).Line); // zero-based: the pattern line
        Assert.StartsWith("slot 7 should hold -U", d.Message);
    }

    [Fact]
    public void A_pattern_whose_sides_do_not_balance_is_reported_once_per_phase()
    {
        var c = Wind.Compile("machine m {\n  slots 12\n  poles 2\n  phases U V W\n}\nwinding w {\n  layers 1\n  turns 4\n  pitch 6 slots\n  slots: U U -W -W V V -U V W W -V -V\n}\n");
        Assert.Equal(["WS3004", "WS3004"], c.Diagnostics.Select(d => d.Code));
        Assert.Contains("phase V has 3 '+' sides and 2 '-' sides", c.Diagnostics[1].Message);
    }

    [Fact]
    public void A_pattern_must_cover_every_slot()
    {
        Assert.Contains("WS2015", Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  turns 1\n  pitch 7 slots\n  top: U V W\n}\n"));
    }

    [Fact]
    public void Loops_generate_one_coil_per_value_inclusive_of_both_ends()
    {
        var d = Wind.Evaluated(Wind.Machine36 + """
            winding w {
              layers 2
              for k in 0 .. 11 {
                coil U: 3 * k + 1 -> wrap(3 * k + 8) turns 2
              }
              for k in 10 .. 1 step -3 {
                coil V: k -> k + 1 turns 1 layer bottom
              }
            }
            """);
        Assert.Equal(12, d.Winding.Coils.Count(c => c.Phase == 0));
        Assert.Equal([10, 7, 4, 1], d.Winding.Coils.Where(c => c.Phase == 1).Select(c => c.GoSlot));
        Assert.Equal(5, d.Winding.Coils.Last(c => c.Phase == 0).ReturnSlot); // wrap(3 * 11 + 8) = wrap(41) = 41 - 36
    }

    [Fact]
    public void A_loop_with_step_zero_is_an_error_not_a_hang()
    {
        Assert.Contains("WS2012", Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  for k in 1 .. 5 step 0 {\n    coil U: 1 -> 2 turns 1\n  }\n}\n"));
    }

    [Fact]
    public void A_huge_expansion_is_refused_with_a_clear_error()
    {
        var codes = Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  for k in 1 .. 2000000000 {\n    coil U: 1 -> 2 turns 1\n  }\n}\n");
        Assert.Contains("WS2014", codes);
    }

    [Fact]
    public void Nested_loops_share_one_budget()
    {
        var codes = Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  for i in 1 .. 2000 {\n    for j in 1 .. 2000 {\n      coil U: 1 -> 2 turns 1\n    }\n  }\n}\n");
        Assert.Contains("WS2014", codes);
    }

    [Theory]
    [InlineData("bore 150", "WS2010")]
    [InlineData("bore 150 A", "WS2011")]
    [InlineData("gap 0.5 mm + 2 A", "WS2016")]
    [InlineData("gap 1 mm / 0", "WS2016")]
    [InlineData("phase_shift 120", "WS2010")]
    [InlineData("slots 36.5", "WS2012")]
    public void Units_and_dimensions_are_checked(string line, string code)
    {
        var text = $"machine m {{\n  {line}\n  poles 2\n  phases U\n}}\n";
        Assert.Contains(code, Wind.Codes(text));
    }

    [Fact]
    public void A_missing_unit_comes_with_a_fix_that_inserts_it()
    {
        var c = Wind.Compile("machine m {\n  bore 150\n}\n");
        var d = c.Diagnostics.Single(x => x.Code == "WS2010");
        Assert.Equal("expected a length unit such as mm after 150", d.Message);
        var edit = Assert.Single(d.Fix!.Edits);
        Assert.Equal("machine m {\n  bore 150 mm\n}\n", c.Source.Text.Insert(edit.Span.Start, edit.NewText));
    }

    [Fact]
    public void Lengths_are_stored_in_metres_whatever_unit_was_written()
    {
        var d = Wind.Design("""
            machine m {
              slots 6
              poles 2
              phases U V W
              bore 15 cm
              stack 0.1 m
              gap 500e-3 mm
            }
            winding w {
              layers 2
              turns 1
              pitch 3 slots
              top: U -W V -U W -V
            }
            """);
        Assert.Equal(0.15, d.Geometry.BoreDiameter!.Value, 12);
        Assert.Equal(0.1, d.Geometry.StackLength!.Value, 12);
        Assert.Equal(0.0005, d.Geometry.Gap!.Value, 12);
    }

    [Fact]
    public void Rms_amplitudes_become_peaks_and_hertz_become_radians_per_second()
    {
        var d = Wind.Design(Wind.Machine36 + """
            winding w {
              layers 2
              turns 1
              pitch 9 slots
              top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2
            }
            drive d {
              balanced sine 10 A rms at 50 Hz phase 30 deg sequence U V W
            }
            drive e {
              U = sine 2 A peak at 157.5 rad/s
              neutral
            }
            """);
        var rated = d.Drives[0];
        Assert.Equal(10 * Math.Sqrt(2), rated.Currents[0].Components[0].Peak, 12);
        Assert.Equal(2 * Math.PI * 50, rated.Currents[1].Components[0].Omega, 9);
        // Balanced set: each phase in the sequence lags the one before by 360/m = 120 degrees.
        double[] angles = rated.Currents.Select(c => c.Components[0].PhaseAngle * 180 / Math.PI).ToArray();
        Assert.Equal(30, angles[0], 9);
        Assert.Equal(-90, angles[1], 9);
        Assert.Equal(-210, angles[2], 9);
        // Balanced currents sum to zero at any instant (common practice).
        for (double t = 0; t < 0.02; t += 0.0013) Assert.Equal(0, rated.CurrentsAt(t).Sum(), 9);
        Assert.Equal(157.5, d.Drives[1].Currents[0].Components[0].Omega, 9); // rpm is a speed and refused here (WS4004)
    }

    [Fact]
    public void Names_must_be_defined_unique_and_used()
    {
        var codes = Wind.Codes("""
            let a = 1
            let a = 2
            let unused = 3
            machine m {
              slots 6
              poles b
              phases U V U
            }
            """);
        Assert.Contains("WS2002", codes);
        Assert.Contains("WS2001", codes);
        Assert.Contains("WS2003", codes);
    }

    [Fact]
    public void Coils_outside_the_slots_or_closing_on_themselves_are_errors()
    {
        var codes = Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  coil U: 0 -> 40 turns 1\n  coil V: 3 -> 3 turns 1\n}\n");
        Assert.Equal(2, codes.Count(c => c == "WS3001"));
        Assert.Contains("WS3003", codes);
    }

    [Fact]
    public void A_coil_needs_turns_from_somewhere()
    {
        Assert.Contains("WS2013", Wind.Codes(Wind.Machine36 + "winding w {\n  layers 2\n  coil U: 1 -> 8\n}\n"));
    }

    [Fact]
    public void Groups_carry_their_name_and_may_override_turns()
    {
        var d = Wind.Evaluated(Wind.Machine36 + """
            winding w {
              layers 2
              turns 3
              group outer {
                turns 9
                coil U: 1 -> 10
              }
              coil U: 2 -> 9
            }
            """);
        Assert.Equal(("outer", 9), (d.Winding.Coils[0].Group, d.Winding.Coils[0].Turns));
        Assert.Equal(("", 3), (d.Winding.Coils[1].Group, d.Winding.Coils[1].Turns));
    }

    [Fact]
    public void Defaults_that_change_results_are_recorded()
    {
        var d = Wind.Design(Wind.Machine36 + "winding w {\n  layers 2\n  turns 1\n  top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2\n}\n");
        Assert.Contains(d.Defaults, t => t.Contains("coil pitch 9 slots"));
        Assert.Contains(d.Defaults, t => t.Contains("phase shift 120"));
    }

    [Fact]
    public void Every_example_evaluates_without_errors_or_warnings()
    {
        foreach (var file in Repo.ExampleFiles())
        {
            var c = Compilation.Compile(File.ReadAllText(file), file);
            Assert.True(c.Diagnostics.All(d => d.Severity == WindScript.Diagnostics.Severity.Info), file + ": " + string.Join("; ", c.Diagnostics.Select(d => d.Code + " " + d.Message)));
            Assert.NotNull(c.Design);
        }
    }
}
