using FsCheck.Xunit;
using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Emit;
using WindScript.Formatting;
using WindScript.Synthesis;

namespace WindScript.Tests.Synthesis;

[Properties(Arbitrary = [typeof(SynthesisGenerators)])]
public class SynthesisProperties
{
    // A feasible combination always synthesises with the default pitch; an explicit pitch fails
    // only for the reasons the catalogue names, and only when that pitch is truly not balanced.
    [Property(MaxTest = 300)]
    public bool Feasible_combinations_synthesise_or_name_the_failed_pitch(FeasibleRequest f)
    {
        var r = f.Request;
        var result = WindingSynthesizer.Synthesize(r);
        if (result.Succeeded) return true;
        if (r.Pitch is not { } y) return false;
        var code = result.Diagnostics.Single().Code;
        var balanced = WindingSynthesizer.BalancedPitches(r.Slots, r.Poles / 2, PhaseBelts.ForPhases(r.Phases)!, r.Layers);
        return (code == DiagnosticCatalog.PitchNotBalanced.Code || code == DiagnosticCatalog.PitchLinksNoFlux.Code) && !balanced.Contains(y);
    }

    // Balanced: equal turns, equal winding factors at every order, axes k·φ apart.
    [Property(MaxTest = 300)]
    public bool Synthesised_phases_have_equal_turns_factors_and_displaced_axes(FeasibleRequest f)
    {
        var result = WindingSynthesizer.Synthesize(f.Request);
        if (result.Design is not { } d) return true;
        int m = d.Phases.Length, orders = Math.Max(2 * d.Slots + 1, d.PolePairs);
        var reference = new double[orders];
        WindingFactors.Compute(d.Conductors, 0, 0, reference);
        var conductors = new int[d.Slots];
        WindingFactors.SumLayers(d.Conductors, 0, conductors);
        double axis0 = WindingFactors.AxisElectricalDegrees(conductors, d.PolePairs);
        for (int k = 0; k < m; k++)
        {
            if (d.TotalTurns(k) != d.TotalTurns(0)) return false;
            var factors = new double[orders];
            WindingFactors.Compute(d.Conductors, k, 0, factors);
            for (int i = 0; i < orders; i++)
                if (Math.Abs(factors[i] - reference[i]) > 1e-9) return false;
            WindingFactors.SumLayers(d.Conductors, k, conductors);
            double shift = WindingFactors.AxisElectricalDegrees(conductors, d.PolePairs) - axis0 - k * d.PhaseShiftDegrees;
            double off = Math.Abs(Math.IEEERemainder(shift, 360));
            if (off > 1e-6) return false;
        }
        return reference[d.PolePairs - 1] > 0;
    }

    [Property(MaxTest = 300)]
    public bool Emitted_text_is_canonical_checks_clean_and_reads_back_to_the_same_model(FeasibleRequest f)
    {
        var result = WindingSynthesizer.Synthesize(f.Request);
        if (result.Design is not { } d) return true;
        var text = WindEmitter.Emit(d, new EmitOptions { Header = SynthesisHeader.Lines(result) });
        if (Formatter.Format(text) != text) return false;
        var compilation = Compilation.Compile(text);
        if (!EmitRoundTripTests.ChecksClean(compilation)) return false;
        EmitRoundTripTests.AssertSameModel(d, compilation.Design!);
        return true;
    }
}
