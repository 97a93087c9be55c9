using PadPlan.Editor.Edits;
using PadPlan.Editor.Sessions;
using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.Rules;

namespace PadPlan.Editor.Tests;

/// <summary>Edits, undo and redo, saving and the recovery copy, without a browser.</summary>
public sealed class EditSessionTests : IDisposable
{
    private readonly ExampleCopy _copy = new();
    private string Folder => _copy.Folder;
    private string ProjectPath => _copy.ProjectPath;

    public void Dispose() => _copy.Dispose();

    private string Recovery => Path.Combine(Folder, "tiny-buffer.unsaved.padplan.json");

    [Fact]
    public void Four_quarter_turns_give_back_the_same_plan()
    {
        var session = EditSession.Open(ProjectPath);
        var start = session.Current;
        for (var i = 0; i < 4; i++) session.Apply(new EditRequest { Kind = "turn-part", Ref = "C2" });
        // A quarter turn has order four: four of them are the identity (rotation group of the square).
        Assert.Equal(start.Layout!.Placements.First(p => p.Ref == "C2"), session.Current.Layout!.Placements.First(p => p.Ref == "C2"));
    }

    [Fact]
    public void Moving_a_part_carries_its_lead_ends_by_the_same_distance()
    {
        var session = EditSession.Open(ProjectPath);
        var before = session.Current.Layout!.Placements.First(p => p.Ref == "R3");
        session.Apply(new EditRequest { Kind = "move-part", Ref = "R3", X = before.Position.X + 1.5, Y = before.Position.Y - 0.5 });
        var after = session.Current.Layout!.Placements.First(p => p.Ref == "R3");
        foreach (var (a, b) in before.Leads.Zip(after.Leads))
        {
            Assert.Equal(a.At.X + 1.5, b.At.X, 9);
            Assert.Equal(a.At.Y - 0.5, b.At.Y, 9);
        }
    }

    [Fact]
    public void Moving_a_pad_keeps_the_leads_on_it_and_the_check_clean()
    {
        var session = EditSession.Open(ProjectPath);
        var pad = (RoundPad)session.Current.Layout!.Pads.First(p => p.Id == "P5");
        session.Apply(new EditRequest { Kind = "move-pad", Pad = "P5", X = pad.Center.X + 0.5, Y = pad.Center.Y + 0.5 });
        var landed = session.Current.Layout!.Placements.SelectMany(p => p.Leads).Where(l => l.Pad == "P5").ToList();
        Assert.NotEmpty(landed);
        Assert.All(landed, l => Assert.True(l.At.DistanceTo(new Point(pad.Center.X + 0.5, pad.Center.Y + 0.5)) < pad.Diameter / 2));
        Assert.Equal(0, Checker.Check(session.Current).Errors);
    }

    [Fact]
    public void Take_back_and_do_again_walk_the_whole_history()
    {
        var session = EditSession.Open(ProjectPath);
        var plans = new List<Project> { session.Current };
        session.Apply(new EditRequest { Kind = "turn-part", Ref = "C1" });
        plans.Add(session.Current);
        session.Apply(new EditRequest { Kind = "hold", Ref = "Q1", Held = true });
        plans.Add(session.Current);
        session.Apply(new EditRequest { Kind = "add-pad", X = 10, Y = 30, Net = "VCC" });
        plans.Add(session.Current);
        Assert.True(File.Exists(Recovery));
        Assert.Equal(session.Current, ProjectFile.Read(Recovery));
        for (var i = plans.Count - 2; i >= 0; i--)
        {
            Assert.True(session.Undo());
            Assert.Equal(plans[i], session.Current);
        }
        Assert.False(session.Undo());
        Assert.False(session.Unsaved);
        Assert.False(File.Exists(Recovery));
        for (var i = 1; i < plans.Count; i++)
        {
            Assert.True(session.Redo());
            Assert.Equal(plans[i], session.Current);
        }
        Assert.False(session.Redo());
    }

