using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Synthesis;

namespace WindScript.Tests.Synthesis;

/// <summary>
/// The feasibility condition of N. Bianchi, M. Dai Pre, IEE Proc. Electr. Power Appl., 2006:
/// double layer, Q/(m·t) whole with t = gcd(Q, p); single layer, Q/(2m·t*) whole with
/// t* = t if Q/t is even, t/2 if Q/t is odd (as we recall the paper; from memory).
/// </summary>
public class FeasibilityTests
{
    private static int Gcd(int a, int b) => (int)WindScript.Numerics.IntegerMath.Gcd(a, b);

    [Fact]
    public void Double_layer_condition_is_the_papers_for_odd_phase_counts()
    {
        foreach (int m in new[] { 3, 5, 7 })
            for (int q = 2; q <= 120; q++)
                for (int p = 1; p <= 40; p++)
                    Assert.True(q % (m * Gcd(q, p)) == 0 == Feasibility.IsFeasible(q, p, PhaseBelts.ForPhases(m)!, 2), $"Q={q} p={p} m={m}");
    }

    [Fact]
    public void Single_layer_condition_is_the_papers_with_t_star()
    {
        foreach (int m in new[] { 3, 5 })
            for (int q = 2; q <= 120; q++)
                for (int p = 1; p <= 40; p++)
                {
                    int t = Gcd(q, p);
                    bool expected = q % 2 == 0 && (q / t % 2 == 0 ? q % (2 * m * t) == 0 : t % 2 == 0 && q % (m * t) == 0);
                    Assert.True(expected == Feasibility.IsFeasible(q, p, PhaseBelts.ForPhases(m)!, 1), $"Q={q} p={p} m={m}");
                }
    }

    // Independent of the gcd form: a slot shift Δ turning phase k into phase k + 1 must move the
    // working wave by exactly the phase shift, p·Δ/Q ≡ φ/360° (mod 1).
    [Fact]
    public void Feasible_exactly_when_some_slot_shift_turns_the_star_by_the_phase_shift()
    {
        foreach (int m in new[] { 2, 3, 4, 5, 6 })
        {
            var belts = PhaseBelts.ForPhases(m)!;
            int num = belts.ShiftNumerator, den = belts.ShiftDenominator;
            for (int q = 2; q <= 60; q++)
                for (int p = 1; p <= 30; p++)
                {
                    bool exists = Enumerable.Range(0, q).Any(delta => ((long)den * p * delta - (long)num * q) % ((long)den * q) == 0);
                    Assert.True(exists == Feasibility.IsFeasible(q, p, belts, 2), $"Q={q} p={p} m={m}");
                }
        }
    }

    [Theory]
    [InlineData(12, 10, 2, true)]
    [InlineData(9, 8, 2, true)]
    [InlineData(9, 6, 2, true)]
    [InlineData(15, 10, 2, true)]
    [InlineData(10, 8, 2, false)]
    [InlineData(6, 6, 2, false)]
    [InlineData(7, 6, 2, false)]
    [InlineData(12, 10, 1, true)]
    [InlineData(9, 8, 1, false)]
    [InlineData(18, 16, 1, true)]
    [InlineData(6, 4, 1, true)]
    [InlineData(18, 12, 1, true)]
    [InlineData(10, 8, 1, false)]
    public void Known_combinations(int slots, int poles, int layers, bool feasible)
    {
        Assert.Equal(feasible, Feasibility.Check(slots, poles, 3, layers).IsFeasible);
    }

    [Theory]
    [InlineData(10, 8, 2)]
    [InlineData(14, 12, 2)]
    [InlineData(9, 8, 1)]
    [InlineData(14, 12, 1)]
    [InlineData(100, 62, 2)]
    public void An_infeasible_combination_names_the_nearest_feasible_counts(int slots, int poles, int layers)
    {
        var belts = PhaseBelts.ForPhases(3)!;
        var report = Feasibility.Check(slots, poles, belts, layers);
        Assert.False(report.IsFeasible);
        bool Works(int q, int twoP) => Feasibility.IsFeasible(q, twoP / 2, belts, layers);
        Assert.NotNull(report.SlotsAbove);
        Assert.True(Works(report.SlotsAbove!.Value, poles));
        for (int q = slots + 1; q < report.SlotsAbove; q++) Assert.False(Works(q, poles));
        if (report.SlotsBelow is { } below)
        {
            Assert.True(Works(below, poles));
            for (int q = below + 1; q < slots; q++) Assert.False(Works(q, poles));
        }
        if (report.PolesAbove is { } above)
        {
            Assert.True(Works(slots, above));
            for (int pp = poles + 2; pp < above; pp += 2) Assert.False(Works(slots, pp));
        }

        var result = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = slots, Poles = poles, Layers = layers });
        Assert.False(result.Succeeded);
        var d = Assert.Single(result.Diagnostics);
        Assert.Equal(layers == 2 ? DiagnosticCatalog.NoBalancedWinding.Code : DiagnosticCatalog.NoBalancedSingleLayer.Code, d.Code);
        Assert.Contains($"{report.SlotsAbove} slots with {poles} poles", d.Message);
        Assert.Contains(slots % 2 != 0 && layers == 1 ? "Q must be even" : "must be a whole number", d.Message);
    }

    [Fact]
    public void Paths_that_do_not_divide_the_sections_are_refused()
    {
        // 36 slots, 4 poles: four identical pole groups, so 1, 2 or 4 paths (common practice).
        foreach (int paths in new[] { 1, 2, 4 })
            Assert.True(WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = 36, Poles = 4, Paths = paths }).Succeeded);
        var refused = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = 36, Poles = 4, Paths = 3 });
        Assert.Equal(DiagnosticCatalog.PathsUnequalEmf.Code, Assert.Single(refused.Diagnostics).Code);
        Assert.Contains("divide 4 (1, 2, 4)", refused.Diagnostics[0].Message);
    }

    [Fact]
    public void A_pitch_spanning_a_whole_pole_pair_is_refused()
    {
        var result = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = 12, Poles = 4, Pitch = 6 });
        Assert.Equal(DiagnosticCatalog.PitchLinksNoFlux.Code, Assert.Single(result.Diagnostics).Code);
    }
}
