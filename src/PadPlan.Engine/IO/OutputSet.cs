namespace PadPlan.IO;

/// <summary>
/// A set of files that replaces the old set in a folder as a whole: every file is first written into a temporary
/// folder ".FOLDER.PID.RANDOM.tmp" beside the target, and only when all are written (and every target can be replaced)
/// are they moved into place. A failure before that leaves the old files exactly as they were.
/// </summary>
public sealed class OutputSet : IDisposable
{
    private readonly List<string> _names = [];
    private bool _done;

    private OutputSet(string dir, string staging)
    {
        Dir = dir;
        Staging = staging;
    }

    /// <summary>The folder the set goes into.</summary>
    public string Dir { get; }
    /// <summary>The temporary folder the files are written into first.</summary>
    public string Staging { get; }

    /// <summary>Starts a set for <paramref name="dir"/>, first removing temporary files and folders left beside it by runs that were killed.</summary>
    public static OutputSet Begin(string dir)
    {
        var full = Path.TrimEndingDirectorySeparator(Path.GetFullPath(dir));
        var parent = Path.GetDirectoryName(full) ?? ".";
        AtomicFile.RemoveStaleTemps(parent);
        AtomicFile.RemoveStaleTemps(full);
        var staging = Path.Combine(parent, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            Directory.CreateDirectory(staging);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(full, $"cannot write beside this folder ({e.Message.Replace(staging, full, StringComparison.Ordinal)}); nothing was written.");
        }
        return new OutputSet(full, staging);
    }

    /// <summary>Writes one file of the set (into the temporary folder); returns the path it will have.</summary>
    public string Add(string name, ReadOnlySpan<byte> bytes)
    {
        if (name != Path.GetFileName(name) || name.StartsWith('.')) throw new ArgumentException($"'{name}' is not a plain file name.", nameof(name));
        try
        {
            using var stream = new FileStream(Path.Combine(Staging, name), FileMode.CreateNew, FileAccess.Write, FileShare.None);
            stream.Write(bytes);
            stream.Flush(flushToDisk: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(Path.Combine(Dir, name), $"cannot write the file ({e.Message.Replace(Staging, Dir, StringComparison.Ordinal)}); the old files in {Dir} are unchanged.");
        }
        _names.Add(name);
        return Path.Combine(Dir, name);
    }

    public string AddText(string name, string text) => Add(name, new System.Text.UTF8Encoding(false).GetBytes(text));

    /// <summary>Moves every file into place, after checking that each target can be replaced; returns the final paths in the order added.</summary>
    public IReadOnlyList<string> Commit()
    {
        Directory.CreateDirectory(Dir);
        var targets = _names.Select(n => Path.Combine(Dir, n)).ToList();
        foreach (var target in targets)
        {
            if (Directory.Exists(target)) throw new InputException(target, "a folder has the name of an output file; rename or remove it. The old files are unchanged.");
            AtomicFile.EnsureReplaceable(target);
        }
        for (var i = 0; i < _names.Count; i++) File.Move(Path.Combine(Staging, _names[i]), targets[i], overwrite: true);
        _done = true;
        Directory.Delete(Staging, recursive: true);
        return targets;
    }

    /// <summary>Removes the temporary folder if the set was not committed (the old files stay).</summary>
    public void Dispose()
    {
        if (_done) return;
        _done = true;
        try
        {
            if (Directory.Exists(Staging)) Directory.Delete(Staging, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // left for RemoveStaleTemps on the next run
        }
    }
}
