using WindScript.Reporting.Shop;
using WindScript.Tests.Support;

namespace WindScript.Tests.Reporting.Shop;

/// <summary>The CSV tables follow RFC 4180 and say what the page says.</summary>
public class ShopCsvTests
{
    [Fact]
    public void Cells_with_commas_quotes_or_line_breaks_are_quoted_as_RFC_4180_says()
    {
        var table = new ShopTable("t", "T", ["a", "b,c"], [["say \"hi\"", "x\ny"], ["1", ""]]);
        Assert.Equal("a,\"b,c\"\n\"say \"\"hi\"\"\",\"x\ny\"\n1,\n", ShopCsv.Write(table));
    }

    [Fact]
    public void Every_table_of_an_example_has_a_header_and_one_line_per_row()
    {
        var c = Compilation.Compile(File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind")), "mill_fan_lap.wind");
        var sheet = ShopSheetBuilder.Build(c.Design!, "mill_fan_lap.wind");
        var tables = ShopTables.All(sheet);
        Assert.Equal(ShopTables.Ids, tables.Select(t => t.Id));
        foreach (var t in tables)
        {
            var lines = ShopCsv.Write(t).Split('\n', StringSplitOptions.RemoveEmptyEntries);
            Assert.Equal(t.Rows.Count + 1, lines.Length);
            Assert.All(t.Rows, r => Assert.Equal(t.Columns.Count, r.Count));
        }
        Assert.Equal(48, tables.Single(t => t.Id == "coils").Rows.Count);
    }
}
