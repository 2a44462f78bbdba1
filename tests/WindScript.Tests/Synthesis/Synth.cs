using WindScript.Analysis;
using WindScript.Model;
using WindScript.Synthesis;

namespace WindScript.Tests.Synthesis;

/// <summary>Shared helpers for the synthesis tests.</summary>
internal static class Synth
{
    public static WindingDesign Design(int slots, int poles, int layers = 2, int? pitch = null, int phases = 3, int turns = 1, int paths = 1)
    {
        var result = WindingSynthesizer.Synthesize(new SynthesisRequest
        {
            Slots = slots, Poles = poles, Layers = layers, Pitch = pitch, Phases = phases, TurnsPerCoil = turns, Paths = paths,
        });
        Assert.True(result.Succeeded, string.Join("; ", result.Diagnostics.Select(d => d.Message)));
        return result.Design!;
    }

    /// <summary>Winding factor of a phase at a mechanical order, from the coil sides (the analysis model).</summary>
    public static double WindingFactor(WindingDesign design, int phase, int mechanicalOrder)
    {
        var factors = new double[mechanicalOrder];
        WindingFactors.Compute(design.Conductors, phase, 0, factors);
        return factors[mechanicalOrder - 1];
    }

    public static double Fundamental(WindingDesign design) => WindingFactor(design, 0, design.PolePairs);
}
