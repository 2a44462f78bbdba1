using WindScript.Analysis;
using WindScript.Analysis.Conductors;
using WindScript.Model;
using WindScript.Tests.Support;

namespace WindScript.Tests.Analysis.Conductors;

/// <summary>Materials, wire tables, packing, resistance and inductances against sources outside the project.</summary>
public class ConductorPhysicsTests
{
    // IEC 60028 (International Annealed Copper Standard): 1/58 ohm mm^2/m at 20 degC, 0.00393 /K.
    [Fact]
    public void Copper_follows_IEC_60028()
    {
        var cu = ConductorMaterials.Copper;
        Assert.Equal(1.0 / 58 * 1e-6, cu.Resistivity20, 15);
        Assert.Equal(0.00393, cu.TemperatureCoefficient);
        Assert.Equal(1.0 / 58 * 1e-6 * (1 + 0.00393 * 55), cu.ResistivityAt(75), 15);
        Assert.Equal(8890, cu.Density); // IEC 60028: 8.89 g/cm3
    }

    // IEC 60121 (hard-drawn aluminium for electrical purposes): 0.028264 ohm mm^2/m at 20 degC, 0.00403 /K, 2.703 g/cm3.
    [Fact]
    public void Aluminium_follows_IEC_60121()
    {
        var al = ConductorMaterials.Aluminium;
        Assert.Equal(0.028264e-6, al.Resistivity20, 15);
        Assert.Equal(0.00403, al.TemperatureCoefficient);
        Assert.Equal(2703, al.Density);
        Assert.InRange(al.Resistivity20 / ConductorMaterials.Copper.Resistivity20, 1.63, 1.65); // 61 % IACS (IEC 60121)
    }

    // Maximum overall diameters of enamelled round wire by grade, IEC 60317-0-1, from memory.
    [Theory]
    [InlineData(0.500, 1, 0.544)]
    [InlineData(0.500, 2, 0.566)]
    [InlineData(0.500, 3, 0.587)]
    [InlineData(1.000, 1, 1.062)]
    [InlineData(1.000, 2, 1.093)]
    [InlineData(1.000, 3, 1.124)]
    [InlineData(0.315, 2, 0.367)]
    public void Enamelled_wire_overall_diameter_by_grade(double bareMm, int grade, double overallMm)
    {
        Assert.Equal(overallMm, EnamelledWire.OverallDiameter(bareMm * 1e-3, grade)!.Value * 1e3, 9);
    }

    // Structure of the grade table (IEC 60317-0-1: a higher grade is a thicker build), and its bounds.
    [Fact]
    public void Grades_thicken_and_the_table_has_bounds()
    {
        for (double d = 0.1e-3; d <= 2.5e-3; d += 0.05e-3)
        {
            double g1 = EnamelledWire.OverallDiameter(d, 1)!.Value, g2 = EnamelledWire.OverallDiameter(d, 2)!.Value, g3 = EnamelledWire.OverallDiameter(d, 3)!.Value;
            Assert.True(d < g1 && g1 < g2 && g2 < g3, $"{d}");
            Assert.InRange((g3 - d) / d, 0.01, 0.4);
        }
        Assert.Null(EnamelledWire.OverallDiameter(3.15e-3, 1));
        Assert.Null(EnamelledWire.OverallDiameter(0.05e-3, 2));
    }

    // Geometry: in the hexagonal lattice with basis (2r, 0), (r, sqrt3 r) each cell holds one circle of area pi r^2.
    [Fact]
    public void Hexagonal_packing_limit_is_the_circle_share_of_a_lattice_cell()
    {
        double r = 1, cell = Math.Abs(2 * r * Math.Sqrt(3) * r - 0 * r);
        Assert.Equal(Math.PI * r * r / cell, Strand.HexagonalPacking, 14);
        Assert.Equal(Math.PI / (2 * Math.Sqrt(3)), Strand.HexagonalPacking, 15);
    }

    private const string Blower = """
        machine blower {
          slots 24
          poles 4
          phases U V W
          bore 100 mm
          stack 80 mm
          gap 0.5 mm
          slot_opening 2.5 mm
          gap_flux_density 0.7 T
        }
        slot s {
          shape semi_closed
          width 6 mm
          depth 16 mm
          tip_height 0.8 mm
          tip_taper 1.2 mm
          wedge 1.5 mm
          liner 0.25 mm
          separator 0.3 mm
        }
        conductor c {
          bare_diameter 0.9 mm
          grade 2
          strands 2
          temperature 100 degC
          end_extension 8 mm
          end_shape lap
        }
        winding main {
          layers 2
          turns 10
          pitch 5 slots
          paths 2
          top: U U -W -W V V -U -U W W -V -V repeat 2
        }
        drive rated {
          balanced sine 6 A rms at 50 Hz sequence U V W
          current_angle 30 deg
        }
        """;

    private static (WindingDesign Design, ConductorFigures Figures) Evaluate(string text)
    {
        var c = Wind.Compile(text);
        Assert.DoesNotContain(c.Diagnostics, d => d.Severity == WindScript.Diagnostics.Severity.Error);
        return (c.Design!, MachineAnalysis.Evaluate(c.Design!).Conductors!);
    }

