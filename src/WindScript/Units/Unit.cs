namespace WindScript.Units;

/// <summary>A unit symbol as written in source, its dimension, and its factor to SI (rad for angles).</summary>
internal sealed record Unit(string Symbol, Dimension Dimension, double ToSi)
{
    /// <summary>A second spelling of another unit ('slot' for 'slots'): accepted, but not offered in completion.</summary>
    public bool IsAlias { get; init; }
}
