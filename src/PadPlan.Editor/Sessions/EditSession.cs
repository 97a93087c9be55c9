using System.Security.Cryptography;
using PadPlan.Editor.Edits;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Sessions;

/// <summary>
/// One project open in the editor: the current plan as an immutable value, every earlier plan for undo and every undone
/// plan for redo (no limit within the session), and what the file on disk held when it was loaded, so a save never
/// overwrites someone else's change. All members are safe to call from several request threads.
/// </summary>
public sealed class EditSession : IDisposable
{
    private readonly Lock _gate = new();
    // Holds this session's own recovery copy name, so a second editor on the same project keeps its copy under another name.
    private WriterLock? _recoveryClaim;
    private readonly Stack<Project> _undo = new();
    private readonly Stack<Project> _redo = new();
    private byte[] _diskHash;
    private Project _saved;

    private EditSession(string path, Project project, byte[] diskHash)
    {
        Path = path;
        Current = _saved = project;
        _diskHash = diskHash;
        (RecoveryPath, _recoveryClaim) = ClaimRecovery(path);
    }

    /// <summary>Full path of the project file; never sent to the page.</summary>
    public string Path { get; private set; }
    public Project Current { get; private set; }
    /// <summary>Goes up by one with every change, so the page can tell a fresh view from a stale one.</summary>
    public int Revision { get; private set; }
    public bool Unsaved => !Equals(Current, _saved);
    public bool CanUndo => _undo.Count > 0;
    public bool CanRedo => _redo.Count > 0;
    public string FileName => System.IO.Path.GetFileName(Path);

    /// <summary>
    /// This session's copy, kept beside the project while there are unsaved edits: "NAME.unsaved.padplan.json", or
    /// "NAME.unsaved-2.padplan.json" (and on) when another editor already has the first one open.
    /// </summary>
    public string RecoveryPath { get; private set; }

    /// <summary>True once this session's recovery copy is on disk.</summary>
    public bool RecoveryKept => File.Exists(RecoveryPath);

    /// <summary>The n-th recovery copy name of a project: "NAME.unsaved.padplan.json", then "NAME.unsaved-2.padplan.json", ...</summary>
    public static string RecoveryPathOf(string path, int n = 1)
    {
        var name = System.IO.Path.GetFileName(path);
        var stem = name.EndsWith(ProjectFile.Extension, StringComparison.OrdinalIgnoreCase) ? name[..^ProjectFile.Extension.Length] : name;
        return System.IO.Path.Combine(System.IO.Path.GetDirectoryName(path) ?? ".", stem + ".unsaved" + (n > 1 ? $"-{n}" : "") + ProjectFile.Extension);
    }

    /// <summary>Copies this many per project at most; more editors than that on one file is a mistake worth stopping.</summary>
    private const int MaxRecoveryCopies = 20;

    /// <summary>A recovery copy left by an editor that is no longer running (its name is not claimed by a live one), or null.</summary>
    public static string? LeftOverRecovery(string path)
    {
        for (var n = 1; n <= MaxRecoveryCopies; n++)
        {
            var candidate = RecoveryPathOf(System.IO.Path.GetFullPath(path), n);
            if (!File.Exists(candidate)) continue;
            try
            {
                using (WriterLock.Take(candidate)) return candidate;
            }
            catch (InputException)
            {
                // another editor running now keeps this copy up to date
            }
        }
        return null;
    }

    // The first recovery name that holds no file and that no running editor has claimed.
    private static (string, WriterLock) ClaimRecovery(string path)
    {
        for (var n = 1; n <= MaxRecoveryCopies; n++)
        {
            var candidate = RecoveryPathOf(path, n);
            if (File.Exists(candidate)) continue;
            try
            {
                return (candidate, WriterLock.Take(candidate));
            }
            catch (InputException)
            {
                // claimed by an editor running now: try the next name
            }
        }
        throw new InputException(path, $"{MaxRecoveryCopies} editors already have {System.IO.Path.GetFileName(path)} open, or their recovery copies are left beside it; finish them or open those copies first.");
    }

    /// <summary>Lets go of this session's recovery name; the copy itself stays on disk when there are unsaved edits.</summary>
    public void Dispose()
    {
        lock (_gate)
        {
            _recoveryClaim?.Dispose();
            _recoveryClaim = null;
        }
    }

    /// <summary>Reads the project (throws <see cref="InputException"/> for a bad file) and remembers what the disk held.</summary>
    public static EditSession Open(string path)
    {
        var full = System.IO.Path.GetFullPath(path);
        var project = ProjectFile.Read(full);
        return new EditSession(full, project, HashOf(full) ?? []);
    }

    /// <summary>Applies an edit; throws <see cref="EditRefused"/> and changes nothing when it cannot be applied or kept.</summary>
    public void Apply(EditRequest edit)
    {
        lock (_gate) Replace(EditApplier.Apply(Current, edit));
    }

    /// <summary>
    /// Makes a whole new plan current (an edit, a swap, the placer's result) as one undoable step. Refused with
    /// <see cref="EditRefused"/>, changing nothing, when the plan would not read back from its own file (a value
    /// outside the project format's limits) or when its recovery copy cannot be written.
    /// </summary>
    public void Replace(Project next)
    {
        lock (_gate)
        {
            if (Equals(next, Current)) return;
            Keep(next, ReadsBack(next));
            _undo.Push(Current);
            _redo.Clear();
            Current = next;
            Revision++;
        }
    }

