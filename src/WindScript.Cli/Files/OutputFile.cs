using System.Collections.Concurrent;
using System.Runtime.InteropServices;
using System.Text;

namespace WindScript.Cli.Files;

/// <summary>
/// Writes a command's output file without ever losing one: the new content goes to a temporary
/// file beside the target, is flushed to disk and renamed over it, so a kill at any moment leaves
/// the old or the new complete file. The rules: never write over one of the command's inputs
/// (by identity, so also through links); write through symbolic links to their target; keep the
/// target's mode and owner; refuse directories, read-only files and files with several hard links
/// (a rename would break them); write terminals, pipes and devices (/dev/stdout, /dev/null) as a
/// stream; remove the temporary file on any failure, on SIGINT/SIGTERM, and stale ones of our
/// naming pattern (".NAME.PID.tmp" of a process that is gone) the next time.
/// </summary>
public static class OutputFile
{
    private static readonly ConcurrentDictionary<string, byte> LiveTemporaries = new();
    private static readonly Lock SignalGate = new();
    private static List<PosixSignalRegistration>? _signalHandlers;

    public static void WriteAllText(string path, string text, IEnumerable<string>? inputs = null) =>
        WriteAllBytes(path, new UTF8Encoding(false).GetBytes(text), inputs);

    /// <exception cref="OutputRefusedException">the target may not be written (the message says why)</exception>
    /// <exception cref="IOException">the system failed the write (full disk, permissions, ...); the target is unchanged</exception>
    public static void WriteAllBytes(string path, byte[] bytes, IEnumerable<string>? inputs = null)
    {
        using var output = Open(path, inputs);
        output.Stream.Write(bytes);
        output.Commit();
    }

    /// <summary>
    /// Opens an output to be written as a stream (a sweep part of any size) under the same rules:
    /// the target is checked now, the bytes go to the temporary file, and <see cref="PendingOutput.Commit"/>
    /// publishes them; disposing without a commit removes the temporary file and leaves the target as it was.
    /// A stream target (a device, a pipe) is written directly.
    /// </summary>
    /// <exception cref="OutputRefusedException">the target may not be written (the message says why)</exception>
    public static PendingOutput Open(string path, IEnumerable<string>? inputs = null)
    {
        if (string.IsNullOrWhiteSpace(path)) throw new OutputRefusedException("the output path is empty");
        if (IsStreamPath(path)) return PendingOutput.Direct(OpenStream(path));
        string target = ResolveTarget(path);
        var status = FileStatus.Of(target);
        if (Directory.Exists(target)) throw new OutputRefusedException($"'{path}' is a directory");
        if (status is { IsStream: true }) return PendingOutput.Direct(OpenStream(target));
        bool exists = File.Exists(target);
        if (exists && status is { IsRegular: false }) throw new OutputRefusedException($"'{path}' is not a regular file");
        foreach (var input in inputs ?? [])
            if (SameFile(input, target, status)) throw new OutputRefusedException($"'{path}' is an input of this command; writing it would destroy it");
        if (exists) CheckReplaceable(path, target, status);

        string directory = Path.GetDirectoryName(target)!;
        string name = Path.GetFileName(target);
        if (!Directory.Exists(directory)) throw new OutputRefusedException($"cannot write '{path}': no such directory '{directory}'");
        RemoveStaleTemporaries(directory, name);
        string temporary = Path.Combine(directory, $".{name}.{Environment.ProcessId}.tmp");
        WatchSignals();
        LiveTemporaries[temporary] = 0;
        try
        {
            var stream = new FileStream(temporary, FileMode.Create, FileAccess.ReadWrite, FileShare.None, 1 << 16);
            return new PendingOutput(stream, () => Publish(path, target, temporary), () => Abandon(temporary));
        }
        catch
        {
            Abandon(temporary);
            throw;
        }
    }

    // The target is looked at again when the result is complete: a part may take minutes to write.
    private static void Publish(string path, string target, string temporary)
    {
        var status = FileStatus.Of(target);
        if (Directory.Exists(target)) throw new OutputRefusedException($"'{path}' is a directory");
        if (File.Exists(target))
        {
            CheckReplaceable(path, target, status);
            CopyModeAndOwner(path, target, temporary, status);
        }
        File.Move(temporary, target, overwrite: true);
    }

    private static void Abandon(string temporary)
    {
        TryDelete(temporary);
        LiveTemporaries.TryRemove(temporary, out _);
    }

    /// <summary>Device and process paths name a stream (the user asked for -o /dev/stdout): never replace them.</summary>
    private static bool IsStreamPath(string path)
    {
        string full = Path.GetFullPath(path);
        return full.StartsWith("/dev/", StringComparison.Ordinal) || full.StartsWith("/proc/", StringComparison.Ordinal);
    }

    private static FileStream OpenStream(string path) =>
        new(path, FileMode.Open, FileAccess.Write, FileShare.ReadWrite, 1, FileOptions.None);

    /// <summary>The file a path finally names, following symbolic links (a dangling link names the file it would create).</summary>
    private static string ResolveTarget(string path)
    {
        string full = Path.GetFullPath(path);
        for (int hops = 0; hops < 40; hops++)
        {
            var info = new FileInfo(full);
            if (info.LinkTarget is not { } link) return full;
            full = Path.GetFullPath(link, Path.GetDirectoryName(full)!);
        }
        throw new OutputRefusedException($"'{path}': too many levels of symbolic links");
    }

