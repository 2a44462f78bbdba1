using System.Diagnostics;

namespace WindScript.Tests.Cluster;

/// <summary>Runs a job file's shell commands with bash, with the windscript command of the test build on hand.</summary>
internal static class JobFileRun
{
    /// <summary>The windscript executable built beside the tests (framework-dependent, same code as the native binary).</summary>
    public static string Windscript => Path.Combine(AppContext.BaseDirectory, "windscript");

    /// <summary>Writes an executable wrapper at <paramref name="path"/> that runs the test build of windscript.</summary>
    public static void WriteWrapper(string path)
    {
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, $"#!/bin/sh\nexec '{Windscript}' \"$@\"\n");
        if (!OperatingSystem.IsWindows()) File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
    }

    /// <summary>Runs <paramref name="program"/> (bash or sh) on a script file or with -c, in <paramref name="directory"/>, with exactly the given variables (plus PATH and HOME).</summary>
    public static (int Exit, string Out, string Err) Shell(string program, string[] arguments, string directory, IReadOnlyDictionary<string, string> environment)
    {
        var start = new ProcessStartInfo(program) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in arguments) start.ArgumentList.Add(a);
        start.Environment.Clear();
        start.Environment["PATH"] = Environment.GetEnvironmentVariable("PATH") ?? "/usr/bin:/bin";
        start.Environment["HOME"] = Environment.GetEnvironmentVariable("HOME") ?? directory;
        foreach (var name in new[] { "DOTNET_ROOT", "DOTNET_ROOT_X64" })
            if (Environment.GetEnvironmentVariable(name) is { } v) start.Environment[name] = v;
        foreach (var (k, v) in environment) start.Environment[k] = v;
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(120_000), $"{program} {string.Join(' ', arguments)} did not finish");
        return (process.ExitCode, output.Result, error.Result);
    }
}
