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
public sealed class EditSession
{
    private readonly Lock _gate = new();
    private readonly Stack<Project> _undo = new();
    private readonly Stack<Project> _redo = new();
    private byte[] _diskHash;
    private Project _saved;

    private EditSession(string path, Project project, byte[] diskHash)
    {
        Path = path;
        Current = _saved = project;
        _diskHash = diskHash;
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

    /// <summary>The copy kept beside the project while there are unsaved edits: "NAME.unsaved.padplan.json".</summary>
    public string RecoveryPath => RecoveryPathOf(Path);

    public static string RecoveryPathOf(string path)
    {
        var name = System.IO.Path.GetFileName(path);
        var stem = name.EndsWith(ProjectFile.Extension, StringComparison.OrdinalIgnoreCase) ? name[..^ProjectFile.Extension.Length] : name;
        return System.IO.Path.Combine(System.IO.Path.GetDirectoryName(path) ?? ".", stem + ".unsaved" + ProjectFile.Extension);
    }

    /// <summary>Reads the project (throws <see cref="InputException"/> for a bad file) and remembers what the disk held.</summary>
    public static EditSession Open(string path)
    {
        var full = System.IO.Path.GetFullPath(path);
        var project = ProjectFile.Read(full);
        return new EditSession(full, project, HashOf(full) ?? []);
    }

    /// <summary>Applies an edit; throws <see cref="EditRefused"/> and changes nothing when it cannot be applied.</summary>
    public void Apply(EditRequest edit)
    {
        lock (_gate) Replace(EditApplier.Apply(Current, edit));
    }

    /// <summary>Makes a whole new plan current (e.g. the placer's result) as one undoable step.</summary>
    public void Replace(Project next)
    {
        lock (_gate)
        {
            if (Equals(next, Current)) return;
            _undo.Push(Current);
            _redo.Clear();
            Current = next;
            Changed();
        }
    }

    public bool Undo() => Step(_undo, _redo);

    public bool Redo() => Step(_redo, _undo);

    private bool Step(Stack<Project> from, Stack<Project> to)
    {
        lock (_gate)
        {
            if (from.Count == 0) return false;
            to.Push(Current);
            Current = from.Pop();
            Changed();
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
        var recovery = RecoveryPathOf(path);
        if (File.Exists(recovery)) File.Delete(recovery);
    }

    // The recovery copy follows every change: written while unsaved, removed once the plan is back to what the file holds.
    private void Changed()
    {
        Revision++;
        if (Unsaved) AtomicFile.WriteAllBytes(RecoveryPath, ProjectFile.ToBytes(Current));
        else if (File.Exists(RecoveryPath)) File.Delete(RecoveryPath);
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
