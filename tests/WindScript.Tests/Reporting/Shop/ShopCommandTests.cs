using WindScript.Tests.Support;

namespace WindScript.Tests.Reporting.Shop;

/// <summary><c>windscript shop</c> writes its files under the output rules and refuses what would lose data.</summary>
public sealed class ShopCommandTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-shop-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string Example(string name) => Path.Combine(Repo.Examples, name);

    [Fact]
    public void Writes_the_sheet_and_every_table_as_csv()
    {
        string html = Path.Combine(_dir, "sheet.html");
        var r = CliRunner.Run("shop", Example("mill_fan_lap.wind"), "--html", html, "--csv", _dir);
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("<svg", File.ReadAllText(html));
        foreach (var id in WindScript.Reporting.Shop.ShopTables.Ids) Assert.True(File.Exists(Path.Combine(_dir, id + ".csv")), id);
        Assert.Equal(49, File.ReadAllLines(Path.Combine(_dir, "coils.csv")).Length);
        Assert.Empty(Directory.EnumerateFiles(_dir, "*.tmp"));
    }

    [Fact]
    public void Asks_for_an_output_and_an_existing_csv_directory()
    {
        Assert.Equal(2, CliRunner.Run("shop", Example("mill_fan_lap.wind")).Exit);
        var r = CliRunner.Run("shop", Example("mill_fan_lap.wind"), "--csv", Path.Combine(_dir, "missing"));
        Assert.Equal(2, r.Exit);
        Assert.Contains("--csv", r.Err);
        Assert.Equal(2, CliRunner.Run("shop", Example("mill_fan_lap.wind"), "--html", Path.Combine(_dir, "x.html"), "--paper", "a3").Exit);
    }

    [Fact]
    public void Never_writes_over_its_input()
    {
        string input = Path.Combine(_dir, "m.wind");
        File.Copy(Example("mill_fan_lap.wind"), input);
        string before = File.ReadAllText(input);
        var r = CliRunner.Run("shop", input, "--html", input);
        Assert.Equal(2, r.Exit);
        Assert.Contains("input", r.Err);
        Assert.Equal(before, File.ReadAllText(input));
    }

    [Fact]
    public void A_file_with_errors_gets_no_sheet()
    {
        string input = Path.Combine(_dir, "bad.wind");
        File.WriteAllText(input, "machine m {\n  slots 12\n  poles 2\n  phases U\n  bore 150\n}\n");
        string html = Path.Combine(_dir, "bad.html");
        Assert.Equal(1, CliRunner.Run("shop", input, "--html", html).Exit);
        Assert.False(File.Exists(html));
    }

    [Fact]
    public void A_pdf_that_cannot_be_printed_leaves_no_file_at_all()
    {
        string html = Path.Combine(_dir, "sheet.html"), pdf = Path.Combine(_dir, "sheet.pdf");
        var r = CliRunner.Run("shop", Example("scooter_hub_12s10p.wind"), "--html", html, "--pdf", pdf, "--browser", Path.Combine(_dir, "no-such-browser"));
        Assert.Equal(2, r.Exit);
        Assert.Contains("--pdf", r.Err);
        Assert.False(File.Exists(html));
        Assert.False(File.Exists(pdf));
    }
}
