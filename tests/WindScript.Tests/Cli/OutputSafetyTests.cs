using WindScript.Cli.Files;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>
/// Issue 13, findings 2 and 7: outputs never destroy inputs, write through links, keep mode and
/// owner, refuse directories and multi-link files, and leave no temporary file behind.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class OutputSafetyTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("windscript-out-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Copy(string example, string name)
    {
        var path = Path.Combine(_dir, name);
        File.Copy(Path.Combine(Repo.Examples, example), path);
        return path;
    }

    private string[] Leftovers() => [.. Directory.EnumerateFiles(_dir, ".*.tmp")];

    [Fact]
    public void Report_refuses_to_write_over_its_input()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        string before = File.ReadAllText(input);
        var r = CliRunner.Run("report", input, "-o", input);
        Assert.Equal(2, r.Exit);
        Assert.Contains("is an input of this command", r.Err);
        Assert.Single(r.Err.TrimEnd().Split('\n'));
        Assert.Equal(before, File.ReadAllText(input));
    }

    [Fact]
    public void Plot_refuses_an_input_reached_through_a_symbolic_link_or_a_hard_link()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        string before = File.ReadAllText(input);
        var soft = Path.Combine(_dir, "soft.svg");
        File.CreateSymbolicLink(soft, input);
        Assert.Equal(2, CliRunner.Run("plot", input, "--kind", "mmf", "-o", soft).Exit);
        var hard = Path.Combine(_dir, "hard.svg");
        Assert.Equal(0, Native.Link(input, hard));
        Assert.Equal(2, CliRunner.Run("plot", input, "--kind", "mmf", "-o", hard).Exit);
        Assert.Equal(before, File.ReadAllText(input));
        Assert.True(File.ResolveLinkTarget(soft, false) is not null, "the link itself is kept");
    }

    [Fact]
    public void Writing_through_a_symbolic_link_replaces_the_target_and_keeps_the_link()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        var target = Path.Combine(_dir, "real.html");
        File.WriteAllText(target, "old");
        var link = Path.Combine(_dir, "link.html");
        File.CreateSymbolicLink(link, "real.html");
        Assert.Equal(0, CliRunner.Run("report", input, "-o", link).Exit);
        Assert.NotNull(new FileInfo(link).LinkTarget);
        Assert.StartsWith("<!DOCTYPE html>", File.ReadAllText(target));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void A_directory_is_refused_with_one_line()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        var r = CliRunner.Run("report", input, "-o", _dir);
        Assert.Equal(2, r.Exit);
        Assert.Contains("is a directory", r.Err);
        Assert.Contains("--output", r.Err);
    }

    [Fact]
    public void A_device_is_written_as_a_stream_and_never_replaced()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        Assert.Equal(0, CliRunner.Run("report", input, "-o", "/dev/null").Exit);
        Assert.True(FileStatus.Of("/dev/null") is { IsStream: true }, "/dev/null is still a device");
        var full = CliRunner.Run("report", input, "-o", "/dev/full");
        Assert.Equal(2, full.Exit);
        Assert.Contains("No space left on device", full.Err);
        Assert.Single(full.Err.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Fmt_keeps_mode_and_removes_stale_temporaries_of_its_own_pattern()
    {
        var path = Path.Combine(_dir, "messy.wind");
        File.WriteAllText(path, File.ReadAllText(Path.Combine(Repo.Examples, "coil_fixture_ac.wind")).Replace("  slots 24", "slots    24"));
        File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        var stale = Path.Combine(_dir, ".messy.wind.999999999.tmp");   // a process id that cannot run
        var foreign = Path.Combine(_dir, ".messy.wind.notours.tmp");
        File.WriteAllText(stale, "left by a killed run");
        File.WriteAllText(foreign, "someone else's");
        Assert.Equal(0, CliRunner.Run("fmt", path).Exit);
        Assert.Contains("  slots 24", File.ReadAllText(path));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite, File.GetUnixFileMode(path));
        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(foreign));
    }

    [Fact]
    public void Fmt_refuses_a_file_with_several_hard_links_and_goes_on_with_the_others()
    {
        var messy = File.ReadAllText(Path.Combine(Repo.Examples, "coil_fixture_ac.wind")).Replace("  slots 24", "slots    24");
        var linked = Path.Combine(_dir, "linked.wind");
        var other = Path.Combine(_dir, "other.wind");
        File.WriteAllText(linked, messy);
        File.WriteAllText(other, messy);
        Assert.Equal(0, Native.Link(linked, Path.Combine(_dir, "alias.wind")));
        var r = CliRunner.Run("fmt", linked, other);
        Assert.Equal(2, r.Exit);
        Assert.Contains("2 hard links", r.Err);
        Assert.Equal(messy, File.ReadAllText(linked));
        Assert.Contains("  slots 24", File.ReadAllText(other));
    }

    [Fact]
    public void Fmt_keeps_the_owner()
    {
        var path = Path.Combine(_dir, "owned.wind");
        File.WriteAllText(path, File.ReadAllText(Path.Combine(Repo.Examples, "coil_fixture_ac.wind")).Replace("  slots 24", "slots    24"));
        var before = FileStatus.Of(path)!;
        // As root (CI), give the file to another user first, as a shared checkout would have it.
        if (before.Owner == 0) Assert.True(FileStatus.TryChangeOwner(path, 4242, 4343));
        var expected = FileStatus.Of(path)!;
        Assert.Equal(0, CliRunner.Run("fmt", path).Exit);
        var after = FileStatus.Of(path)!;
        Assert.Contains("  slots 24", File.ReadAllText(path));
        Assert.Equal((expected.Owner, expected.Group), (after.Owner, after.Group));
    }

    [Fact]
    public void Fmt_refuses_a_read_only_file()
    {
        var path = Path.Combine(_dir, "frozen.wind");
        var messy = File.ReadAllText(Path.Combine(Repo.Examples, "coil_fixture_ac.wind")).Replace("  slots 24", "slots    24");
        File.WriteAllText(path, messy);
        File.SetUnixFileMode(path, UnixFileMode.UserRead);
        var r = CliRunner.Run("fmt", path);
        Assert.Equal(2, r.Exit);
        Assert.Contains("read-only", r.Err);
        Assert.Equal(messy, File.ReadAllText(path));
    }

    [Fact]
    public void Synth_into_a_missing_directory_is_a_usage_error()
    {
        var r = CliRunner.Run("synth", "--slots", "24", "--poles", "4", "-o", Path.Combine(_dir, "nodir", "x.wind"));
        Assert.Equal(2, r.Exit);
        Assert.Contains("no such directory", r.Err);
        Assert.Empty(Leftovers());
    }

    // PartFile (sweep parts) follows the same rules as every other output.
    private static readonly string[] SmallSweep = ["sweep", "--slots", "6..12", "--poles", "2..4", "--orders", "3"];

    [Fact]
    public void A_sweep_part_refuses_a_directory_with_one_line_naming_it()
    {
        var r = CliRunner.Run([.. SmallSweep, "-o", _dir]);
        Assert.Equal(2, r.Exit);
        Assert.Contains($"'{_dir}' is a directory", r.Err);
        Assert.Single(r.Err.TrimEnd().Split('\n'));
    }

    [Fact]
    public void A_sweep_part_writes_through_a_symbolic_link_and_keeps_the_mode()
    {
        var target = Path.Combine(_dir, "real.jsonl");
        File.WriteAllText(target, "old\n");
        File.SetUnixFileMode(target, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        var link = Path.Combine(_dir, "link.jsonl");
        File.CreateSymbolicLink(link, "real.jsonl");
        var stale = Path.Combine(_dir, ".real.jsonl.999999999.tmp");   // left by a killed run
        File.WriteAllText(stale, "half");
        Assert.Equal(0, CliRunner.Run([.. SmallSweep, "-o", link]).Exit);
        Assert.NotNull(new FileInfo(link).LinkTarget);
        Assert.StartsWith("{", File.ReadAllText(target));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite, File.GetUnixFileMode(target));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void A_sweep_part_on_a_device_is_written_as_a_stream_and_parquet_there_is_refused()
    {
        Assert.Equal(0, CliRunner.Run([.. SmallSweep, "-o", "/dev/null"]).Exit);
        Assert.True(FileStatus.Of("/dev/null") is { IsStream: true });
        Assert.Empty(Directory.EnumerateFiles("/dev", ".null.*.tmp"));   // before, the part went to /dev/.null.PID.tmp, renamed over the device
        // A pipe (what -o /dev/stdout is under `| cat`) cannot seek back to a Parquet header.
        using var pipe = new System.IO.Pipes.AnonymousPipeServerStream(System.IO.Pipes.PipeDirection.In, HandleInheritability.None);
        var parquet = CliRunner.Run([.. SmallSweep, "--format", "parquet", "-o", $"/proc/self/fd/{pipe.ClientSafePipeHandle.DangerousGetHandle()}"]);
        Assert.Equal(2, parquet.Exit);
        Assert.Contains("Parquet needs a file", parquet.Err);
    }

    [Fact]
    public void A_sweep_part_refuses_a_file_with_several_hard_links()
    {
        var part = Path.Combine(_dir, "part.jsonl");
        File.WriteAllText(part, "earlier\n");
        Assert.Equal(0, Native.Link(part, Path.Combine(_dir, "alias.jsonl")));
        var r = CliRunner.Run([.. SmallSweep, "-o", part]);
        Assert.Equal(2, r.Exit);
        Assert.Contains("2 hard links", r.Err);
        Assert.Equal("earlier\n", File.ReadAllText(part));
        Assert.Empty(Leftovers());
    }

    [Fact]
    public void An_output_opened_as_a_stream_refuses_an_input_of_the_command()
    {
        var input = Copy("coil_fixture_ac.wind", "motor.wind");
        var e = Assert.Throws<OutputRefusedException>(() => new WindScript.Cli.PartFile(input, [input]));
        Assert.Contains("is an input of this command", e.Message);
        Assert.Empty(Leftovers());
    }

    private static class Native
    {
        [System.Runtime.InteropServices.DllImport("libc", SetLastError = true)]
        private static extern int link([System.Runtime.InteropServices.MarshalAs(System.Runtime.InteropServices.UnmanagedType.LPUTF8Str)] string existing,
            [System.Runtime.InteropServices.MarshalAs(System.Runtime.InteropServices.UnmanagedType.LPUTF8Str)] string created);

        public static int Link(string existing, string created) => link(existing, created);
    }
}
