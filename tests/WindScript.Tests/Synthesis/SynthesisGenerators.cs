using WindScript.Analysis;
using FsCheck;
using FsCheck.Fluent;
using WindScript.Synthesis;

namespace WindScript.Tests.Synthesis;

/// <summary>A synthesis request for a random feasible slot/pole/phase combination, with a random or default pitch.</summary>
public sealed record FeasibleRequest(SynthesisRequest Request)
{
    public override string ToString() =>
        $"Q={Request.Slots} 2p={Request.Poles} m={Request.Phases} layers={Request.Layers} pitch={Request.Pitch?.ToString() ?? "default"} turns={Request.TurnsPerCoil}";
}

public static class SynthesisGenerators
{
    // Every feasible (phases, layers, pole pairs, slots) with up to 120 slots and 60 poles, listed
    // once, so that the generator picks among them instead of filtering (which could loop).
    private static readonly (int Phases, int Layers, int Pairs, int Slots)[] Combinations =
        (from phases in new[] { 2, 3, 4, 5, 6, 7 }
         from layers in new[] { 1, 2 }
         from pairs in Enumerable.Range(1, 30)
         from slots in Enumerable.Range(2, 119)
         where Feasibility.IsFeasible(slots, pairs, PhaseBelts.ForPhases(phases)!, layers)
         select (phases, layers, pairs, slots)).ToArray();

    private static readonly (int, int, int, int)[] ThreePhase = Combinations.Where(c => c.Phases == 3).ToArray();

    public static Arbitrary<FeasibleRequest> Feasible() =>
        (from combination in Gen.OneOf(Gen.Elements(Combinations), Gen.Elements(ThreePhase))
         let phases = combination.Item1
         let layers = combination.Item2
         let pairs = combination.Item3
         let slots = combination.Item4
         from usePitch in Gen.Elements(false, true)
         from pitch in Gen.Choose(1, slots - 1)
         from turns in Gen.Choose(1, 40)
         select new FeasibleRequest(new SynthesisRequest
         {
             Slots = slots, Poles = 2 * pairs, Phases = phases, Layers = layers,
             Pitch = usePitch ? pitch : null, TurnsPerCoil = turns,
         })).ToArbitrary();
}
