using System.Collections.Immutable;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

/// <summary>Builds winding designs in code for the analysis tests (fictional machines).</summary>
internal static class Designs
{
    public static WindingDesign Create(int slots, int poles, int phases, IEnumerable<Coil> coils, int layers = 2, int paths = 1,
        Geometry? geometry = null, double? phaseShiftDegrees = null, ImmutableArray<Drive> drives = default) => new()
    {
        Name = "test_machine",
        Slots = slots,
        Poles = poles,
        Phases = [.. Enumerable.Range(0, phases).Select(k => new Phase(((char)('A' + k)).ToString(), k))],
        PhaseShiftDegrees = phaseShiftDegrees ?? 360.0 / phases,
        Geometry = geometry ?? new Geometry(),
        Winding = new Winding { Name = "w", Layers = layers, Paths = paths, Coils = [.. coils] },
        Drives = drives.IsDefault ? [] : drives,
    };

    /// <summary>
    /// An integral-slot winding with phase belts of q = Q/(2pm) adjacent slots (spread π/m, odd m):
    /// double layer with coil pitch y (top layer go side, bottom layer return side), or single
    /// layer with full-pitch coils from the positive belts.
    /// </summary>
    public static WindingDesign IntegralSlot(int slots, int poles, int pitch, int layers = 2, int turns = 10, int phases = 3,
        int paths = 1, Geometry? geometry = null, ImmutableArray<Drive> drives = default)
    {
        int q = slots / (poles * phases);
        if (q * poles * phases != slots) throw new ArgumentException("not an integral-slot combination");
        var coils = new List<Coil>();
        for (int s = 0; s < slots; s++)
        {
            var (phase, sign) = Belt(s / q, phases);
            if (layers == 2)
                coils.Add(new Coil { Phase = phase, GoSlot = s + 1, ReturnSlot = (s + pitch) % slots + 1, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = sign });
            else if (sign > 0)
                coils.Add(new Coil { Phase = phase, GoSlot = s + 1, ReturnSlot = (s + phases * q) % slots + 1, GoLayer = 0, ReturnLayer = 0, Turns = turns, Polarity = 1 });
        }
        return Create(slots, poles, phases, coils, layers, paths, geometry, drives: drives);
    }

    /// <summary>
    /// A tooth-coil (concentrated) winding laid out by the star of slots: the coil round tooth i
    /// (slot i to i + 1) has EMF angle p·2πi/Q and joins the phase whose 60° (π/m) sector holds it.
    /// Single layer: only every other tooth carries a coil.
    /// </summary>
    public static WindingDesign ToothCoils(int slots, int poles, int layers = 2, int turns = 10, int phases = 3, Geometry? geometry = null, ImmutableArray<Drive> drives = default)
    {
        int p = poles / 2;
        var coils = new List<Coil>();
        for (int i = 0; i < slots; i++)
        {
            if (layers == 1 && i % 2 == 1) continue;
            double angle = (double)p * i / slots % 1.0;                     // in turns
            int sector = (int)Math.Floor(angle * 2 * phases + 1e-9) % (2 * phases);
            var (phase, sign) = Belt(sector, phases);
            int go = i + 1, back = (i + 1) % slots + 1;
            coils.Add(layers == 2 ? new Coil { Phase = phase, GoSlot = go, ReturnSlot = back, GoLayer = 1, ReturnLayer = 0, Turns = turns, Polarity = sign } : new Coil { Phase = phase, GoSlot = go, ReturnSlot = back, GoLayer = 0, ReturnLayer = 0, Turns = turns, Polarity = sign });
        }
        return Create(slots, poles, phases, coils, layers, geometry: geometry, drives: drives);
    }

    /// <summary>Belt b (direction b·π/m electrical) to (phase, sign) for odd m with phase axes 2π/m apart.</summary>
    public static (int Phase, int Sign) Belt(int belt, int phases)
    {
        int b = belt % (2 * phases);
        return b % 2 == 0 ? (b / 2, 1) : ((((b - phases) / 2) % phases + phases) % phases, -1);
    }

    /// <summary>A balanced sinusoidal set: i_k = Î cos(ωt + φ0 ∓ k·shift) (− for the positive sequence).</summary>
    public static Drive Balanced(int phases, double peak, double hz, double shiftDegrees, bool reversed = false, double angle0 = 0, string name = "rated")
    {
        double omega = 2 * Math.PI * hz, shift = shiftDegrees * Math.PI / 180;
        return new Drive
        {
            Name = name,
            Currents = [.. Enumerable.Range(0, phases).Select(k => new PhaseCurrent(k,
                [new CurrentComponent(peak, omega, angle0 + (reversed ? 1 : -1) * k * shift)]))],
        };
    }

    public static Drive Direct(string name, params double[] currents) => new()
    {
        Name = name,
        Currents = [.. currents.Select((i, k) => new PhaseCurrent(k, [new CurrentComponent(i, 0, 0)]))],
    };

    /// <summary>The same design with every coil moved forward by <paramref name="shift"/> slots.</summary>
    public static WindingDesign Rotated(WindingDesign design, int shift)
    {
        int q = design.Slots;
        int Move(int slot) => ((slot - 1 + shift) % q + q) % q + 1;
        return design with
        {
            Winding = design.Winding with { Coils = [.. design.Winding.Coils.Select(c => c with { GoSlot = Move(c.GoSlot), ReturnSlot = Move(c.ReturnSlot) })] },
        };
    }

    /// <summary>Electrical order from mechanical.</summary>
    public static double Electrical(int order, WindingDesign d) => (double)order / d.PolePairs;
}
