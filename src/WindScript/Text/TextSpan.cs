namespace WindScript.Text;

/// <summary>A half-open range [Start, Start + Length) of UTF-16 code units in a source text.</summary>
public readonly record struct TextSpan(int Start, int Length)
{
    /// <summary>Offset just past the span.</summary>
    public int End => Start + Length;

    /// <summary>The span from <paramref name="start"/> to <paramref name="end"/>.</summary>
    public static TextSpan FromBounds(int start, int end) => new(start, Math.Max(0, end - start));

    /// <summary>True if the offset lies inside the span.</summary>
    public bool Contains(int offset) => offset >= Start && offset < End;

    /// <summary>True if the other span lies inside this one.</summary>
    public bool Contains(TextSpan other) => other.Start >= Start && other.End <= End;

    /// <summary>The smallest span covering both.</summary>
    public TextSpan Cover(TextSpan other) => FromBounds(Math.Min(Start, other.Start), Math.Max(End, other.End));

    /// <summary>"[start..end)".</summary>
    public override string ToString() => $"[{Start}..{End})";
}
