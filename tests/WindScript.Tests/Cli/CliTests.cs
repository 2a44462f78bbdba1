using System.Text.Json;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

public sealed class CliTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-cli-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Write(string name, string text)
    {
        var path = Path.Combine(_dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    private static string Example(string name) => Path.Combine(Repo.Examples, name);

    [Fact]
    public void Check_of_a_clean_file_exits_0_and_prints_nothing()
    {
        var r = CliRunner.Run("check", Example("mill_fan_lap.wind"), Example("pump_skid_single_layer.wind"));
        Assert.True(r.Exit == 0, r.Err);
        Assert.Equal("", r.Out);
    }

    [Fact]
    public void Check_prints_file_line_column_severity_code_and_message_and_exits_1()
    {
        var path = Write("bad.wind", "machine m {\n  slots 12\n  poles 2\n  phases U\n  bore 150\n}\n");
        var r = CliRunner.Run("check", path);
        Assert.Equal(1, r.Exit);
        Assert.Contains($"{path}(5,8): error WS2010: expected a length unit such as mm after 150", r.Out);
    }

    [Fact]
    public void Check_json_has_one_based_positions_and_every_field()
    {
        var path = Write("bad.wind", "machine m {\n  slots 12\n  poles 2\n  phases U\n  bore 150\n}\n");
        var r = CliRunner.Run("check", path, "--format", "json");
        using var doc = JsonDocument.Parse(r.Out);
        var d = doc.RootElement.GetProperty("diagnostics").EnumerateArray().First(x => x.GetProperty("code").GetString() == "WS2010");
        Assert.Equal(path, d.GetProperty("file").GetString());
        Assert.Equal(5, d.GetProperty("line").GetInt32());
        Assert.Equal(8, d.GetProperty("column").GetInt32());
        Assert.Equal(5, d.GetProperty("endLine").GetInt32());
        Assert.Equal(11, d.GetProperty("endColumn").GetInt32());
        Assert.Equal("error", d.GetProperty("severity").GetString());
        Assert.StartsWith("expected a length unit", d.GetProperty("message").GetString());
    }

    [Fact]
    public void Check_reads_standard_input_for_a_dash()
    {
        var r = CliRunner.RunWithInput("machine m {\n  bore 3\n}\n", "check", "-");
        Assert.Equal(1, r.Exit);
        Assert.Contains("<stdin>(2,8): error WS2010", r.Out);
    }

    [Fact]
    public void Warnings_fail_only_when_asked()
    {
        var text = File.ReadAllText(Example("pump_skid_single_layer.wind")) + "\nlet spare = 3\n";
        var path = Write("warn.wind", text);
        Assert.Equal(0, CliRunner.Run("check", path).Exit);
        Assert.Equal(1, CliRunner.Run("check", path, "--warnings-as-errors").Exit);
    }

    [Fact]
    public void Usage_errors_exit_2()
    {
        Assert.Equal(2, CliRunner.Run("check", Path.Combine(_dir, "missing.wind")).Exit);
        Assert.Equal(2, CliRunner.Run("check", "--format", "yaml", Example("drone_18s16p.wind")).Exit);
        Assert.Equal(2, CliRunner.Run("no-such-command").Exit);
        Assert.Equal(2, CliRunner.Run().Exit);
    }

    [Fact]
    public void Eval_prints_machine_turns_and_layout()
    {
        var r = CliRunner.Run("eval", Example("mill_fan_lap.wind"));
        Assert.Equal(0, r.Exit);
        Assert.Contains("slots Q            48", r.Out);
        Assert.Matches(@"U\s+16\s+96\s+48", r.Out);
        Assert.Contains("slot layout", r.Out);
    }

    [Fact]
    public void Fmt_rewrites_a_file_into_canonical_form()
    {
        var path = Write("messy.wind", "machine m{\nslots 6\n}\n");
        var r = CliRunner.Run("fmt", path);
        Assert.Equal(0, r.Exit);
        Assert.Equal("machine m {\n  slots 6\n}\n", File.ReadAllText(path));
        Assert.Empty(Directory.GetFiles(_dir, "*.tmp"));
    }

    [Fact]
    public void Fmt_check_reports_without_writing()
    {
        var path = Write("messy.wind", "machine m{\nslots 6\n}\n");
        var r = CliRunner.Run("fmt", "--check", path);
        Assert.Equal(1, r.Exit);
        Assert.Equal("machine m{\nslots 6\n}\n", File.ReadAllText(path));
        Assert.Equal(0, CliRunner.Run("fmt", "--check", Example("drone_18s16p.wind")).Exit);
    }

    [Fact]
    public void Fmt_refuses_a_file_with_syntax_errors_and_leaves_it_untouched()
    {
        const string broken = "machine m {\n  slots\n}\n";
        var path = Write("broken.wind", broken);
        var r = CliRunner.Run("fmt", path);
        Assert.Equal(1, r.Exit);
        Assert.Equal(broken, File.ReadAllText(path));
        Assert.Contains("WS1001", r.Err);
    }

    [Fact]
    public void Fmt_of_standard_input_prints_to_standard_output()
    {
        var r = CliRunner.RunWithInput("let x=1\n", "fmt", "-");
        Assert.Equal(0, r.Exit);
        Assert.Equal("let x = 1\n", r.Out);
    }
}
