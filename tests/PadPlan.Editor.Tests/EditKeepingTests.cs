using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using PadPlan.Editor.Edits;
using PadPlan.Editor.Sessions;
using PadPlan.Model;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests;

/// <summary>
/// Every edit the session accepts can be kept: it reads back from the project file format (docs/limits.md), and its
/// recovery copy is on disk before it is applied. An edit that cannot be kept is refused with a message and changes nothing.
/// </summary>
public sealed class EditKeepingTests : IDisposable
{
    private readonly ExampleCopy _copy = new();

    public void Dispose() => _copy.Dispose();

    [Theory]
    // The positions of the issue: the project format allows board coordinates within ±2000 mm (InputLimits.Coordinate).
    [InlineData("move-part", "R1", -2001.0)]
    [InlineData("move-pad", "P2", -2500.0)]
    [InlineData("add-pad", null, 2000.5)]
    public void A_position_the_project_format_refuses_is_refused_and_nothing_changes(string kind, string? item, double x)
    {
        using var session = EditSession.Open(_copy.ProjectPath);
        var before = session.Current;
        var e = Assert.Throws<EditRefused>(() => session.Apply(new EditRequest { Kind = kind, Ref = kind == "move-part" ? item : null, Pad = kind == "move-pad" ? item : null, X = x, Y = 5 }));
        Assert.Contains("not applied", e.Message);
        Assert.Contains("2000", e.Message); // names the allowed range
        Assert.Equal(before, session.Current);
        Assert.Equal(0, session.Revision);
        Assert.False(session.RecoveryKept);
    }

    [Fact]
    public void An_edit_whose_recovery_copy_cannot_be_written_is_refused_and_not_applied()
    {
        // A folder standing where the recovery copy must go makes its write fail as a full disk or a read-only folder
        // would (the tests may run as root, for whom a read-only folder is writable).
        Directory.CreateDirectory(_copy.Beside("tiny-buffer.unsaved.padplan.json"));
        using var session = EditSession.Open(_copy.ProjectPath);
        var before = session.Current;
        var e = Assert.Throws<EditRefused>(() => session.Apply(new EditRequest { Kind = "turn-part", Ref = "C2" }));
        Assert.Contains("tiny-buffer.unsaved.padplan.json could not be written", e.Message);
        Assert.Equal(before, session.Current);
        Assert.False(session.Unsaved);
        Assert.False(session.CanUndo);
    }

    [Fact]
    public void Two_editors_on_one_project_keep_separate_recovery_copies_and_a_save_leaves_the_other_alone()
    {
        using var first = EditSession.Open(_copy.ProjectPath);
        using var second = EditSession.Open(_copy.ProjectPath);
        Assert.NotEqual(first.RecoveryPath, second.RecoveryPath);
        first.Apply(new EditRequest { Kind = "turn-part", Ref = "C2" });
        second.Apply(new EditRequest { Kind = "turn-part", Ref = "R1" });
        Assert.True(first.RecoveryKept);
        Assert.True(second.RecoveryKept);
        Assert.Equal(second.Current, ProjectFile.Read(second.RecoveryPath));

        Assert.True(first.Save().Saved);
        Assert.False(first.RecoveryKept);
        Assert.True(second.RecoveryKept); // the other editor's unsaved work is still on disk
        Assert.Equal(second.Current, ProjectFile.Read(second.RecoveryPath));
        Assert.Null(EditSession.LeftOverRecovery(_copy.ProjectPath)); // claimed by a running editor: not left over

        second.Dispose();
        Assert.Equal(second.RecoveryPath, EditSession.LeftOverRecovery(_copy.ProjectPath)); // its editor stopped: now it is
    }

    private static readonly string[] Kinds = ["move-part", "move-pad", "add-pad", "land-lead", "turn-part", "remove-pad", "add-link", "hold"];

    /// <summary>
    /// Property: whatever random edits are sent (positions far beyond the board, any part, pad or pin), the plan the
    /// session holds afterwards, and its recovery copy, read back from the file format as the same plan.
    /// </summary>
    [Property(MaxTest = 25)]
    public Property Anything_the_editor_keeps_reads_back(NonEmptyArray<(byte Kind, sbyte Item, short X, short Y)> edits)
    {
        using var copy = new ExampleCopy();
        using var session = EditSession.Open(copy.ProjectPath);
        var parts = session.Current.Parts.Select(p => p.Ref).ToArray();
        var pads = session.Current.Layout!.Pads.Select(p => p.Id).ToArray();
        foreach (var (kind, item, x, y) in edits.Get)
        {
            var k = Kinds[kind % Kinds.Length];
            var i = Math.Abs((int)item);
            // Positions from -3276.8 to 3276.7 mm in 0.1 mm steps: well past the format's ±2000 mm either way.
            var edit = new EditRequest
            {
                Kind = k, Ref = k is "move-part" or "turn-part" or "land-lead" or "hold" && i % 5 != 0 ? parts[i % parts.Length] : null,
                Pad = k is "move-pad" or "remove-pad" or "hold" ? pads[i % pads.Length] : null, Pin = i % 2 == 0 ? "1" : "2",
                X = x / 10.0, Y = y / 10.0, Held = i % 2 == 0, From = pads[i % pads.Length], To = pads[(i + 1) % pads.Length],
            };
            var before = session.Current;
            try
            {
                session.Apply(edit);
            }
            catch (EditRefused)
            {
                if (!Equals(before, session.Current)) return false.Label($"{k} was refused but changed the plan");
            }
        }
        var back = ProjectFile.Parse(ProjectFile.ToBytes(session.Current), "p.padplan.json");
        var recovery = !session.Unsaved || Equals(ProjectFile.Read(session.RecoveryPath), session.Current);
        return (Equals(back, session.Current) && recovery).Label("the plan or its recovery copy did not read back");
    }
}