    // Hand computation from the mean turn length (common practice: R = rho L / (a^2 A)):
    // coil span w = 5 slot pitches at the conductors' mid radius r = 50 + (0.8 + 1.2 + 1.5 + 16)/2 mm;
    // lap end = 2 x 8 mm + two legs of (w/2)/cos 30 deg; MLT = 2 (80 mm + end); 8 coils x 10 turns per phase;
    // two paths; copper 2 x pi 0.45^2 mm^2; rho from IEC 60028 at 20 and 100 degC.
    [Fact]
    public void Phase_resistance_matches_a_hand_computation_from_the_mean_turn_length()
    {
        var (_, f) = Evaluate(Blower);
        double r = 0.050 + (0.0008 + 0.0012 + 0.0015 + 0.016) / 2;
        double w = 5 * 2 * Math.PI * r / 24;
        double end = 2 * 0.008 + w / Math.Cos(Math.PI / 6);
        double mlt = 2 * (0.080 + end);
        double length = 8 * 10 * mlt, area = 2 * Math.PI * 0.00045 * 0.00045;
        double r20 = 1e-6 / 58 * length / (2 * 2 * area);
        var u = f.Resistance!.Phases[0];
        Assert.Equal(mlt, u.MeanTurnLength, 12);
        Assert.Equal(r20, u.Resistance20, 12);
        Assert.Equal(r20 * (1 + 0.00393 * 80), u.ResistanceHot, 12);
        // Copper mass: 8.89 g/cm3 (IEC 60028) over three phases' conductor volume.
        Assert.Equal(8890 * 3 * length * area, f.Resistance.Mass, 9);
        // Copper loss: 3 I^2 R at the operating temperature.
        Assert.Equal(3 * 6 * 6 * u.ResistanceHot, f.Drives[0].CopperLoss!.Value, 9);
        // Current density: 6 A through two paths of two strands.
        Assert.Equal(6 / (2 * area), f.Drives[0].CurrentDensity!.Value, 3);
    }

    // The working wave's inductance plus the differential leakage is the air-gap (winding-function)
    // inductance for balanced currents: L_gap = L_m (1 + sigma_delta) (Parseval; Pyrhonen et al. ch. 4).
    [Fact]
    public void Magnetising_plus_differential_leakage_is_the_air_gap_inductance()
    {
        var (d, f) = Evaluate(Blower);
        var gap = MachineAnalysis.Evaluate(d).Inductances!;
        Assert.Equal(gap.Synchronous, f.Inductances!.Magnetising!.Value + f.Inductances.DifferentialLeakageInductance!.Value, 9);
    }

    // Torque constant of a non-salient machine: k_T = m p k_w1 N Phi / sqrt 2 (E = sqrt2 pi f k_w N Phi,
    // Fitzgerald et al.; T = m E I cos(gamma) / Omega, Omega = 2 pi f / p), Phi = 2 B1 D l / (2p) ... = B1 D l / p.
    [Fact]
    public void Torque_constant_and_torque_at_the_current_angle()
    {
        var (d, f) = Evaluate(Blower);
        double phi = 0.7 * 0.100 * 0.080 / 2;
        double kw = d.FundamentalWindingFactor(0), n = d.SeriesTurns(0);
        double kt = 3 * 2 * kw * n * phi / Math.Sqrt(2);
        Assert.Equal(kt, f.TorqueConstant!.Value, 9);
        Assert.Equal(kt * 6 * Math.Cos(Math.PI / 6), f.Drives[0].Torque!.Value, 9);
        Assert.Equal(30, f.Drives[0].CurrentAngleDegrees, 9);
    }

    // Synchronous inductance = magnetising + every leakage, and reactance = 2 pi f L_s.
    [Fact]
    public void Synchronous_inductance_and_reactance_add_up()
    {
        var (_, f) = Evaluate(Blower);
        var l = f.Inductances!;
        double total = l.SlotLeakage!.Value + l.ToothTipLeakage!.Value + l.EndWindingLeakage!.Value + l.SkewLeakage!.Value + l.DifferentialLeakageInductance!.Value;
        Assert.Equal(total, l.TotalLeakage!.Value, 12);
        Assert.Equal(l.Magnetising!.Value + total, l.CompleteSynchronous!.Value, 12);
        Assert.Equal(2 * Math.PI * 50 * l.CompleteSynchronous.Value, f.Drives[0].SynchronousReactance!.Value, 9);
    }

    // Skew leakage sigma_sq = 1/k_sq^2 - 1 (Pyrhonen et al. ch. 4) with k_sq = sin(p s pi/Q... ) of one slot pitch.
    [Fact]
    public void Skew_leakage_follows_the_skew_factor()
    {
        var (d, f) = Evaluate(Blower.Replace("gap_flux_density 0.7 T", "gap_flux_density 0.7 T\n  skew 1 slots"));
        double x = d.PolePairs * Math.PI / 24; // half the skew angle in electrical radians: p * (2 pi/Q) / 2
        double ksq = Math.Sin(x) / x;
        Assert.Equal(1 / (ksq * ksq) - 1, f.Inductances!.SkewLeakage!.Value / f.Inductances.Magnetising!.Value, 9);
    }

    // End-winding leakage, Pyrhonen et al. ch. 4: L_w = (4m/Q) q N^2 mu0 l_w lambda_w (lambda_w = 0.3, assumed).
    [Fact]
    public void End_winding_leakage_follows_the_empirical_form()
    {
        var (d, f) = Evaluate(Blower);
        double n = d.SeriesTurns(0);
        double expected = 4.0 * 3 / 24 * 2 * n * n * AirGapField.Mu0 * f.Resistance!.EndLength * 0.3;
        Assert.Equal(expected, f.Inductances!.EndWindingLeakage!.Value, 12);
    }

    // Aluminium: the same winding's resistance scales with the resistivities of IEC 60121 and IEC 60028.
    [Fact]
    public void Aluminium_winding_resistance_scales_with_resistivity()
    {
        var (_, cu) = Evaluate(Blower);
        var (_, al) = Evaluate(Blower.Replace("strands 2", "strands 2\n  material aluminium"));
        Assert.Equal(0.028264 * 58, al.Resistance!.Phases[0].Resistance20 / cu.Resistance!.Phases[0].Resistance20, 9);
    }
}
