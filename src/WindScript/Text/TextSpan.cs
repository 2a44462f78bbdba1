namespace WindScript.Text;

/// <summary>A half-open range [Start, Start + Length) of UTF-16 code units in a source text.</summary>
public readonly record struct TextSpan(int Start, int Length)
{
    public int End => Start + Length;

    public static TextSpan FromBounds(int start, int end) => new(start, Math.Max(0, end - start));

    public bool Contains(int offset) => offset >= Start && offset < End;

    public bool Contains(TextSpan other) => other.Start >= Start && other.End <= End;

    public TextSpan Cover(TextSpan other) => FromBounds(Math.Min(Start, other.Start), Math.Max(End, other.End));

    public override string ToString() => $"[{Start}..{End})";
}
