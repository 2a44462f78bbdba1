namespace WindScript.Cli.Output;

/// <summary>
/// A plain-text table under a title line: a marker column (" ", "~" changed, "+" added,
/// "-" removed), a left-aligned first column and right-aligned columns after it, each as wide
/// as its widest cell. The header names the columns after the first.
/// </summary>
public sealed class TextTable
{
    private readonly List<(string Marker, string[] Cells)> _rows = [];
    private readonly string _title;
    private readonly string[] _header;

    public TextTable(string title, params string[] columns)
    {
        _title = title;
        _header = ["", .. columns];
    }

    public TextTable Add(string marker, params string[] cells)
    {
        _rows.Add((marker, cells));
        return this;
    }

    public int Count => _rows.Count;

    public void Write(TextWriter o)
    {
        int columns = Math.Max(_header.Length, _rows.Count == 0 ? 0 : _rows.Max(r => r.Cells.Length));
        var widths = new int[columns];
        foreach (var cells in _rows.Select(r => r.Cells).Append(_header))
            for (int c = 0; c < cells.Length; c++) widths[c] = Math.Max(widths[c], cells[c].Length);
        o.WriteLine("  " + _title);
        WriteRow(o, " ", _header, widths);
        foreach (var (marker, cells) in _rows) WriteRow(o, marker, cells, widths);
    }

    private static void WriteRow(TextWriter o, string marker, string[] cells, int[] widths)
    {
        var line = new System.Text.StringBuilder(marker).Append(' ');
        for (int c = 0; c < cells.Length; c++)
        {
            if (c > 0) line.Append("  ");
            line.Append(c == 0 ? cells[c].PadRight(widths[c]) : cells[c].PadLeft(widths[c]));
        }
        o.WriteLine(line.ToString().TrimEnd());
    }
}
