using System.Runtime.InteropServices;

namespace WaveSim.Core.Io;

/// <summary>
/// What kind of file system entry a path names, without opening it: opening a named pipe for reading blocks until something
/// writes to it, and a device such as /dev/zero never ends. .NET reports both as "Normal" files, so on Linux the kind comes
/// from statx(2), whose layout is the same on every architecture.
/// </summary>
internal static partial class FileKind
{
    const int AtFdCwd = -100;
    const uint StatxType = 0x0001;
    const int ModeOffset = 28;   // struct statx: stx_mask, stx_blksize (u32), stx_attributes (u64), stx_nlink, stx_uid, stx_gid (u32), stx_mode (u16)

    [LibraryImport("libc", EntryPoint = "statx", StringMarshalling = StringMarshalling.Utf8, SetLastError = true)]
    private static partial int Statx(int dirFd, string path, int flags, uint mask, [Out] byte[] buffer);

    /// <summary>
    /// Null for a regular file (or when the kind cannot be told: not Linux, no statx), else a phrase naming the kind
    /// ("a named pipe (FIFO)"). Symbolic links are followed, as opening would.
    /// </summary>
    public static string? NotRegular(string path)
    {
        if (!OperatingSystem.IsLinux()) return null;
        var buffer = new byte[256];
        try
        {
            if (Statx(AtFdCwd, path, 0, StatxType, buffer) != 0) return null;   // missing or unreadable: opening says which
        }
        catch (Exception ex) when (ex is DllNotFoundException or EntryPointNotFoundException)
        {
            return null;
        }
        int type = BitConverter.ToUInt16(buffer, ModeOffset) & 0xF000;
        return type switch
        {
            0x8000 => null,
            0x4000 => "a folder",
            0x1000 => "a named pipe (FIFO)",
            0x2000 => "a character device",
            0x6000 => "a block device",
            0xC000 => "a socket",
            _ => "a special file",
        };
    }
}
