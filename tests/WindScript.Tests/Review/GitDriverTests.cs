using System.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Review;

/// <summary>
/// The git integration end to end: a real repository, real commits and real `git diff` /
/// `git log -p` running our CLI as the diff driver and as the textconv, configured exactly as
/// the README says (.gitattributes "*.wind diff=windscript").
/// </summary>
public sealed class GitDriverTests : IDisposable
{
    private readonly string _repo = Directory.CreateTempSubdirectory("windscript-git-").FullName;

    public void Dispose() => Directory.Delete(_repo, recursive: true);

    /// <summary>The CLI as git runs it: the built windscript.dll beside the tests, through the dotnet host.</summary>
    private static string Windscript => $"dotnet '{typeof(WindScript.Cli.CliApp).Assembly.Location}'";

    private static string MillFan => File.ReadAllText(Path.Combine(Repo.Examples, "mill_fan_lap.wind"));

    private (int Exit, string Out, string Err) Git(params string[] args)
    {
        var start = new ProcessStartInfo("git") { WorkingDirectory = _repo, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args) start.ArgumentList.Add(a);
        // Keep the user's and the system's git configuration out of the test.
        start.Environment["GIT_CONFIG_GLOBAL"] = "/dev/null";
        start.Environment["GIT_CONFIG_NOSYSTEM"] = "1";
        start.Environment["GIT_PAGER"] = "cat";
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(120_000), "git timed out");
        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    private void Commit(string message)
    {
        var r = Git("-c", "user.name=Reviewer", "-c", "user.email=reviewer@example.invalid", "commit", "-q", "-m", message);
        Assert.True(r.Exit == 0, r.Err);
    }

    private void CommitTwoProposals()
    {
        Assert.Equal(0, Git("init", "-q").Exit);
        File.WriteAllText(Path.Combine(_repo, ".gitattributes"), "*.wind diff=windscript\n");
        Directory.CreateDirectory(Path.Combine(_repo, "motors"));
        File.WriteAllText(Path.Combine(_repo, "motors", "fan.wind"), MillFan);
        Git("add", ".");
        Commit("proposal A");
        // Proposal B: slot 4 (top) moves from U to V; comments reworded.
        File.WriteAllText(Path.Combine(_repo, "motors", "fan.wind"),
            MillFan.Replace("top: U U U U -W", "top: U U U V -W").Replace("# per coil", "# turns of each coil"));
        Git("add", ".");
        Commit("proposal B");
    }

    [Fact]
    public void Git_diff_through_the_driver_shows_the_physical_changes()
    {
        CommitTwoProposals();
        var r = Git("-c", $"diff.windscript.command={Windscript} diff", "diff", "HEAD~1", "HEAD");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("windscript diff a/motors/fan.wind b/motors/fan.wind", r.Out);
        Assert.Contains("physically different", r.Out);
        Assert.Matches(@"~ slot 4 +top +\+U 6 +\+V 6", r.Out);
        Assert.Matches(@"~ U +48 +42 +-6", r.Out);            // series turns per phase
        Assert.Contains("winding factors, phase U", r.Out);
        Assert.DoesNotContain("@@", r.Out);                   // no line diff: the driver replaced it
    }

    [Fact]
    public void Git_diff_through_the_driver_shows_an_added_file_against_no_file()
    {
        CommitTwoProposals();
        File.WriteAllText(Path.Combine(_repo, "motors", "pump.wind"), File.ReadAllText(Path.Combine(Repo.Examples, "pump_skid_single_layer.wind")));
        Git("add", ".");
        Commit("add the pump");
        var r = Git("-c", $"diff.windscript.command={Windscript} diff", "diff", "HEAD~1", "HEAD");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("windscript diff a/motors/pump.wind b/motors/pump.wind", r.Out);
        Assert.Contains("new file", r.Out);
    }

    [Fact]
    public void A_comment_only_commit_shows_no_physical_change()
    {
        CommitTwoProposals();
        File.AppendAllText(Path.Combine(_repo, "motors", "fan.wind"), "\n# reviewed, no change to the winding\n");
        Git("add", ".");
        Commit("comment");
        var r = Git("-c", $"diff.windscript.command={Windscript} diff", "diff", "HEAD~1", "HEAD");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("no physical change", r.Out);
    }

    [Fact]
    public void Git_log_with_the_textconv_shows_physical_facts_line_by_line()
    {
        CommitTwoProposals();
        var r = Git("-c", $"diff.windscript.textconv={Windscript} show", "log", "-p", "-1", "--format=");
        Assert.True(r.Exit == 0, r.Err);
        Assert.Contains("-slot 4 top: +U 6", r.Out);
        Assert.Contains("+slot 4 top: +V 6", r.Out);
        Assert.Contains("-series turns U: 48", r.Out);
        Assert.Contains("+series turns U: 42", r.Out);
        Assert.DoesNotContain("turns of each coil", r.Out);   // comments are not facts
    }
}
