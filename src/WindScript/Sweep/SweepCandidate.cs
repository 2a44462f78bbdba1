namespace WindScript.Sweep;

/// <summary>One layout to evaluate: slot and pole counts, the pitch (0 = the pole-pitch rule, resolved when laid out), phases and layers.</summary>
public readonly record struct SweepCandidate(int Slots, int Poles, int Pitch, int Phases = 3, int Layers = 2)
{
    /// <summary>Relative cost, for splitting a sweep into shards of similar work: the spectrum is O(Q²), the output O(orders).</summary>
    public long Weight(int orders) => (long)Slots * Slots / 2 + 8L * orders + 64;
}
