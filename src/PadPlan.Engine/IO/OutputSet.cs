namespace PadPlan.IO;

/// <summary>
/// A folder of output files (sheets, the demo's files) replaced as a whole: every file is written into a new folder
/// ".FOLDER.PID.RANDOM.tmp" beside the target, with a list of its files (<see cref="ListName"/>); then the old folder is
/// renamed aside (".FOLDER.PID.RANDOM.old"), the new one renamed into its place, and the old one deleted. A reader sees
/// the whole old set, then for an instant no folder, then the whole new set; never a mix, and no file of the old set
/// that the new set lacks. A folder that holds files PadPlan did not write (not on its list) is refused, never replaced,
/// so a user's own files are never lost; with force, only a file under a name of the new set may be one of those. The
/// files of the old set may have been changed since: the caller checks each of <see cref="Replaced"/> by its content
/// before <see cref="Commit"/>. A run killed between the two renames leaves the old folder aside; the next run for that
/// folder puts it back before doing anything else. docs/limits.md states the protocol step by step.
/// </summary>
public sealed class OutputSet : IDisposable
{
    /// <summary>The list of the set's files, kept in the folder, so the next run knows which files are PadPlan's.</summary>
    public const string ListName = ".padplan-set";

    private readonly List<string> _names = [];
    private readonly bool _force;
    private bool _done;

    private OutputSet(string dir, string staging, bool force)
    {
        Dir = dir;
        Staging = staging;
        _force = force;
    }

    /// <summary>The folder the set goes into (a symbolic link followed).</summary>
    public string Dir { get; }
    /// <summary>The temporary folder the files are written into first.</summary>
    public string Staging { get; }

    /// <summary>
    /// Starts a set for <paramref name="dir"/>: an old set left aside by a killed run is put back, leftovers of killed
    /// runs removed, and a folder with files PadPlan did not write refused before any work. With
    /// <paramref name="force"/> (the builder's --force) a file PadPlan did not write may stand under a name of the new
    /// set, and is replaced; any other is still refused, at <see cref="Commit"/>, when the names are known.
    /// </summary>
    public static OutputSet Begin(string dir, bool force = false)
    {
        var full = Path.TrimEndingDirectorySeparator(AtomicFile.RealPath(Path.TrimEndingDirectorySeparator(Path.GetFullPath(dir))));
        var parent = Path.GetDirectoryName(full) ?? ".";
        RestoreAside(parent, full);
        AtomicFile.RemoveStaleTemps(parent);
        if (File.Exists(full)) throw new InputException(full, "this is a file, not a folder; give a folder for the output files (it is created if missing).");
        if (!force) EnsureOurs(full, []);
        var staging = Path.Combine(parent, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            Directory.CreateDirectory(staging);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(full, $"cannot write beside this folder ({e.Message.Replace(staging, full, StringComparison.Ordinal)}); nothing was written.");
        }
        return new OutputSet(full, staging, force);
    }

