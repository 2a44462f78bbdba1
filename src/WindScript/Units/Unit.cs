namespace WindScript.Units;

/// <summary>A unit symbol as written in source, its dimension, and its factor to SI (rad for angles).</summary>
internal sealed record Unit(string Symbol, Dimension Dimension, double ToSi);
