using System.Text;

namespace WindScript.Reporting.Shop;

/// <summary>
/// A sheet table as CSV (RFC 4180: a header row, one row per line, a cell quoted when it holds a
/// comma, a quote or a line break), for the shop's spreadsheets and job systems.
/// </summary>
public static class ShopCsv
{
    /// <summary>The file name of a table's CSV ("coils.csv").</summary>
    public static string FileName(ShopTable table) => table.Id + ".csv";

    public static string Write(ShopTable table)
    {
        var o = new StringBuilder();
        Row(o, table.Columns);
        foreach (var row in table.Rows) Row(o, row);
        return o.ToString();
    }

    private static void Row(StringBuilder o, IReadOnlyList<string> cells)
    {
        for (int i = 0; i < cells.Count; i++)
        {
            if (i > 0) o.Append(',');
            string cell = cells[i];
            o.Append(cell.IndexOfAny([',', '"', '\n', '\r']) < 0 ? cell : "\"" + cell.Replace("\"", "\"\"") + "\"");
        }
        o.Append('\n');
    }
}
