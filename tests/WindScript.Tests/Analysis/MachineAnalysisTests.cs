using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

public class MachineAnalysisTests
{
    private static readonly Geometry Core = new() { BoreDiameter = 0.15, StackLength = 0.12, Gap = 0.0005, SlotOpening = 0.0028, GapFluxDensity = 0.8 };

    [Fact]
    public void Evaluates_an_integral_slot_machine_end_to_end()
    {
        var d = Designs.IntegralSlot(36, 4, 7, turns: 11, paths: 2, geometry: Core,
            drives: [Designs.Balanced(3, 12 * Math.Sqrt(2), 50, 120)]);
        var r = MachineAnalysis.Evaluate(d, new AnalysisOptions { MaxElectricalOrder = 25, Time = 0.001 });

        Assert.Equal(36, r.Machine.Slots);
        Assert.Equal(3, r.Machine.SlotsPerPolePerPhase);
        Assert.Equal(new RegularWinding(3, 7), r.Winding.Regular);
        var a = r.Phases[0];
        Assert.Equal(12 * 11 / 2.0, a.SeriesTurns);   // 12 coils of 11 turns per phase, two paths
        Assert.Equal(36, a.Conductors.Length);
        Assert.Equal(0, a.Conductors.Sum());
        // Orders shown: odd electrical orders up to 25, i.e. mechanical 2, 6, 10, ..., 50.
        Assert.Equal(Enumerable.Range(0, 13).Select(i => 2 + 4 * i), a.Harmonics.Select(h => h.Order));
        foreach (var h in a.Harmonics)
            Assert.Equal(h.DistributionFactor!.Value * h.PitchFactor!.Value * h.SkewFactor, h.WindingFactor, 12);
        Assert.Equal(0.9019, a.Harmonics[0].WindingFactor, 4);   // k_d1 0.9598 × k_p1 = sin 70° 0.9397 (Pyrhonen ch. 2 closed forms)

        Assert.NotNull(r.DifferentialLeakage);
        Assert.NotNull(r.Gap.CarterCoefficient);
        Assert.True(r.Gap.CarterCoefficient > 1);
        Assert.NotNull(r.Inductances);
        Assert.NotNull(r.BackEmf);

        var drive = Assert.Single(r.Drives);
        Assert.Equal(0.001, drive.Time);
        var fundamental = drive.Harmonics.Single(w => w.Order == 2);
        Assert.Equal(WaveKind.Forward, fundamental.Kind);
        Assert.Equal(1500, fundamental.SpeedRpm, 9);
        Assert.All(drive.Harmonics, w => Assert.Contains(w.Kind, new[] { WaveKind.Forward, WaveKind.Backward }));
        Assert.Equal(drive.Mmf.Max(Math.Abs), drive.PeakMmf);
        Assert.NotNull(drive.PeakField);
        Assert.Equal(AirGapField.Mu0 * drive.PeakMmf / (r.Gap.CarterCoefficient!.Value * 0.0005), drive.PeakField!.FluxDensity, 12);
        Assert.Equal(50, drive.BackEmfFrequencyHz);
        Assert.Equal(3, drive.BackEmfRms.Length);
        Assert.NotEmpty(r.Assumptions);
        Assert.Empty(r.Notes.Where(n => n.Contains("need")));
    }

    [Fact]
    public void Missing_geometry_leaves_figures_out_and_says_why()
    {
        var d = Designs.ToothCoils(12, 10, drives: default);
        var r = MachineAnalysis.Evaluate(d);
        Assert.Null(r.Winding.Regular);
        Assert.Null(r.Gap.CarterCoefficient);
        Assert.Null(r.Inductances);
        Assert.Null(r.BackEmf);
        Assert.Contains(r.Notes, n => n.Contains("Carter"));
        Assert.Contains(r.Notes, n => n.Contains("inductances"));
        Assert.All(r.Phases[0].Harmonics, h => Assert.Null(h.DistributionFactor));
        Assert.Equal(0.933, r.Phases[0].Harmonics.Single(h => h.Order == 5).WindingFactor, 3);
        Assert.Equal(1, r.Phases[0].Harmonics.Single(h => h.Order == 5).ElectricalOrder);
    }

    [Fact]
    public void Drive_with_two_frequencies_and_dc_reports_each()
    {
        var d = Designs.IntegralSlot(24, 4, 5, drives:
        [
            new Drive
            {
                Name = "mixed",
                Currents =
                [
                    new PhaseCurrent(0, [new CurrentComponent(70, 2 * Math.PI * 50, 0), new CurrentComponent(4, 2 * Math.PI * 250, 0)]),
                    new PhaseCurrent(1, [new CurrentComponent(70, 2 * Math.PI * 50, -2 * Math.PI / 3)]),
                    new PhaseCurrent(2, [new CurrentComponent(70, 2 * Math.PI * 50, 2 * Math.PI / 3), new CurrentComponent(5, 0, 0)]),
                ],
            },
        ]);
        var r = MachineAnalysis.Evaluate(d);
        var waves = r.Drives[0].Harmonics;
        Assert.Equal([0.0, 50.0, 250.0], waves.Select(w => Math.Round(w.FrequencyHz, 9)).Distinct().Order());
        Assert.All(waves.Where(w => w.FrequencyHz == 0), w => Assert.Equal(WaveKind.Standing, w.Kind));
        Assert.All(waves.Where(w => Math.Round(w.FrequencyHz) == 250), w => Assert.Equal(WaveKind.Pulsating, w.Kind));
        Assert.Equal(50, r.Drives[0].BackEmfFrequencyHz ?? 50);
    }
}

public class DegenerateDesignTests
{
    // Whatever the checker reports, evaluation must not throw and must give finite figures.
    [Theory]
    [InlineData(1, 2, 1)]
    [InlineData(6, 0, 3)]
    [InlineData(2, 2, 2)]
    [InlineData(12, 2, 0)]
    public void Odd_designs_evaluate_to_finite_figures(int slots, int poles, int phases)
    {
        var coils = phases == 0 ? [] : new[] { new WindScript.Model.Coil { Phase = 0, GoSlot = 1, ReturnSlot = slots, GoLayer = 0, ReturnLayer = 1, Turns = 3 } };
        var d = Designs.Create(slots, poles, phases, coils, geometry: new WindScript.Model.Geometry { BoreDiameter = 0.1, StackLength = 0.1, Gap = 0.001 },
            drives: phases == 0 ? default : [Designs.Balanced(phases, 1, 50, 120)]);
        var r = MachineAnalysis.Evaluate(d);
        Assert.All(r.Phases.SelectMany(p => p.Harmonics), h => Assert.True(double.IsFinite(h.WindingFactor) && double.IsFinite(h.ElectricalOrder)));
        Assert.All(r.Drives.SelectMany(x => x.Harmonics), w => Assert.True(double.IsFinite(w.Forward) && double.IsFinite(w.ElectricalOrder)));
        Assert.True(r.DifferentialLeakage is null || double.IsFinite(r.DifferentialLeakage.Value));
    }
}