    private static bool SameFile(string input, string target, FileStatus? targetStatus)
    {
        if (input == "-") return false;
        if (targetStatus is not null && FileStatus.Of(input) is { } inputStatus) return inputStatus.SameFileAs(targetStatus);
        try
        {
            return File.Exists(input) && ResolveTarget(input) == target;
        }
        catch (OutputRefusedException)
        {
            return false;
        }
    }

    private static void CheckReplaceable(string path, string target, FileStatus? status)
    {
        if (status is { Links: > 1 } s)
            throw new OutputRefusedException($"'{path}' has {s.Links} hard links; replacing it would break them (write to another path; fmt --stdout prints the result)");
        if (OperatingSystem.IsWindows()) return;
        var mode = File.GetUnixFileMode(target);
        if ((mode & (UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite)) == 0)
            throw new OutputRefusedException($"'{path}' is read-only");
        try
        {
            // Opening for writing (changing nothing) asks the system whether we may write it.
            using var probe = new FileStream(target, FileMode.Open, FileAccess.Write, FileShare.ReadWrite);
        }
        catch (UnauthorizedAccessException)
        {
            throw new OutputRefusedException($"cannot write '{path}': permission denied");
        }
    }

    private static void CopyModeAndOwner(string path, string target, string temporary, FileStatus? status)
    {
        if (OperatingSystem.IsWindows()) return;
        File.SetUnixFileMode(temporary, File.GetUnixFileMode(target));
        if (status is null || FileStatus.Of(temporary) is not { } created) return;
        if ((created.Owner, created.Group) != (status.Owner, status.Group) && !FileStatus.TryChangeOwner(temporary, status.Owner, status.Group))
            throw new OutputRefusedException($"cannot write '{path}' keeping its owner ({status.Owner}:{status.Group}); write it as that user");
    }

    /// <summary>Removes ".NAME.PID.tmp" files beside the target left by a process that no longer runs.</summary>
    private static void RemoveStaleTemporaries(string directory, string name)
    {
        string prefix = "." + name + ".";
        try
        {
            foreach (var file in Directory.EnumerateFiles(directory, prefix + "*.tmp"))
            {
                string middle = Path.GetFileName(file)[prefix.Length..^".tmp".Length];
                if (int.TryParse(middle, out int pid) && pid > 0 && !ProcessRuns(pid)) TryDelete(file);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Cleaning up is a courtesy; the write itself reports real problems.
        }
    }

    private static bool ProcessRuns(int pid) =>
        pid == Environment.ProcessId || (OperatingSystem.IsLinux() ? Directory.Exists($"/proc/{pid}") : true);

    private static void WatchSignals()
    {
        lock (SignalGate)
        {
            if (_signalHandlers is not null || OperatingSystem.IsWindows()) return;
            _signalHandlers = [];
            foreach (var signal in new[] { PosixSignal.SIGINT, PosixSignal.SIGTERM, PosixSignal.SIGHUP })
                _signalHandlers.Add(PosixSignalRegistration.Create(signal, _ =>
                {
                    foreach (var temporary in LiveTemporaries.Keys) TryDelete(temporary);
                }));
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            if (File.Exists(path)) File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Nothing more can be done; the next write removes it as stale.
        }
    }
}

/// <summary>
/// An output being written (<see cref="OutputFile.Open"/>): write <see cref="Stream"/>, then <see cref="Commit"/>
/// to publish it; <see cref="Dispose"/> without a commit abandons it (the target is left as it was).
/// </summary>
public sealed class PendingOutput : IDisposable
{
    private readonly Action? _publish, _abandon;
    private FileStream? _stream;

    internal PendingOutput(FileStream stream, Action? publish, Action? abandon) => (_stream, _publish, _abandon) = (stream, publish, abandon);

    internal static PendingOutput Direct(FileStream stream) => new(stream, null, null);

    /// <summary>The stream to write: seekable for a regular file (Parquet goes back to its header); a device or pipe is not.</summary>
    public Stream Stream => _stream ?? throw new ObjectDisposedException(nameof(PendingOutput));

    /// <summary>True when the output is a regular file written through a temporary one (false for a device or pipe).</summary>
    public bool IsFile => _publish is not null;

    /// <summary>Flushes to disk and renames the temporary file over the target (or flushes the stream).</summary>
    public void Commit()
    {
        var stream = _stream ?? throw new ObjectDisposedException(nameof(PendingOutput));
        try
        {
            if (_publish is null)
            {
                stream.Flush();
                return;
            }
            stream.Flush(flushToDisk: true);
            stream.Dispose();
            _publish();
        }
        finally
        {
            stream.Dispose();
            _stream = null;
            _abandon?.Invoke();   // after a rename there is nothing left to remove
        }
    }

    public void Dispose()
    {
        if (_stream is null) return;
        _stream.Dispose();
        _stream = null;
        _abandon?.Invoke();
    }
}

/// <summary>An output the rules forbid writing; the message is one line for the user.</summary>
public sealed class OutputRefusedException(string message) : Exception(message);
