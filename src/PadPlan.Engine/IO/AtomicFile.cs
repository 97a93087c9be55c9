using System.Text.RegularExpressions;

namespace PadPlan.IO;

/// <summary>
/// Writes files so that a reader never sees half a file and a failed write never loses the old one: temporary file in
/// the same folder, then rename. Temporary files are named ".NAME.PID.RANDOM.tmp"; one left by a killed run is removed
/// by <see cref="RemoveStaleTemps"/>. A read-only file is refused, never replaced.
/// </summary>
public static partial class AtomicFile
{
    /// <summary>Writes through a symbolic link: the file it points to is replaced and the link stays a link.</summary>
    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes)
    {
        var full = RealPath(path);
        var dir = Path.GetDirectoryName(full) ?? ".";
        EnsureReplaceable(full);
        RemoveStaleTemps(dir, Path.GetFileName(full));
        var temp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            Directory.CreateDirectory(dir);
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // The user knows their file, not our temporary one: name theirs and say it is unchanged.
            var reason = e.Message.Replace(temp, full, StringComparison.Ordinal).Replace(Path.GetFileName(temp), Path.GetFileName(full), StringComparison.Ordinal);
            throw new InputException(path, $"cannot write the file ({reason}); {(File.Exists(full) ? "the old file is unchanged" : "nothing was written")}.");
        }
        finally
        {
            TryDelete(temp);
        }
    }

    public static void WriteAllText(string path, string text) =>
        WriteAllBytes(path, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));

    /// <summary>
    /// The full path of the file itself: a symbolic link (or a chain of them) is followed to the file it names, so the
    /// writer lock and the write both act on the real file, and a project reached by two paths has one lock.
    /// </summary>
    public static string RealPath(string path)
    {
        var full = Path.GetFullPath(path);
        try
        {
            return File.ResolveLinkTarget(full, returnFinalTarget: true) is { } target ? Path.GetFullPath(target.FullName) : full;
        }
        catch (IOException e)
        {
            throw new InputException(path, $"cannot follow this symbolic link ({e.Message}); give the path of the file itself.");
        }
    }

    /// <summary>Refuses (exit 2) to replace a file the user has made read-only.</summary>
    public static void EnsureReplaceable(string path)
    {
        if (File.Exists(path) && IsReadOnly(path))
            throw new InputException(path, "the file is read-only, so PadPlan leaves it as it is. Make it writable (chmod u+w) or write to another file.");
    }

    private static bool IsReadOnly(string path)
    {
        if (new FileInfo(path).IsReadOnly) return true;
        if (OperatingSystem.IsWindows()) return false;
        // root may write anything, so the attribute alone misses a file the user marked read-only for everyone
        return (File.GetUnixFileMode(path) & (UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite)) == 0;
    }

    /// <summary>
    /// Removes temporary files and folders ".NAME.PID.RANDOM.tmp" (and stale-lock leftovers "NAME.lock.PID.RANDOM.stale")
    /// in <paramref name="dir"/> left by padplan runs which have ended (killed, or the machine stopped); only those for
    /// <paramref name="forName"/> when given. Files of runs still going are left alone.
    /// </summary>
    public static int RemoveStaleTemps(string dir, string? forName = null)
    {
        if (!Directory.Exists(dir)) return 0;
        var removed = 0;
        var temps = forName is null ? Directory.EnumerateFileSystemEntries(dir, ".*.tmp") : Directory.EnumerateFileSystemEntries(dir, $".{forName}.*.tmp");
        foreach (var entry in temps.Concat(Directory.EnumerateFileSystemEntries(dir, $"{forName ?? ""}*.lock.*.stale")).ToList())
        {
            var match = TempName().Match(Path.GetFileName(entry));
            if (!match.Success || !int.TryParse(match.Groups["pid"].Value, out var pid) || IsRunning(pid)) continue;
            try
            {
                if (Directory.Exists(entry)) Directory.Delete(entry, recursive: true);
                else File.Delete(entry);
                removed++;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // not ours to remove after all (permissions): leave it
            }
        }
        return removed;
    }

    private static bool IsRunning(int pid)
    {
        if (pid == Environment.ProcessId) return true;
        try
        {
            using var process = System.Diagnostics.Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException)
        {
            return false;
        }
    }

    private static void TryDelete(string temp)
    {
        try
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // a leftover is cleaned by RemoveStaleTemps on the next run
        }
    }

    [GeneratedRegex(@"^.+\.(?<pid>[0-9]+)\.[0-9a-f]{32}\.(tmp|stale)$")]
    private static partial Regex TempName();
}
