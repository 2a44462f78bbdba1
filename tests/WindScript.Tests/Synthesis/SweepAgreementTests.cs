using WindScript.Analysis;
using WindScript.Emit;
using WindScript.Sweep;
using WindScript.Synthesis;

namespace WindScript.Tests.Synthesis;

/// <summary>
/// Every figure a sweep record carries equals what the analysis computes for the same layout
/// after it has gone through the canonical text: synthesise, emit, compile, evaluate, compare.
/// </summary>
public class SweepAgreementTests
{
    [Theory]
    [InlineData(6, 30, 2, 40, 2, "pole")]
    [InlineData(6, 36, 2, 24, 1, "pole")]
    [InlineData(12, 24, 2, 12, 2, "all")]
    [InlineData(18, 36, 2, 8, 2, "pole-1")]
    [InlineData(4, 40, 2, 20, 2, "pole", 2)]
    [InlineData(10, 60, 2, 20, 2, "pole", 5)]
    [InlineData(10, 60, 2, 12, 1, "pole", 5)]
    public void Records_agree_with_the_analysis_of_the_emitted_file(int slotsFrom, int slotsTo, int polesFrom, int polesTo, int layers, string rule, int phases = 3)
    {
        var spec = new SweepSpec
        {
            SlotsFrom = slotsFrom, SlotsTo = slotsTo, PolesFrom = polesFrom, PolesTo = polesTo,
            Layers = layers, Pitch = PitchRule.Parse(rule, out _)!, Orders = 13, Phases = phases,
        };
        int count = 0;
        foreach (var r in LayoutSweep.Records(spec))
        {
            count++;
            var synthesis = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = r.Slots, Poles = r.Poles, Layers = r.Layers, Pitch = r.Pitch, Phases = phases });
            var design = Compilation.Compile(WindEmitter.Emit(synthesis.Design!)).Design!;
            int p = design.PolePairs;
            var a = MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = Math.Max(spec.Orders, 2 * r.Slots + 2) });
            string at = $"{r.Slots} slots, {r.Poles} poles, pitch {r.Pitch}";

            for (int n = 1; n <= spec.Orders; n++)
                foreach (var phase in a.Phases)
                {
                    double expected = phase.Harmonics.FirstOrDefault(h => h.Order == n * p)?.WindingFactor ?? 0;
                    Assert.True(Math.Abs(expected - r.WindingFactors[n - 1]) < 1e-12, $"{at}: k_w at electrical order {n}, phase {phase.Name}");
                }
            Assert.True(Math.Abs(a.DifferentialLeakage!.Value - r.DifferentialLeakage) < 1e-9 * (1 + r.DifferentialLeakage), $"{at}: leakage");
            Assert.True(a.Balanced.SubHarmonics.Length > 0 == r.Subharmonics, $"{at}: sub-harmonics");
            Assert.True(a.Balanced.EvenHarmonics.Length > 0 == r.EvenHarmonics, $"{at}: even harmonics");
            Assert.True(a.Balanced.Waves.Min(w => w.Order) == r.LowestOrder, $"{at}: lowest order");
            var orders = a.Balanced.Waves.Select(w => w.Order).ToHashSet();
            Assert.True(orders.Any(v => orders.Contains(v + 1)) == r.AdjacentOrders, $"{at}: adjacent orders");
            Assert.Equal(a.Machine.Periodicity, r.Periodicity);
            Assert.Equal(a.Machine.CoggingOrder, r.CoggingOrder);
            Assert.True(a.Machine.WindingPeriodicity * (a.Machine.HalfPeriodReversal ? 2 : 1) == r.Sections, $"{at}: sections");
            Assert.Equal(synthesis.Sections, r.Sections);
            Assert.Equal(synthesis.Pitch, r.Pitch);
        }
        Assert.True(count > 5, $"only {count} layouts in the sweep");
    }

    [Fact]
    public void Shards_concatenate_to_the_whole_sweep()
    {
        var spec = new SweepSpec { SlotsFrom = 6, SlotsTo = 60, PolesFrom = 2, PolesTo = 30 };
        var whole = SweepPlan.All(spec).ToList();
        foreach (int n in new[] { 1, 2, 3, 7, 50, 1000 })
        {
            var parts = Enumerable.Range(1, n).SelectMany(k => SweepPlan.Shard(spec, new SweepShard(k, n))).ToList();
            Assert.Equal(whole, parts);
        }
    }
}