    /// <summary>The file bytes of a plan, once they have been read back as the same plan; refused otherwise.</summary>
    private byte[] ReadsBack(Project next)
    {
        var bytes = ProjectFile.ToBytes(next);
        try
        {
            if (Equals(ProjectFile.Parse(bytes, FileName), next)) return bytes;
        }
        catch (InputException e)
        {
            throw new EditRefused($"not applied: the project file could not hold the result ({(e.JsonPath is { } at ? at + ": " : "")}{e.Message.TrimEnd('.')}).");
        }
        throw new EditRefused("not applied: the project file would not read back as this plan.");
    }

    // The recovery copy follows every change and is written before the change is made: a change that cannot be kept is not made.
    // It is written while unsaved and removed once the plan is back to what the file holds.
    private void Keep(Project next, byte[] bytes)
    {
        try
        {
            if (!Equals(next, _saved)) AtomicFile.WriteAllBytes(RecoveryPath, bytes);
            else if (File.Exists(RecoveryPath)) File.Delete(RecoveryPath);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InputException)
        {
            throw new EditRefused($"not applied: the recovery copy {System.IO.Path.GetFileName(RecoveryPath)} could not be written ({e.Message}). Free some disk space or make the folder writable, then try again; the plan is as it was.");
        }
    }

    public bool Undo() => Step(_undo, _redo);

    public bool Redo() => Step(_redo, _undo);

    private bool Step(Stack<Project> from, Stack<Project> to)
    {
        lock (_gate)
        {
            if (from.Count == 0) return false;
            Keep(from.Peek(), ProjectFile.ToBytes(from.Peek()));
            to.Push(Current);
            Current = from.Pop();
            Revision++;
            return true;
        }
    }

    /// <summary>Writes the plan atomically over the project file, unless the file changed on disk since it was loaded or last saved.</summary>
    public SaveOutcome Save()
    {
        lock (_gate)
        {
            var onDisk = HashOf(Path);
            if (onDisk is null || !onDisk.AsSpan().SequenceEqual(_diskHash))
                return new SaveOutcome(false, FileName,
                    $"{FileName} was changed on disk after it was opened here, so saving would lose that change. Keep a copy instead (\"keep as copy\"), then compare the two.");
            if (Refusal(Path) is { } refused) return refused;
            return new SaveOutcome(true, FileName, $"saved {FileName}");
        }
    }

    /// <summary>Writes the plan to a new numbered file beside the project ("NAME-2.padplan.json", ...) chosen here, never by the page, and goes on editing that file.</summary>
    public SaveOutcome SaveCopy()
    {
        lock (_gate)
        {
            var copy = FreeCopyPath(Path);
            var oldRecovery = RecoveryPath;
            if (Refusal(copy) is { } refused) return refused;
            if (File.Exists(oldRecovery)) File.Delete(oldRecovery);
            Path = copy;
            _recoveryClaim?.Dispose();
            (RecoveryPath, _recoveryClaim) = ClaimRecovery(copy);
            return new SaveOutcome(true, FileName, $"kept the plan as {FileName} beside the project; this page now edits that file");
        }
    }

    /// <summary>Writes the plan to the file, or says why not: the same claim as every other writer (a read-only file, or another padplan changing it, is refused).</summary>
    private SaveOutcome? Refusal(string path)
    {
        try
        {
            WriteTo(path);
            return null;
        }
        catch (InputException e)
        {
            return new SaveOutcome(false, FileName, e.Message);
        }
    }

    private void WriteTo(string path)
    {
        var bytes = ProjectFile.ToCheckedBytes(Current, path);
        using (ProjectFile.Claim(path)) AtomicFile.WriteAllBytes(path, bytes);
        _diskHash = SHA256.HashData(bytes);
        _saved = Current;
        Revision++;
        if (File.Exists(RecoveryPath)) File.Delete(RecoveryPath);
    }

    /// <summary>The first free "BASE-N.padplan.json" beside the project, N from 2; a copy of a copy numbers the same base ("p-3", never "p-2-2").</summary>
    internal static string FreeCopyPath(string path)
    {
        var dir = System.IO.Path.GetDirectoryName(path) ?? ".";
        var name = System.IO.Path.GetFileName(path);
        var stem = name.EndsWith(ProjectFile.Extension, StringComparison.OrdinalIgnoreCase) ? name[..^ProjectFile.Extension.Length] : System.IO.Path.GetFileNameWithoutExtension(name);
        var numbered = System.Text.RegularExpressions.Regex.Match(stem, @"^(?<base>.+)-[0-9]+$");
        if (numbered.Success) stem = numbered.Groups["base"].Value;
        for (var n = 2; ; n++)
        {
            var candidate = System.IO.Path.Combine(dir, $"{stem}-{n}{ProjectFile.Extension}");
            if (!File.Exists(candidate)) return candidate;
        }
    }

    private static byte[]? HashOf(string path)
    {
        try
        {
            return SHA256.HashData(InputFile.ReadAllBytes(path, ProjectFiles.Limits.InputLimits.MaxFileBytes, "project file"));
        }
        catch (InputException)
        {
            return null;
        }
    }
}
