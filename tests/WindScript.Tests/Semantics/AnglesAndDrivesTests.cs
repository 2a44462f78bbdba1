using WindScript.Tests.Support;

namespace WindScript.Tests.Semantics;

/// <summary>
/// Angles of the two kinds and drives written in their natural forms. Electrical and mechanical
/// angles are tied by θ_el = p·θ_mech (Pyrhonen, Jokinen, Hrabovcova, Design of Rotating
/// Electrical Machines, 2nd ed., ch. 2); the synchronous frequency of a speed n is f = n·p/60
/// (common practice). Each natural form is compared with the same thing written out by hand.
/// </summary>
public class AnglesAndDrivesTests
{
    private const string Machine4Pole = """
        machine m {
          slots 36
          poles 4
          phases U V W
        {0}
        }

        winding main {
          layers 2
          turns 10
          pitch 7 slots
          top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2
        }

        """;

    private static string With(string machineLines, string rest = "") => Machine4Pole.Replace("{0}", machineLines) + rest;

    [Fact]
    public void An_electrical_skew_is_converted_to_mechanical_through_the_pole_pairs()
    {
        // 20 deg electrical at p = 2 is 10 deg mechanical: one slot pitch of 36 slots.
        var d = Wind.Design(With("  skew electrical(20 deg)"));
        Assert.Equal(1.0, d.Geometry.SkewSlots, 9);
        Assert.Equal(Wind.Design(With("  skew 10 deg")).Geometry.SkewSlots, d.Geometry.SkewSlots, 12);
    }

    [Fact]
    public void A_mechanical_phase_shift_is_converted_to_electrical()
    {
        var d = Wind.Design(With("  phase_shift mechanical(60 deg)"));
        Assert.Equal(120.0, d.PhaseShiftDegrees, 9);
        Assert.Equal(120.0, Wind.Design(With("  phase_shift electrical(120 deg)")).PhaseShiftDegrees, 9);
    }

    [Fact]
    public void The_kind_words_need_an_angle_property()
    {
        var c = Wind.Compile(With("", "let a = electrical(30 deg)\n"));
        Assert.Contains(c.Diagnostics, d => d.Code == "WS2030");
        Assert.Contains(Wind.Compile(With("  skew electrical(3 mm)")).Diagnostics, d => d.Code == "WS2011" && d.Message.Contains("takes an angle", StringComparison.Ordinal));
    }

    [Fact]
    public void A_speed_is_refused_as_a_frequency_with_the_synchronous_frequency()
    {
        var c = Wind.Compile(With("", "drive d {\n  balanced sine 10 A rms at 1500 rpm sequence U V W\n}\n"));
        var d = Assert.Single(c.Diagnostics, x => x.Code == "WS4004");
        Assert.Contains("1500 rpm is a speed; at 4 poles the synchronous frequency is 50 Hz: write `at 50 Hz`", d.Message, StringComparison.Ordinal);
        Assert.Equal("Write 50 Hz", d.Fix?.Title);
    }

    // The same trap through a named value: the speed is found in the let the name was written with.
    [Theory]
    [InlineData("let n = 1500 rpm\n", "n")]
    [InlineData("let n = 1500 rpm\nlet shaft = n\n", "(shaft * 1)")]
    public void A_speed_given_through_a_let_is_refused_as_a_frequency(string lets, string frequency)
    {
        var c = Wind.Compile(lets + With("", $"drive d {{\n  balanced sine 10 A rms at {frequency} sequence U V W\n}}\n"));
        Assert.Single(c.Diagnostics, x => x.Code == "WS4004");
        Assert.DoesNotContain(Wind.Compile(With("", "drive d {\n  balanced sine 10 A rms at 50 Hz sequence U V W\n}\n")).Diagnostics, x => x.Code == "WS4004");
    }

    [Fact]
    public void Two_balanced_lines_equal_the_per_phase_currents_written_by_hand()
    {
        // Sequence U V W: phase k lags by k·120 deg; sequence U W V: W lags by 120, V by 240.
        var balanced = Wind.Design(With("", """
            drive inverter {
              balanced sine 10 A peak at 50 Hz sequence U V W
              balanced sine 1 A peak at 250 Hz sequence U W V
            }
            """)).Drives.Single();
        var byHand = Wind.Design(With("", """
            drive inverter {
              U = sine 10 A peak at 50 Hz phase 0 deg + sine 1 A peak at 250 Hz phase 0 deg
              V = sine 10 A peak at 50 Hz phase -120 deg + sine 1 A peak at 250 Hz phase -240 deg
              W = sine 10 A peak at 50 Hz phase -240 deg + sine 1 A peak at 250 Hz phase -120 deg
            }
            """)).Drives.Single();
        for (int i = 0; i < 200; i++)
        {
            double t = i * 1e-4;
            var a = balanced.CurrentsAt(t);
            var b = byHand.CurrentsAt(t);
            for (int k = 0; k < 3; k++) Assert.Equal(b[k], a[k], 9);
        }
        Assert.Equal([0, 1, 2], balanced.Sequence.ToArray());
    }

    [Fact]
    public void A_phase_driven_by_its_own_line_and_a_balanced_line_is_a_duplicate()
    {
        var c = Wind.Compile(With("", "drive d {\n  balanced sine 10 A peak at 50 Hz sequence U V W\n  U = dc 1 A\n}\n"));
        Assert.Contains(c.Diagnostics, d => d.Code == "WS2002");
    }

    [Fact]
    public void A_failed_phase_angle_silences_the_drive_checks()
    {
        var c = Wind.Compile(With("", "drive d {\n  U = sine 20 A peak at 50 Hz phase 0 deg\n  V = sine 20 A peak at 50 Hz phase -120\n  W = sine 20 A peak at 50 Hz phase 120 deg\n}\n"));
        Assert.Equal(["WS2010"], c.Diagnostics.Select(d => d.Code));
    }
}
