using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Synthesis;

/// <summary>What became of an attempt to lay out a winding with a given pitch.</summary>
internal enum LayoutOutcome
{
    /// <summary>A balanced layout: every phase is the previous one shifted by <see cref="StarLayout.PhaseStep"/> slots.</summary>
    Balanced,

    /// <summary>The slot, pole and phase counts admit no balanced winding (see <see cref="Feasibility"/>).</summary>
    Infeasible,

    /// <summary>Single layer: stepping by the pitch visits an odd number of slots before returning, so go and return sides cannot alternate.</summary>
    OddCycle,

    /// <summary>Single layer: this pitch yields go sides whose star is not balanced.</summary>
    Unbalanced,

    /// <summary>The coil spans a whole number of pole pairs (y·p a multiple of Q): it links no working flux.</summary>
    NoFundamental,
}

/// <summary>
/// The star of slots (Bianchi &amp; Dai Pre, IEE Proc. Electr. Power Appl., 2006): slot s
/// (0-based) has the EMF phasor of electrical angle p·s·360°/Q; each phasor joins the phase belt
/// whose sector holds it (<see cref="PhaseBelts"/>).
/// Double layer: slot s carries in its top layer the go side of a coil of that phase and sign,
/// returning one pitch on in the bottom layer. Single layer: the go sides are every other slot
/// along the chain s, s + y, s + 2y, ... (blocks of g = gcd(Q, y) slots), each laid out by its
/// phasor; their returns fill the remaining slots.
/// </summary>
internal static class StarOfSlots
{
    /// <summary>Lays out the winding into <paramref name="layout"/> (reused) and says whether it is balanced.</summary>
    public static LayoutOutcome Lay(int slots, int polePairs, PhaseBelts belts, int layers, int pitch, StarLayout layout)
    {
        layout.Reset(slots, polePairs, layers, pitch);
        if (pitch < 1 || pitch >= slots) throw new ArgumentOutOfRangeException(nameof(pitch), $"the coil pitch must be 1 to {slots - 1} slots");
        if (!Feasibility.IsFeasible(slots, polePairs, belts, layers)) return LayoutOutcome.Infeasible;
        if ((long)pitch * polePairs % slots == 0) return LayoutOutcome.NoFundamental;
        if (layers == 2) LayDouble(slots, polePairs, belts, pitch, layout);
        else if (!LaySingle(slots, polePairs, belts, pitch, layout)) return LayoutOutcome.OddCycle;

        layout.PhaseStep = FindPhaseStep(slots, polePairs, belts, layout);
        return layout.PhaseStep < 0 ? LayoutOutcome.Unbalanced : LayoutOutcome.Balanced;
    }

    /// <summary>Electrical position of slot s on the star, in Q-ths of a turn.</summary>
    public static int Position(int slot, int polePairs, int slots) => (int)((long)polePairs * slot % slots);

    private static void LayDouble(int slots, int polePairs, PhaseBelts belts, int pitch, StarLayout layout)
    {
        for (int s = 0; s < slots; s++)
        {
            var (phase, sign) = belts.BeltAt(Position(s, polePairs, slots), slots);
            layout.Set(s, 0, phase, sign);
            layout.Set((s + pitch) % slots, 1, phase, -sign);
            layout.SetCoil(s, sign);
        }
        layout.ForwardCoils = true;
    }

    private static bool LaySingle(int slots, int polePairs, PhaseBelts belts, int pitch, StarLayout layout)
    {
        int g = (int)WindScript.Numerics.IntegerMath.Gcd(slots, pitch);
        if (slots / g % 2 != 0) return false;
        for (int s = 0; s < slots; s++)
        {
            if (s % (2 * g) >= g) continue;   // a return side
            var (phase, sign) = belts.BeltAt(Position(s, polePairs, slots), slots);
            layout.Set(s, 0, phase, sign);
            layout.Set((s + pitch) % slots, 0, phase, -sign);
            layout.SetCoil(s, sign);
        }
        layout.ForwardCoils = PairsForward(slots, pitch, layout);
        if (layout.ForwardCoils)
        {
            // Re-pair as the slot pattern reads it: every + side goes to the − side one pitch on.
            for (int s = 0; s < slots; s++) layout.SetCoil(s, layout.SignAt(s, 0) > 0 ? 1 : 0);
        }
        return true;
    }

    // True if each + side has a − side of its phase one pitch on (then all coils can run forward).
    private static bool PairsForward(int slots, int pitch, StarLayout layout)
    {
        for (int s = 0; s < slots; s++)
        {
            if (layout.SignAt(s, 0) <= 0) continue;
            int r = (s + pitch) % slots;
            if (layout.PhaseAt(r, 0) != layout.PhaseAt(s, 0) || layout.SignAt(r, 0) >= 0) return false;
        }
        return true;
    }

    // A slot shift Δ with p·Δ ≡ Q·φ/360° (mod Q) under which every coil side becomes the
    // coil side of the next phase (the belt rotated by φ); −1 if none of the t candidates works.
    private static int FindPhaseStep(int slots, int polePairs, PhaseBelts belts, StarLayout layout)
    {
        int first = Feasibility.PhaseStep(slots, polePairs, belts);
        if (first < 0) return -1;
        int t = (int)WindScript.Numerics.IntegerMath.Gcd(slots, polePairs);
        for (int i = 0; i < t; i++)
        {
            int delta = (first + i * (slots / t)) % slots;
            if (MapsOntoNextPhase(delta, belts, layout)) return delta;
        }
        return -1;
    }

    private static bool MapsOntoNextPhase(int delta, PhaseBelts belts, StarLayout layout)
    {
        int q = layout.Slots;
        for (int l = 0; l < layout.Layers; l++)
            for (int s = 0; s < q; s++)
            {
                int phase = layout.PhaseAt(s, l), to = (s + delta) % q;
                if (phase < 0)
                {
                    if (layout.PhaseAt(to, l) >= 0) return false;
                    continue;
                }
                var (next, sign) = belts.Rotate(phase, layout.SignAt(s, l));
                if (layout.PhaseAt(to, l) != next || layout.SignAt(to, l) != sign) return false;
            }
        return true;
    }
}
