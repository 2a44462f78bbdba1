using System.Buffers.Binary;
using System.Runtime.InteropServices;

namespace WindScript.Cli.Files;

/// <summary>
/// What stat(2) says about a path: identity (device, inode), link count, type, mode and owner.
/// .NET exposes none of identity, link count or owner, which the output rules need (refuse to
/// write over an input even through another name, keep hard links and the owner).
/// Null where the platform's struct layout is not known (then the rules that need it are skipped).
/// </summary>
public sealed record FileStatus(ulong Device, ulong Inode, ulong Links, uint Mode, uint Owner, uint Group)
{
    private const uint TypeMask = 0xF000, Regular = 0x8000, Directory = 0x4000, CharDevice = 0x2000, Fifo = 0x1000;

    public bool IsRegular => (Mode & TypeMask) == Regular;
    public bool IsDirectory => (Mode & TypeMask) == Directory;
    /// <summary>A terminal, /dev/null, /dev/full, a pipe: written as a stream, never replaced.</summary>
    public bool IsStream => (Mode & TypeMask) is CharDevice or Fifo;

    public bool SameFileAs(FileStatus other) => Device == other.Device && Inode == other.Inode;

    /// <summary>The status of the file a path names (following symbolic links), or null if it does not exist or cannot be asked.</summary>
    public static FileStatus? Of(string path)
    {
        if (!OperatingSystem.IsLinux()) return null;
        var buffer = new byte[256];
        try
        {
            if (NativeMethods.stat(path, buffer) != 0) return null;
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
        {
            return null;
        }
        var b = buffer.AsSpan();
        return RuntimeInformation.ProcessArchitecture switch
        {
            // x86-64: dev, ino, nlink (8 bytes each), mode, uid, gid (4 each)
            Architecture.X64 => new FileStatus(U64(b, 0), U64(b, 8), U64(b, 16), U32(b, 24), U32(b, 28), U32(b, 32)),
            // arm64 (the generic layout): dev, ino (8 each), mode, nlink, uid, gid (4 each)
            Architecture.Arm64 => new FileStatus(U64(b, 0), U64(b, 8), U32(b, 20), U32(b, 16), U32(b, 24), U32(b, 28)),
            _ => null,
        };
    }

    /// <summary>Gives a file the owner and group of another; false if the system refused.</summary>
    public static bool TryChangeOwner(string path, uint owner, uint group) =>
        OperatingSystem.IsLinux() && NativeMethods.chown(path, owner, group) == 0;

    private static ulong U64(ReadOnlySpan<byte> b, int at) => BinaryPrimitives.ReadUInt64LittleEndian(b[at..]);
    private static uint U32(ReadOnlySpan<byte> b, int at) => BinaryPrimitives.ReadUInt32LittleEndian(b[at..]);

    private static class NativeMethods
    {
        [DllImport("libc", SetLastError = true)]
        public static extern int stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, byte[] buffer);

        [DllImport("libc", SetLastError = true)]
        public static extern int chown([MarshalAs(UnmanagedType.LPUTF8Str)] string path, uint owner, uint group);
    }
}
