using FsCheck;
using FsCheck.Fluent;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

/// <summary>Any winding at all: random coils in random slots and layers (not necessarily buildable or balanced).</summary>
public sealed record AnyWinding(WindingDesign Design, int Shift, double Angle)
{
    public override string ToString() =>
        $"Q={Design.Slots} 2p={Design.Poles} m={Design.Phases.Length} skew={Design.Geometry.SkewSlots} shift={Shift} coils=[{string.Join(", ", Design.Winding.Coils.Select(c => $"{c.Phase}:{c.GoSlot}->{c.ReturnSlot}x{c.Turns * c.Polarity}"))}]";
}

/// <summary>
/// A balanced m-phase winding: any pattern of coils for the first phase, the other phases copies
/// of it moved by k·r slots, where r·p ≡ Q/m (mod Q) puts them 2π/m electrical apart. This exists
/// when Q/(m·gcd(Q, p)) is a whole number (Bianchi &amp; Dai Pre 2006).
/// </summary>
public sealed record BalancedWinding(WindingDesign Design, double Angle, double Time)
{
    public override string ToString() =>
        $"Q={Design.Slots} 2p={Design.Poles} m={Design.Phases.Length} coils=[{string.Join(", ", Design.Winding.Coils.Where(c => c.Phase == 0).Select(c => $"{c.GoSlot}->{c.ReturnSlot}x{c.Turns * c.Polarity}"))}]";
}

/// <summary>A winding that may or may not be recognised as regular.</summary>
public sealed record RegularCandidate(WindingDesign Design)
{
    public override string ToString() =>
        $"Q={Design.Slots} 2p={Design.Poles} m={Design.Phases.Length} layers={Design.Winding.Layers} coils=[{string.Join(", ", Design.Winding.Coils.Select(c => $"{c.Phase}:{c.GoSlot}->{c.ReturnSlot}"))}]";
}

public static class WindingGenerators
{
    private static Gen<Coil> CoilGen(int slots, int phases) =>
        from phase in Gen.Choose(0, phases - 1)
        from go in Gen.Choose(1, slots)
        from span in Gen.Choose(1, Math.Max(1, slots - 1))
        from turns in Gen.Choose(1, 30)
        from polarity in Gen.Elements(-1, 1)
        from goLayer in Gen.Choose(0, 1)
        select new Coil { Phase = phase, GoSlot = go, ReturnSlot = (go - 1 + span) % slots + 1, GoLayer = goLayer, ReturnLayer = 1 - goLayer, Turns = turns, Polarity = polarity };

    public static Arbitrary<AnyWinding> Any() =>
        (from slots in Gen.Choose(2, 60)
         from pairs in Gen.Choose(1, 8)
         from phases in Gen.Choose(1, 5)
         from count in Gen.Choose(1, 20)
         from coils in Gen.ArrayOf(CoilGen(slots, phases), count)
         from skew in Gen.Choose(0, 8)
         from shift in Gen.Choose(0, slots - 1)
         from angle in Gen.Choose(0, 359)
         select new AnyWinding(
             Designs.Create(slots, 2 * pairs, phases, coils, geometry: new Geometry { SkewSlots = skew / 4.0 }),
             shift, angle * Math.PI / 180)).ToArbitrary();

    public static Arbitrary<BalancedWinding> Balanced() =>
        (from phases in Gen.Elements(3, 5)
         from pairs in Gen.Choose(1, 8)
         from slots in Gen.Choose(phases, 72).Where(q => q % (phases * Gcd(q, pairs)) == 0)
         from count in Gen.Choose(1, 8)
         from coils in Gen.ArrayOf(CoilGen(slots, 1), count)
         from angle in Gen.Choose(0, 359)
         from time in Gen.Choose(0, 1000)
         select new BalancedWinding(Copies(slots, 2 * pairs, phases, coils), angle * Math.PI / 180, time * 1e-5)).ToArbitrary();

    /// <summary>Integral-slot windings of any q, pole count, pitch and layer count, rotated; and a few one-coil windings.</summary>
    public static Arbitrary<RegularCandidate> Regular() =>
        Gen.OneOf(
            from q in Gen.Choose(1, 4)
            from pairs in Gen.Choose(1, 4)
            from pitch in Gen.Choose(1, 6 * q - 1)
            from layers in Gen.Choose(1, 2)
            from shift in Gen.Choose(0, 6 * q * pairs - 1)
            select new RegularCandidate(Designs.Rotated(Designs.IntegralSlot(6 * q * pairs, 2 * pairs, pitch, layers), shift)),
            from q in Gen.Choose(1, 12)
            from span in Gen.Choose(1, 2 * q)
            select new RegularCandidate(Designs.Create(2 * q, 2, 1, [new Coil { Phase = 0, GoSlot = 1, ReturnSlot = 1 + span % (2 * q), GoLayer = 0, ReturnLayer = 0, Turns = 5, Polarity = 1 }], layers: 1)))
        .ToArbitrary();

    private static WindingDesign Copies(int slots, int poles, int phases, Coil[] first)
    {
        int p = poles / 2, r = Enumerable.Range(0, slots).First(x => (long)x * p % slots == slots / phases);
        int Move(int slot, int k) => (slot - 1 + k * r) % slots + 1;
        var coils = Enumerable.Range(0, phases).SelectMany(k => first.Select(c => c with { Phase = k, GoSlot = Move(c.GoSlot, k), ReturnSlot = Move(c.ReturnSlot, k) }));
        return Designs.Create(slots, poles, phases, coils);
    }

    private static int Gcd(int a, int b) => b == 0 ? a : Gcd(b, a % b);
}
