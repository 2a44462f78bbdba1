using WindScript.Analysis;
using WindScript.Model;
using WindScript.Reporting.Report;
using WindScript.Tests.Support;

namespace WindScript.Tests.Analysis;

/// <summary>
/// One route per figure: the slot spectrum of a design is computed once and shared by the
/// checker, the analysis, the plots and the report; series turns and winding factors come from
/// the same conductor model; the design stays a plain value.
/// </summary>
public class OneRoutePerFigureTests
{
    private static string Example(string name) => File.ReadAllText(Path.Combine(Repo.Examples, name));

    [Fact]
    public void Check_eval_plots_and_report_compute_the_spectrum_once()
    {
        WindingSpectrum.ComputationsOnThisThread = 0;
        var compilation = Compilation.Compile(Example("mill_fan_lap.wind"), "mill_fan_lap.wind");   // runs the checker
        var design = compilation.Design!;
        Assert.Equal(1, WindingSpectrum.ComputationsOnThisThread);
        MachineAnalysis.Evaluate(design);
        MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = 9, Time = 0.003 });
        HtmlReport.Render(compilation, "mill_fan_lap.wind");                                         // every plot and the animation
        Assert.Equal(1, WindingSpectrum.ComputationsOnThisThread);
    }

    [Fact]
    public void A_changed_copy_gets_its_own_spectrum()
    {
        var design = Compilation.Compile(Example("scooter_hub_12s10p.wind")).Design!;
        var fewerPaths = design with { Winding = design.Winding with { Paths = 1 } };
        var a = WindingSpectrum.Of(design);
        Assert.Same(a, WindingSpectrum.Of(design));
        Assert.NotSame(a, WindingSpectrum.Of(fewerPaths));
    }

    // The design is a plain value: every instance field backs an init-only property (no cache
    // lives inside it to take part in equality), and what was computed from it changes nothing.
    [Theory]
    [InlineData(typeof(WindingDesign))]
    [InlineData(typeof(Winding))]
    [InlineData(typeof(Coil))]
    [InlineData(typeof(Geometry))]
    [InlineData(typeof(Drive))]
    public void Model_records_hold_only_init_only_properties(Type type)
    {
        foreach (var field in type.GetFields(System.Reflection.BindingFlags.Instance | System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.NonPublic))
        {
            Assert.True(field.Name.EndsWith("k__BackingField"), $"{type.Name}.{field.Name} is not a property's backing field");
            Assert.True(field.IsInitOnly, $"{type.Name}.{field.Name} is writable");
        }
        foreach (var property in type.GetProperties().Where(p => p.SetMethod is not null))
            Assert.Contains(property.SetMethod!.ReturnParameter.GetRequiredCustomModifiers(), m => m.Name == "IsExternalInit");
    }

    [Fact]
    public void Computing_from_a_design_leaves_it_equal_to_a_fresh_one()
    {
        var text = Example("mill_fan_lap.wind");
        var a = Compilation.Compile(text).Design!;
        var copy = a with { };
        _ = MachineAnalysis.Evaluate(a);
        _ = a.Conductors;
        Assert.Equal(a, copy);
    }

    [Fact]
    public void Series_turns_come_from_the_conductor_model_that_gives_the_winding_factors()
    {
        foreach (var file in Repo.ExampleFiles())
        {
            var d = Compilation.Compile(File.ReadAllText(file)).Design!;
            var spectrum = WindingSpectrum.Of(d);
            for (int k = 0; k < d.Phases.Length; k++)
            {
                // Independent count: the coils' turns of the phase, divided by the paths.
                int coilTurns = d.Winding.Coils.Where(c => c.Phase == k).Sum(c => c.Turns);
                Assert.Equal((double)coilTurns / Math.Max(1, d.Winding.Paths), d.SeriesTurns(k), 12);
                Assert.Equal(spectrum.SideTurns(k) / 2.0 / spectrum.Paths, d.SeriesTurns(k), 12);
            }
        }
    }

    // One skew formula: the span API applies k_sk = |sin(νsπ/Q)/(νsπ/Q)| (Pyrhonen et al., ch. 2),
    // the same as the closed form, at every order.
    [Fact]
    public void The_span_api_applies_the_closed_form_skew_factor()
    {
        var factors = new double[60];
        Array.Fill(factors, 1.0);
        WindingFactors.ApplySkew(factors, 36, 1.0);
        for (int order = 1; order <= factors.Length; order++)
        {
            double x = Math.PI * order / 36;
            Assert.Equal(Math.Abs(Math.Sin(x) / x), factors[order - 1], 14);
        }
    }

    [Fact]
    public void Currents_at_an_instant_are_indexed_by_phase()
    {
        var drive = new Drive
        {
            Name = "d",
            Currents = [new PhaseCurrent(2, [new CurrentComponent(3, 0, 0)]), new PhaseCurrent(0, [new CurrentComponent(1, 0, 0)])],
        };
        Assert.Equal([1.0, 0, 3], drive.CurrentsAt(0, 3));
    }
}