    [Fact]
    public void Holding_sets_the_locked_flag_that_the_file_keeps()
    {
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "hold", Ref = "Q1", Held = true });
        session.Apply(new EditRequest { Kind = "hold", Pad = "P2", Held = true });
        Assert.True(session.Save().Saved);
        var read = ProjectFile.Read(ProjectPath);
        Assert.True(read.FindPart("Q1")!.Locked);
        Assert.True(read.Layout!.Pads.First(p => p.Id == "P2").Locked);
        Assert.False(read.FindPart("R1")!.Locked);
    }

    [Fact]
    public void Removing_a_pad_removes_its_wire_links_and_leaves_its_leads_on_the_plane()
    {
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "add-pad", X = 44, Y = 30, Net = "OUT" });
        var added = session.Current.Layout!.Pads[^1].Id;
        session.Apply(new EditRequest { Kind = "add-link", From = "P5", To = added });
        Assert.Single(session.Current.Layout!.Jumpers);
        session.Apply(new EditRequest { Kind = "remove-pad", Pad = "P5" });
        Assert.Empty(session.Current.Layout!.Jumpers);
        Assert.DoesNotContain(session.Current.Layout!.Placements.SelectMany(p => p.Leads), l => l.Pad == "P5");
        // The leads that were soldered to P5 now touch bare plane: the checker calls that a lead off its pad.
        Assert.Contains(Checker.Check(session.Current).Findings, f => f.RuleId == RuleIds.LeadOffPad);
    }

    [Fact]
    public void Leads_dragged_across_each_other_show_as_crossing_on_the_page()
    {
        // R1 stands between P3 (above) and P2 (below); landing each lead on the other's pad runs them along one line.
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "land-lead", Ref = "R1", Pin = "1", X = 20, Y = 17 });
        session.Apply(new EditRequest { Kind = "land-lead", Ref = "R1", Pin = "2", X = 20, Y = 6.2 });
        var view = PadPlan.Editor.View.PlanViews.Build(session.Current);
        var crossing = view.Findings.FirstOrDefault(f => f.Rule == RuleIds.LeadCrossing && f.Items.SequenceEqual(["R1.1", "R1.2"]));
        Assert.NotNull(crossing);
        Assert.Equal("error", crossing.Severity);
        Assert.NotNull(crossing.At);
    }

    [Fact]
    public void A_lead_dragged_onto_the_plane_lands_there()
    {
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "land-lead", Ref = "R3", Pin = "1", X = 36, Y = 24, Net = "plane" });
        var lead = session.Current.Layout!.Placements.First(p => p.Ref == "R3").Leads.First(l => l.Pin == "1");
        Assert.True(lead.OnPlane);
        Assert.Equal(new Point(36, 24), lead.At);
    }

    [Theory]
    [InlineData("""{"kind":"move-part","ref":"X9","x":1,"y":1}""", "no part X9")]
    [InlineData("""{"kind":"move-part","ref":"R1"}""", "\"x\" and \"y\"")]
    [InlineData("""{"kind":"remove-pad","pad":"P99"}""", "no pad or strip P99")]
    [InlineData("""{"kind":"add-link","from":"P1","to":"P1"}""", "two different pads")]
    [InlineData("""{"kind":"add-pad","x":1,"y":1,"net":"NOPE"}""", "no net NOPE")]
    [InlineData("""{"kind":"fold"}""", "not an edit")]
    [InlineData("""{"kind":"land-lead","ref":"R1","pin":"9","x":1,"y":1}""", "no lead 9")]
    public void A_bad_edit_is_refused_with_a_reason_and_changes_nothing(string json, string reason)
    {
        var session = EditSession.Open(ProjectPath);
        var edit = System.Text.Json.JsonSerializer.Deserialize<EditRequest>(json, new System.Text.Json.JsonSerializerOptions(System.Text.Json.JsonSerializerDefaults.Web))!;
        var refused = Assert.Throws<EditRefused>(() => session.Apply(edit));
        Assert.Contains(reason, refused.Message, StringComparison.Ordinal);
        Assert.False(session.Unsaved);
        Assert.False(session.CanUndo);
    }

    [Fact]
    public void Save_refuses_when_the_file_changed_on_disk_and_keep_as_copy_writes_a_numbered_file_beside_it()
    {
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "turn-part", Ref = "C1" });
        File.AppendAllText(ProjectPath, " ");
        var changed = File.ReadAllBytes(ProjectPath);
        var outcome = session.Save();
        Assert.False(outcome.Saved);
        Assert.Equal(changed, File.ReadAllBytes(ProjectPath));
        var copy = session.SaveCopy();
        Assert.True(copy.Saved);
        Assert.Equal("tiny-buffer-2.padplan.json", copy.File);
        Assert.Equal(session.Current, ProjectFile.Read(Path.Combine(Folder, "tiny-buffer-2.padplan.json")));
        Assert.False(File.Exists(Recovery));
    }

    [Fact]
    public void Save_refuses_while_another_padplan_changes_the_file_and_leaves_it_as_it_was()
    {
        var session = EditSession.Open(ProjectPath);
        session.Apply(new EditRequest { Kind = "turn-part", Ref = "C1" });
        var before = File.ReadAllBytes(ProjectPath);
        using (PadPlan.IO.WriterLock.Take(ProjectPath))
        {
            var outcome = session.Save();
            Assert.False(outcome.Saved);
            Assert.Contains("is being changed by another padplan", outcome.Message, StringComparison.Ordinal);
            Assert.Equal(before, File.ReadAllBytes(ProjectPath));
        }
        Assert.True(session.Save().Saved); // the same save goes through once the other writer is done
        Assert.Equal(session.Current, ProjectFile.Read(ProjectPath));
    }
}
