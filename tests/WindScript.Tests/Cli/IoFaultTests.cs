using System.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// Issue 13 finding 8: I/O faults of the real process (full disk, closed standard output,
/// too many open files, a reader that has gone) are one line and exit 2, or a quiet 141 for a
/// broken pipe; never exit 3 and never a stack trace. These run the built windscript under bash.
/// </summary>
public sealed class IoFaultTests
{
    private static readonly string Cli = Path.Combine(AppContext.BaseDirectory, "windscript.dll");
    private static string Example => Path.Combine(Repo.Examples, "mill_fan_lap.wind");

    private static (int Exit, string Out, string Err) Shell(string script)
    {
        var start = new ProcessStartInfo("bash") { RedirectStandardOutput = true, RedirectStandardError = true };
        start.ArgumentList.Add("-c");
        start.ArgumentList.Add(script);
        start.Environment["WS"] = $"dotnet {Cli}";
        start.Environment["EXAMPLE"] = Example;
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(120_000), "timed out: " + script);
        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    private static void AssertOneLineUsageError((int Exit, string Out, string Err) r, string expected)
    {
        Assert.True(r.Out.Trim() == "2", $"exit {r.Out.Trim()}: {r.Err}");
        Assert.Contains(expected, r.Err);
        Assert.Single(r.Err.TrimEnd('\n').Split('\n'));
        Assert.DoesNotContain("   at ", r.Err);
    }

    [Fact]
    public void A_full_disk_on_standard_output_exits_2_with_one_line() =>
        AssertOneLineUsageError(Shell("exec 3>&1; $WS eval \"$EXAMPLE\" >/dev/full; echo $? >&3"), "No space left on device");

    [Fact]
    public void A_closed_standard_output_exits_2_with_one_line() =>
        AssertOneLineUsageError(Shell("exec 3>&1; $WS eval \"$EXAMPLE\" >&-; echo $? >&3"), "standard output");

    [Theory]
    [InlineData(24)]
    [InlineData(28)]
    [InlineData(32)]
    [InlineData(40)]
    [InlineData(48)]
    [InlineData(56)]
    public void Too_many_open_files_is_a_usage_error_not_a_crash(int limit)
    {
        // At these limits the runtime starts but runs out of descriptors at different points:
        // loading the console, an assembly, or opening the inputs.
        var r = Shell($"exec 3>&1; ulimit -n {limit}; $WS check \"$EXAMPLE\" \"$EXAMPLE\" \"$EXAMPLE\" >/dev/null; echo $? >&3");
        if (r.Err.Contains("Failed to load JIT compiler") || r.Err.Contains("Failed to create CoreCLR")) return;   // the .NET host, before any of our code
        Assert.True(r.Out.Trim() is "0" or "2", $"ulimit -n {limit}: exit {r.Out.Trim()}: {r.Err}");
        Assert.DoesNotContain("Unhandled exception", r.Err);
        Assert.DoesNotContain("   at ", r.Err);
        if (r.Out.Trim() == "2") Assert.Single(r.Err.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void A_reader_that_goes_away_stops_a_sweep_at_once_and_quietly()
    {
        var watch = Stopwatch.StartNew();
        var r = Shell("$WS sweep --slots 6..1000 --poles 2..200 | head -1 >/dev/null; echo ${PIPESTATUS[0]}");
        watch.Stop();
        Assert.Equal("141", r.Out.Trim());
        Assert.Equal("", r.Err);
        // The whole sweep takes minutes; stopping at once takes start-up time. A generous bound that only catches a runaway.
        Assert.True(watch.Elapsed < TimeSpan.FromSeconds(60), $"took {watch.Elapsed}");
    }

    [Fact]
    public void A_kill_at_any_moment_leaves_the_old_or_the_new_complete_file()
    {
        var dir = Directory.CreateTempSubdirectory("windscript-kill-").FullName;
        try
        {
            string old = File.ReadAllText(Example).Replace("  slots 48", "slots     48");
            var path = Path.Combine(dir, "fan.wind");
            string formatted = CliRunner.Run("fmt", "--stdout", Example).Out;
            foreach (int delayMs in new[] { 40, 80, 120, 160, 200, 260, 320 })
            {
                File.WriteAllText(path, old);
                Shell($"$WS fmt '{path}' & pid=$!; sleep {delayMs / 1000.0:0.000}; kill -9 $pid 2>/dev/null; wait $pid 2>/dev/null; true");
                string now = File.ReadAllText(path);
                Assert.True(now == old || now == formatted, $"torn file after a kill at {delayMs} ms");
            }
            // A later run removes what the killed runs left behind.
            File.WriteAllText(path, old);
            Assert.Equal(0, CliRunner.Run("fmt", path).Exit);
            Assert.Empty(Directory.EnumerateFiles(dir, ".*.tmp"));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
