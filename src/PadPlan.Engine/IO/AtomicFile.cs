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
    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes) => WriteAll([(path, bytes.ToArray())]);

    /// <summary>
    /// Writes files that belong together (a CSV and its companion tables) as a set: every file is first written whole to
    /// its temporary file, and only then are they renamed into place one after the other. A failure while writing (a
    /// full disk) leaves every old file as it was; only a kill in the moment between two renames can leave a new file
    /// beside an old one, each of them whole (docs/limits.md).
    /// </summary>
    public static void WriteAll(IReadOnlyList<(string Path, byte[] Bytes)> files)
    {
        var targets = files.Select(f => (Given: f.Path, Full: RealPath(f.Path), f.Bytes)).ToList();
        foreach (var (_, full, _) in targets)
        {
            EnsureReplaceable(full);
            RemoveStaleTemps(Path.GetDirectoryName(full) ?? ".", Path.GetFileName(full));
        }
        var temps = targets.Select(t => Path.Combine(Path.GetDirectoryName(t.Full) ?? ".", $".{Path.GetFileName(t.Full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp")).ToList();
        var current = 0;
        try
        {
            for (current = 0; current < targets.Count; current++)
            {
                Directory.CreateDirectory(Path.GetDirectoryName(targets[current].Full) ?? ".");
                using (var stream = new FileStream(temps[current], FileMode.CreateNew, FileAccess.Write, FileShare.None))
                {
                    stream.Write(targets[current].Bytes);
                    stream.Flush(flushToDisk: true);
                }
                FaultPoint.Step("file.temp-written");
            }
            for (current = 0; current < targets.Count; current++)
            {
                File.Move(temps[current], targets[current].Full, overwrite: true);
                FaultPoint.Step("file.renamed");
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // The user knows their file, not our temporary one: name theirs and say what is unchanged.
            var (given, full, _) = targets[Math.Min(current, targets.Count - 1)];
            var temp = temps[Math.Min(current, temps.Count - 1)];
            var reason = e.Message.Replace(temp, full, StringComparison.Ordinal).Replace(Path.GetFileName(temp), Path.GetFileName(full), StringComparison.Ordinal);
            throw new InputException(given, $"cannot write the file ({reason}); {Unchanged(targets.Select(t => t.Full).ToList(), current, temps)}.");
        }
        finally
        {
            foreach (var temp in temps) TryDelete(temp);
        }
    }

    // What a failed write left: nothing renamed yet means every old file stands (or nothing was written at all).
    private static string Unchanged(IReadOnlyList<string> targets, int failedAt, IReadOnlyList<string> temps)
    {
        var renamed = targets.Where((t, i) => i < failedAt && !File.Exists(temps[i])).ToList();
        if (renamed.Count > 0) return $"{string.Join(", ", renamed.Select(Path.GetFileName))} {(renamed.Count == 1 ? "was" : "were")} written, the rest not";
        if (targets.Count == 1) return File.Exists(targets[0]) ? "the old file is unchanged" : "nothing was written";
        return "no file was written or changed";
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
        for (var hop = 0; hop < MaxLinkHops; hop++)
        {
            var target = new FileInfo(full).LinkTarget;
            if (target is null) return full;
            full = Path.GetFullPath(target, Path.GetDirectoryName(full) ?? ".");
        }
        throw new InputException(path, $"this symbolic link leads through more than {MaxLinkHops} links (a loop?); give the path of the file itself.");
    }

    /// <summary>Links followed before a path is taken for a loop (Linux's own limit, MAXSYMLINKS, is 40).</summary>
    private const int MaxLinkHops = 40;

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
            if (!IsLeftover(entry)) continue;
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

    /// <summary>True for a temporary file or folder of ours (".NAME.PID.RANDOM.tmp", ".old", ".stale") whose process has ended.</summary>
    public static bool IsLeftover(string path)
    {
        var match = TempName().Match(Path.GetFileName(path));
        return match.Success && int.TryParse(match.Groups["pid"].Value, out var pid) && !IsRunning(pid);
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

    [GeneratedRegex(@"^.+\.(?<pid>[0-9]+)\.[0-9a-f]{32}\.(tmp|stale|old)$")]
    private static partial Regex TempName();
}
