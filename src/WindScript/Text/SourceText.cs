namespace WindScript.Text;

/// <summary>
/// The text of one source file with its line starts. Offsets are the currency inside the
/// compiler; line/column pairs are computed here, at the edges, for display and LSP.
/// </summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    /// <summary>A text and the path that names it in diagnostics.</summary>
    public SourceText(string text, string path = "")
    {
        Text = text;
        Path = path;
        _lineStarts = ComputeLineStarts(text);
    }

    /// <summary>The whole text.</summary>
    public string Text { get; }

    /// <summary>The file path as the user gave it ("-" or "" for standard input).</summary>
    public string Path { get; }

    /// <summary>Length in UTF-16 code units.</summary>
    public int Length => Text.Length;

    /// <summary>Number of lines.</summary>
    public int LineCount => _lineStarts.Length;

    /// <summary>Offset where a line (0-based) starts.</summary>
    public int LineStart(int line) => _lineStarts[line];

    /// <summary>Line and column (0-based, UTF-16) of an offset.</summary>
    public LinePosition GetPosition(int offset)
    {
        offset = Math.Clamp(offset, 0, Text.Length);
        int line = Array.BinarySearch(_lineStarts, offset);
        if (line < 0) line = ~line - 1;
        return new LinePosition(line, offset - _lineStarts[line]);
    }

    /// <summary>Offset of a line and column (0-based), clamped to the line and the text.</summary>
    public int GetOffset(LinePosition position)
    {
        if (position.Line < 0) return 0;
        if (position.Line >= _lineStarts.Length) return Text.Length;
        int start = _lineStarts[position.Line];
        int end = position.Line + 1 < _lineStarts.Length ? _lineStarts[position.Line + 1] : Text.Length;
        return Math.Min(start + Math.Max(0, position.Character), end);
    }

    /// <summary>The text of a line (0-based), without its line break.</summary>
    public string GetLineText(int line)
    {
        int start = _lineStarts[line];
        int end = line + 1 < _lineStarts.Length ? _lineStarts[line + 1] : Text.Length;
        return Text[start..end].TrimEnd('\r', '\n');
    }

    /// <summary>The text inside a span (clipped to the text).</summary>
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
