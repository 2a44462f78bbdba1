using WindScript.Model;

namespace WindScript.Emit;

/// <summary>
/// Recognises a winding that the slot-pattern form reproduces exactly: one group, one pitch,
/// one turn count, and coil sides that the pattern rule pairs back into the same coils.
/// Double layer: every coil goes from the top layer to the bottom layer one pitch on, at most
/// one per slot (the top pattern lists them). Single layer: every coil runs forward with
/// polarity +1 and every slot holds at most one coil side (the slots pattern lists them).
/// </summary>
internal sealed record PatternForm(int Pitch, int Turns, (int Phase, int Sign)[] Entries)
{
    /// <summary>The entries per slot (phase −1 for '_'), or null when the pattern form would not give back these coils.</summary>
    public static PatternForm? TryCreate(WindingDesign design)
    {
        var coils = design.Winding.Coils;
        int q = design.Slots, m = design.Phases.Length;
        if (coils.IsDefaultOrEmpty || q < 2) return null;
        var first = coils[0];
        int pitch = first.PitchSlots(q), turns = first.Turns;
        if (pitch < 1) return null;
        var entries = new (int Phase, int Sign)[q];
        Array.Fill(entries, (-1, 0));
        bool single = design.Winding.Layers == 1;
        foreach (var c in coils)
        {
            if (c.Group != "" || c.Turns != turns || c.PitchSlots(q) != pitch) return null;
            if (c.Phase < 0 || c.Phase >= m || c.Polarity is not (1 or -1)) return null;
            if (c.GoSlot < 1 || c.GoSlot > q || c.ReturnSlot < 1 || c.ReturnSlot > q) return null;
            if (single)
            {
                if (c.Polarity != 1 || c.GoLayer != 0 || c.ReturnLayer != 0) return null;
                if (!Claim(entries, c.GoSlot, c.Phase, 1) || !Claim(entries, c.ReturnSlot, c.Phase, -1)) return null;
            }
            else
            {
                if (c.GoLayer != 0 || c.ReturnLayer != 1) return null;
                if (!Claim(entries, c.GoSlot, c.Phase, c.Polarity)) return null;
            }
        }
        return new PatternForm(pitch, turns, entries);
    }

    private static bool Claim((int Phase, int Sign)[] entries, int slot, int phase, int sign)
    {
        if (entries[slot - 1].Phase >= 0) return false;
        entries[slot - 1] = (phase, sign);
        return true;
    }

    /// <summary>The shortest period P (dividing Q) after which the entries repeat.</summary>
    public int Period()
    {
        int q = Entries.Length;
        for (int period = 1; period < q; period++)
        {
            if (q % period != 0) continue;
            bool repeats = true;
            for (int s = period; s < q && repeats; s++) repeats = Entries[s] == Entries[s - period];
            if (repeats) return period;
        }
        return q;
    }
}
