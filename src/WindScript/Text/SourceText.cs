namespace WindScript.Text;

/// <summary>
/// The text of one source file with its line starts. Offsets are the currency inside the
/// compiler; line/column pairs are computed here, at the edges, for display and LSP.
/// </summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    public SourceText(string text, string path = "")
    {
        Text = text;
        Path = path;
        _lineStarts = ComputeLineStarts(text);
    }

    public string Text { get; }

    /// <summary>The file path as the user gave it ("-" or "" for standard input).</summary>
    public string Path { get; }

    public int Length => Text.Length;

    public int LineCount => _lineStarts.Length;

    public int LineStart(int line) => _lineStarts[line];

    public LinePosition GetPosition(int offset)
    {
        offset = Math.Clamp(offset, 0, Text.Length);
        int line = Array.BinarySearch(_lineStarts, offset);
        if (line < 0) line = ~line - 1;
        return new LinePosition(line, offset - _lineStarts[line]);
    }

    public int GetOffset(LinePosition position)
    {
        if (position.Line < 0) return 0;
        if (position.Line >= _lineStarts.Length) return Text.Length;
        int start = _lineStarts[position.Line];
        int end = position.Line + 1 < _lineStarts.Length ? _lineStarts[position.Line + 1] : Text.Length;
        return Math.Min(start + Math.Max(0, position.Character), end);
    }

    public string GetLineText(int line)
    {
        int start = _lineStarts[line];
        int end = line + 1 < _lineStarts.Length ? _lineStarts[line + 1] : Text.Length;
        return Text[start..end].TrimEnd('\r', '\n');
    }

    public string Slice(TextSpan span) => Text.Substring(span.Start, Math.Min(span.Length, Text.Length - span.Start));

    private static int[] ComputeLineStarts(string text)
    {
        var starts = new List<int> { 0 };
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (c == '\r')
            {
                if (i + 1 < text.Length && text[i + 1] == '\n') i++;
                starts.Add(i + 1);
            }
            else if (c == '\n')
            {
                starts.Add(i + 1);
            }
        }
        return starts.ToArray();
    }
}
