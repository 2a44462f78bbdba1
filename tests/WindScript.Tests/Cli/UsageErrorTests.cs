using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// Issue 11 item 8 and issue 13 finding 9: every option of every command given a value of the
/// wrong type or out of range exits 2 with one line that names the option; exit 3 is for bugs.
/// </summary>
public sealed class UsageErrorTests
{
    private static string Example => Path.Combine(Repo.Examples, "coil_fixture_ac.wind");

    /// <summary>(option named in the message, the arguments). Every option of every command is here at least once.</summary>
    public static TheoryData<string, string[]> BadValues()
    {
        string f = Example;
        var data = new TheoryData<string, string[]>();
        void Add(string option, params string[] args) => data.Add(option, args);
        Add("--format", "check", f, "--format", "xml");
        Add("--warnings-as-errors", "check", f, "--warnings-as-errors=perhaps");
        Add("--format", "eval", f, "--format", "yaml");
        Add("--orders", "eval", f, "--orders", "abc");
        Add("--orders", "eval", f, "--orders", "2.5");
        Add("--orders", "eval", f, "--orders", "0");
        Add("--orders", "eval", f, "--orders", "99999999999");
        Add("--at", "eval", f, "--at", "soon");
        Add("--at", "eval", f, "--at", "1e308");
        Add("--check", "fmt", f, "--check=maybe");
        Add("--stdout", "fmt", f, "--stdout=maybe");
        Add("--slots", "synth", "--slots", "many", "--poles", "4");
        Add("--slots", "synth", "--slots", "1", "--poles", "4");
        Add("--slots", "synth", "--slots", "2147483648", "--poles", "4");
        Add("--poles", "synth", "--slots", "24", "--poles", "x");
        Add("--poles", "synth", "--slots", "24", "--poles", "5");
        Add("--poles", "synth", "--slots", "24", "--poles", "100000");
        Add("--phases", "synth", "--slots", "24", "--poles", "4", "--phases", "three");
        Add("--phases", "synth", "--slots", "24", "--poles", "4", "--phases", "1000");
        Add("--layers", "synth", "--slots", "24", "--poles", "4", "--layers", "3");
        Add("--pitch", "synth", "--slots", "24", "--poles", "4", "--pitch", "long");
        Add("--pitch", "synth", "--slots", "24", "--poles", "4", "--pitch", "24");
        Add("--turns", "synth", "--slots", "24", "--poles", "4", "--turns", "0");
        Add("--turns", "synth", "--slots", "24", "--poles", "4", "--turns", "2000000000");
        Add("--paths", "synth", "--slots", "24", "--poles", "4", "--paths", "-1");
        Add("--name", "synth", "--slots", "24", "--poles", "4", "--name", "9lives");
        Add("--output", "synth", "--slots", "24", "--poles", "4", "--output", "/");
        Add("--slots", "sweep", "--slots", "a..b", "--poles", "2..4");
        Add("--slots", "sweep", "--slots", "6..100000", "--poles", "2..4");
        Add("--slots", "sweep", "--slots", "40..6", "--poles", "2..4");
        Add("--poles", "sweep", "--slots", "6..12", "--poles", "2..x");
        Add("--poles", "sweep", "--slots", "6..12", "--poles", "3");
        Add("--phases", "sweep", "--slots", "6..12", "--poles", "2..4", "--phases", "0");
        Add("--layers", "sweep", "--slots", "6..12", "--poles", "2..4", "--layers", "two");
        Add("--pitch", "sweep", "--slots", "6..12", "--poles", "2..4", "--pitch", "crooked");
        Add("--orders", "sweep", "--slots", "6..12", "--poles", "2..4", "--orders", "100000");
        Add("--format", "sweep", "--slots", "6..12", "--poles", "2..4", "--format", "xml");
        Add("--shard", "sweep", "--slots", "6..12", "--poles", "2..4", "--shard", "9/4");
        Add("--threads", "sweep", "--slots", "6..12", "--poles", "2..4", "--threads", "100000");
        Add("--threads", "sweep", "--slots", "6..12", "--poles", "2..4", "--threads", "lots");
        Add("--shards", "sweep", "--slots", "6..12", "--poles", "2..4", "--shard", "auto", "--shards", "0");
        Add("--shards", "sweep", "--slots", "6..12", "--poles", "2..4", "--shard", "auto", "--shards", "some");
        Add("--output", "sweep", "--slots", "6..12", "--poles", "2..4", "--output", "/nonexistent-dir/part.jsonl");
        Add("--skip-existing", "sweep", "--slots", "6..12", "--poles", "2..4", "--skip-existing=often");
        Add("--format", "diff", f, f, "--format", "html");
        Add("--kind", "plot", f, "--kind", "pie", "-o", "x.svg");
        Add("--at", "plot", f, "--kind", "mmf", "--at", "noon", "-o", Path.Combine(Path.GetTempPath(), "windscript-usage.svg"));
        Add("--at", "plot", f, "--kind", "mmf", "--at", "1e308", "-o", Path.Combine(Path.GetTempPath(), "windscript-usage.svg"));
        Add("--drive", "plot", f, "--kind", "mmf", "--drive", "nosuch", "-o", Path.Combine(Path.GetTempPath(), "windscript-usage.svg"));
        Add("--output", "plot", f, "--kind", "mmf", "-o", "picture.txt");
        Add("--output", "report", f, "-o", "/");
        Add("--stdio", "lsp", "--stdio=sometimes");
        Add("--bogus", "check", "--bogus", f);
        Add("--frobnicate", "eval", f, "--frobnicate");
        return data;
    }

    [Theory]
    [MemberData(nameof(BadValues))]
    public void A_bad_option_value_exits_2_with_one_line_naming_the_option(string option, string[] args)
    {
        var r = CliRunner.Run(args);
        Assert.True(r.Exit == 2, $"exit {r.Exit}: {r.Err}");
        var lines = r.Err.TrimEnd('\n').Split('\n');
        Assert.True(lines.Length == 1, "one line expected:\n" + r.Err);
        Assert.Contains(option, lines[0]);
        Assert.DoesNotContain("System.", lines[0]);
    }

    [Fact]
    public void Diff_of_standard_input_against_itself_is_refused()
    {
        var r = CliRunner.RunWithInput(File.ReadAllText(Example), "diff", "-", "-");
        Assert.Equal(2, r.Exit);
        Assert.Contains("only once", r.Err);
    }

    [Fact]
    public void An_unknown_option_is_not_taken_for_a_file_name()
    {
        var r = CliRunner.Run("check", "--bogus", Example);
        Assert.Equal(2, r.Exit);
        Assert.Contains("unknown option '--bogus'", r.Err);
        Assert.DoesNotContain("cannot read", r.Err);
    }

    [Fact]
    public void A_directory_given_as_input_says_so()
    {
        var r = CliRunner.Run("check", Repo.Examples);
        Assert.Equal(2, r.Exit);
        Assert.Contains("is a directory", r.Err);
    }

    [Fact]
    public void An_endless_input_is_read_only_up_to_the_size_limit()
    {
        var r = CliRunner.Run("check", "/dev/zero");
        Assert.Equal(2, r.Exit);
        Assert.Contains("the limit for a winding file", r.Err);
    }
}
