using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// An integral-slot winding with phase belts of q adjacent slots (phase spread π/m electrical)
/// and one coil pitch y: the winding whose factors have the closed form k_d·k_p·k_sk.
/// Single-layer windings of this kind match with the full pitch y = m·q.
/// </summary>
public sealed record RegularWinding(int SlotsPerPolePerPhase, int CoilPitch)
{
    /// <summary>
    /// Recognises a regular winding from its conductors (not from how the source wrote it): every
    /// phase must equal, up to a rotation by whole slots and a scale, the reference pattern of
    /// q-slot belts with pitch y, and no slot may hold sides of one phase with opposite signs.
    /// Returns null for any other winding (fractional-slot, 120° belts, concentric with uneven
    /// turns...), whose factors are then given numerically only.
    /// </summary>
    public static RegularWinding? TryRecognise(WindingDesign design)
    {
        int m = design.Phases.Length, q = design.Slots, p = design.PolePairs;
        if (m == 0 || p == 0 || q % (2 * p * m) != 0) return null;
        int belt = q / (2 * p * m);
        var conductors = design.Conductors;
        var phases = new int[m][];
        for (int k = 0; k < m; k++)
        {
            phases[k] = new int[q];
            int sides = WindingFactors.SumLayers(conductors, k, phases[k]);
            int summed = 0;
            foreach (int c in phases[k]) summed += Math.Abs(c);
            if (sides == 0 || sides != summed) return null;   // empty phase, or sides that cancel in a slot
        }
        var reference = new int[q];
        for (int pitch = 1; pitch < 2 * m * belt; pitch++)
        {
            // A pitch whose go and return sides cancel inside a belt (y < q) gives a smaller
            // closed-form factor than the same pattern without the cancelling sides: skip it.
            if (!Reference(belt, m, pitch, reference)) continue;
            if (phases.All(c => MatchesRotated(c, reference))) return new RegularWinding(belt, pitch);
        }
        return null;
    }

    /// <summary>
    /// Layer-summed conductors of the reference phase: top-layer belts, bottom layer = top shifted
    /// by y, reversed. Returns false when a slot holds a go and a return side of the phase (they cancel).
    /// </summary>
    internal static bool Reference(int belt, int phases, int pitch, Span<int> pattern)
    {
        int q = pattern.Length;
        bool cancels = false;
        for (int s = 0; s < q; s++)
        {
            int top = Top(s), bottom = -Top(((s - pitch) % q + q) % q);
            cancels |= top != 0 && top == -bottom;
            pattern[s] = top + bottom;
        }
        return !cancels;

        int Top(int slot)
        {
            int b = slot / belt % (2 * phases);
            return b == 0 ? 1 : b == phases ? -1 : 0;
        }
    }

    private static bool MatchesRotated(int[] actual, int[] reference)
    {
        int q = actual.Length;
        for (int shift = 0; shift < q; shift++)
        {
            // Equal up to a scale λ = a / r0, compared by cross-multiplying (λ may be fractional).
            int first = Array.FindIndex(reference, r => r != 0);
            int a = actual[(first + shift) % q], r0 = reference[first];
            if (a == 0) continue;
            bool all = true;
            for (int s = 0; s < q && all; s++) all = actual[(s + shift) % q] * r0 == a * reference[s];
            if (all) return true;
        }
        return false;
    }
}
