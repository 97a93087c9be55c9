using System.Runtime.InteropServices;

namespace PadPlan.IO;

/// <summary>
/// Reads a user's input file whole: only a regular file (a device such as /dev/zero, a FIFO or a socket is refused before
/// it is opened, so a FIFO cannot hang the run), and at most a cap of bytes, counted while reading (a device or a
/// growing file reports a length that means nothing). File-system failures become <see cref="InputException"/>s that
/// name the file; a message never repeats the file's content.
/// </summary>
public static class InputFile
{
    /// <summary>The file's bytes; <paramref name="what"/> names the kind of file in messages ("project file").</summary>
    public static byte[] ReadAllBytes(string path, long maxBytes, string what, string? missingHint = null)
    {
        try
        {
            if (KindOf(path) is { } kind)
                throw new InputException(path, $"this is {kind}, not a regular {what}; PadPlan reads only regular files. Give the path of the {what} itself.");
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1, FileOptions.SequentialScan);
            var buffer = new MemoryStream();
            var chunk = new byte[81920];
            int read;
            while ((read = stream.Read(chunk, 0, (int)Math.Min(chunk.Length, maxBytes + 1 - buffer.Length))) > 0)
            {
                buffer.Write(chunk, 0, read);
                if (buffer.Length > maxBytes)
                    throw new InputException(path, $"the {what} is larger than {maxBytes / (1024 * 1024)} MB, the most PadPlan reads (see docs/limits.md).");
            }
            return buffer.ToArray();
        }
        catch (FileNotFoundException)
        {
            throw new InputException(path, $"no such {what}.{(missingHint is null ? "" : " " + missingHint)}");
        }
        catch (DirectoryNotFoundException)
        {
            throw new InputException(path, $"the folder of this {what} does not exist.");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(path, $"cannot read the {what}: {e.Message}");
        }
    }

    /// <summary>What the path is when it is not a regular file ("a folder", "a device", "a FIFO (named pipe)", "a socket"), or null for a regular file or a missing one. Symbolic links are followed.</summary>
    public static string? KindOf(string path)
    {
        if (Directory.Exists(path)) return "a folder";
        if (!OperatingSystem.IsLinux() && !OperatingSystem.IsMacOS() && !OperatingSystem.IsFreeBSD())
            return File.Exists(path) && File.GetAttributes(path).HasFlag(FileAttributes.Device) ? "a device" : null;
        var status = new byte[StatusSize];
        try
        {
            if (Stat(path, status) != 0) return null; // missing or unreadable: opening it says which
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
        {
            return null; // no stat on this runtime: the capped read still bounds the work
        }
        return (BitConverter.ToInt32(status, ModeOffset) & TypeMask) switch
        {
            RegularFile => null,
            Fifo => "a FIFO (named pipe)",
            CharacterDevice or BlockDevice => "a device",
            Socket => "a socket",
            Folder => "a folder",
            _ => "not a regular file",
        };
    }

    // The file type bits of st_mode (POSIX <sys/stat.h>), as the .NET runtime's own native layer reports them.
    private const int TypeMask = 0xF000, Fifo = 0x1000, CharacterDevice = 0x2000, Folder = 0x4000, BlockDevice = 0x6000, RegularFile = 0x8000, Socket = 0xC000;

    // The runtime's FileStatus record starts with two 32-bit fields, Flags and Mode; the buffer is larger than the record.
    private const int ModeOffset = 4, StatusSize = 512;

    [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", SetLastError = true)]
    private static extern int Stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, [Out] byte[] status);
}