    /// <summary>Writes one file of the set (into the temporary folder); returns the path it will have.</summary>
    public string Add(string name, ReadOnlySpan<byte> bytes)
    {
        if (name != Path.GetFileName(name) || name.StartsWith('.')) throw new ArgumentException($"'{name}' is not a plain file name.", nameof(name));
        try
        {
            using (var stream = new FileStream(Path.Combine(Staging, name), FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            FaultPoint.Step("set.file-written");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(Path.Combine(Dir, name), $"cannot write the file ({e.Message.Replace(Staging, Dir, StringComparison.Ordinal)}); the old files in {Dir} are unchanged.");
        }
        _names.Add(name);
        return Path.Combine(Dir, name);
    }

    public string AddText(string name, string text) => Add(name, new System.Text.UTF8Encoding(false).GetBytes(text));

    /// <summary>The names of the files in the folder now that <see cref="Commit"/> would replace or remove: the old set's, and any under a name of the new set.</summary>
    public IReadOnlyList<string> Replaced()
    {
        if (!Directory.Exists(Dir)) return [];
        var listed = ListOf(Dir);
        return _names.Concat(listed).Distinct(StringComparer.Ordinal).Where(n => File.Exists(Path.Combine(Dir, n))).Order(StringComparer.Ordinal).ToList();
    }

    /// <summary>Puts the new folder in place of the old one (see the class summary); returns the final paths in the order added.</summary>
    public IReadOnlyList<string> Commit()
    {
        var parent = Path.GetDirectoryName(Dir) ?? ".";
        var aside = Path.Combine(parent, $".{Path.GetFileName(Dir)}.{Environment.ProcessId}.{Guid.NewGuid():N}.old");
        try
        {
            File.WriteAllLines(Path.Combine(Staging, ListName), _names);
            FaultPoint.Step("set.staged");
            EnsureOurs(Dir, _force ? _names : []); // again, now the names are known: a file may have appeared while the set was drawn
            var hadOld = Directory.Exists(Dir);
            if (hadOld)
            {
                Directory.Move(Dir, aside);
                FaultPoint.Step("set.old-aside");
            }
            Directory.Move(Staging, Dir);
            _done = true;
            FaultPoint.Step("set.new-in-place");
            if (hadOld) TryDeleteFolder(aside);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            if (!Directory.Exists(Dir) && Directory.Exists(aside)) Directory.Move(aside, Dir);
            throw new InputException(Dir, $"cannot replace the folder ({e.Message.Replace(Staging, Dir, StringComparison.Ordinal).Replace(aside, Dir, StringComparison.Ordinal)}); the old files are unchanged.");
        }
        return _names.Select(n => Path.Combine(Dir, n)).ToList();
    }

    /// <summary>Removes the temporary folder if the set was not committed (the old files stay).</summary>
    public void Dispose()
    {
        if (_done) return;
        _done = true;
        TryDeleteFolder(Staging);
    }

    /// <summary>Refuses a folder that holds anything PadPlan did not write there (but a file under one of <paramref name="replacing"/>), or a file the user made read-only.</summary>
    private static void EnsureOurs(string dir, IReadOnlyCollection<string> replacing)
    {
        if (!Directory.Exists(dir)) return;
        var listed = ListOf(dir);
        // a set holds plain files only: a folder under a listed name is the builder's, not a file of the old set
        var foreign = Directory.EnumerateFileSystemEntries(dir).Select(Path.GetFileName)
            .Where(n => n != ListName && (!File.Exists(Path.Combine(dir, n!)) || !(listed.Contains(n!) || replacing.Contains(n!)))).Order(StringComparer.Ordinal).ToList();
        if (foreign.Count > 0)
            throw new InputException(dir,
                $"the folder holds {foreign.Count} file{(foreign.Count == 1 ? "" : "s")} PadPlan did not write ({string.Join(", ", foreign.Take(3).Select(n => $"\"{Shorten(n!)}\""))}{(foreign.Count > 3 ? ", ..." : "")}); " +
                "PadPlan replaces its output folder as a whole, so it writes only into a new or empty folder, or one it wrote before. Give another folder, or move those files out. Nothing was changed.");
        foreach (var name in listed.Concat(replacing))
            AtomicFile.EnsureReplaceable(Path.Combine(dir, name));
    }

    private static HashSet<string> ListOf(string dir)
    {
        var list = Path.Combine(dir, ListName);
        if (!File.Exists(list)) return new HashSet<string>(StringComparer.Ordinal);
        var bytes = InputFile.ReadAllBytes(list, 1024 * 1024, "list of PadPlan's output files");
        return new System.Text.UTF8Encoding(false).GetString(bytes).Split('\n', StringSplitOptions.RemoveEmptyEntries)
            .Where(n => n == Path.GetFileName(n) && !n.StartsWith('.')).ToHashSet(StringComparer.Ordinal);
    }

    // A folder set aside by a run that was killed before the new one took its place goes back, if nothing took its place since.
    private static void RestoreAside(string parent, string full)
    {
        if (!Directory.Exists(parent)) return;
        foreach (var aside in Directory.EnumerateDirectories(parent, $".{Path.GetFileName(full)}.*.old").Order(StringComparer.Ordinal).ToList())
        {
            if (!AtomicFile.IsLeftover(aside)) continue;
            if (!Directory.Exists(full)) Directory.Move(aside, full);
            else TryDeleteFolder(aside);
        }
    }

    private static string Shorten(string name) => name.Length <= 40 ? name : name[..39] + "…";

    private static void TryDeleteFolder(string path)
    {
        try
        {
            if (Directory.Exists(path)) Directory.Delete(path, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // left for the next run to remove
        }
    }
}
