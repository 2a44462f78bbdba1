using System.Globalization;

namespace WindScript.Sweep;

/// <summary>
/// Shard K of N (1 ≤ K ≤ N): a contiguous block of the sweep's layouts, cut where the
/// cumulative work crosses K−1 and K N-ths of the total. Every shard computes the same cuts,
/// so the shards' outputs concatenated in order K = 1..N are the single-machine output.
/// </summary>
public readonly record struct SweepShard(int Index, int Count)
{
    /// <summary>The whole sweep as one shard (1/1).</summary>
    public static readonly SweepShard Whole = new(1, 1);

    /// <summary>True if this shard is the whole sweep.</summary>
    public bool IsWhole => Count == 1;

    /// <summary>Reads "K/N"; null with a message otherwise.</summary>
    public static SweepShard? Parse(string text, out string? error)
    {
        error = null;
        var parts = text.Split('/');
        if (parts.Length == 2
            && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int k)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int n)
            && n >= 1 && k >= 1 && k <= n)
            return new SweepShard(k, n);
        error = $"'{text}' is not a shard: write K/N with 1 <= K <= N, e.g. 3/8, or auto";
        return null;
    }

    /// <summary>True if a layout whose work starts at <paramref name="start"/> of <paramref name="total"/> belongs to this shard.</summary>
    public bool Holds(long start, long total) => total <= 0 || (int)((Int128)start * Count / total) == Index - 1;

    /// <summary>"K/N".</summary>
    public override string ToString() => $"{Index}/{Count}";
}
