using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Rules.Shapes;

namespace PadPlan.Tests.Rules;

/// <summary>The height rules by fault injection on the tiny-buffer fixture: bodies that meet above the board, a body held
/// clear of a pad, and bare leads through or too close under another part's body. Heights come from the footprints
/// (docs/footprints.md); the joint height and the lead gap are rules of thumb (common practice, no source).</summary>
public class HeightRuleTests
{
    private static readonly Project Tiny = ProjectFile.Read(TestPaths.TinyBuffer);

    private static Finding? Find(Project p, string rule, params string[] items) =>
        Checker.Check(p).Findings.FirstOrDefault(f => f.RuleId == rule && items.All(f.Items.Contains));

    private static string All(Project p) => string.Join("\n", Checker.Check(p).Findings.Select(f => $"{f.RuleId}: {f.Message}"));

    [Fact]
    public void Two_upright_parts_whose_bodies_meet_above_the_board_are_caught()
    {
        // Q1 (TO-92 standing on 2.5 mm of lead) moved over C2 (a disc standing 1 mm up): both bodies fill 4.1-8.6 mm above the plane.
        var moved = Tiny.MovePart("Q1", 37.5, 19);
        var solids = Solids.Of(ResolvedPlan.Of(moved));
        var (q1, c2) = (solids.Single(s => s.Ref == "Q1"), solids.Single(s => s.Ref == "C2"));
        Assert.True(q1.Bottom > 1.6 && c2.Bottom > 1.6, "both bodies stand clear of the pads: the meeting is above the board");
        var hit = Find(moved, RuleIds.BodyOverlap, "C2", "Q1");
        Assert.True(hit is not null, All(moved));
        Assert.Equal(Severity.Error, hit!.Severity);
    }

    [Fact]
    public void Bodies_at_different_heights_do_not_meet()
    {
        // The same two outlines overlapping in plan, but Q1 raised on its leads until its underside is above C2's top.
        var raised = Footprint(Tiny, "to92", f => Rebuild(f, height: 16, leadBend: 10));
        var moved = raised.MovePart("Q1", 37.5, 19);
        Assert.Null(Find(moved, RuleIds.BodyOverlap, "C2", "Q1"));
    }

    [Fact]
    public void A_standing_body_held_clear_of_a_pad_is_not_over_it()
    {
        // Q1's underside stands 2.5 mm above P5's top (more than the 1 mm a joint stands): no body-over-pad.
        // R1 lying on its pads over the same pad does get the warning.
        Assert.Null(Find(Tiny.MovePart("Q1", 43, 18), RuleIds.BodyOverPad, "Q1", "P5"));
        var low = Tiny.MovePart("R1", 43, 18);
        Assert.True(Find(low, RuleIds.BodyOverPad, "R1", "P5") is not null, All(low));
    }

    [Fact]
    public void A_lead_through_a_lying_body_is_caught()
    {
        // R3 (lying on its pads, 1.6-4.0 mm) moved across C2's lead 1, which comes in at 2.6 mm and drops onto P4 at (33, 18).
        var moved = Tiny.MovePart("R3", 33.5, 18);
        var hit = Find(moved, RuleIds.LeadMeetsBody, "C2.1", "R3");
        Assert.True(hit is not null, All(moved));
        Assert.Contains("through", hit!.Message);
    }

    [Fact]
    public void A_lead_under_a_lying_body_closer_than_the_lead_gap_is_caught()
    {
        // R3 given leads bent 1.95 mm up: its body's underside is 1.6 + 2 x 1.95 - 2.4 = 3.1 mm above the plane. C2's lead 1
        // (0.5 mm wire at 2.6 mm) runs under it with 3.1 - 2.85 = 0.25 mm to spare, less than the 0.5 mm lead gap.
        var raised = RaisedR3(leadBend: 1.95).MovePart("R3", 34, 18);
        var hit = Find(raised, RuleIds.LeadMeetsBody, "C2.1", "R3");
        Assert.True(hit is not null, All(raised));
        Assert.Contains("0.25 mm under", hit!.Message);
        // 2.2 mm up: underside at 3.6 mm, 0.75 mm of room: enough.
        Assert.Null(Find(RaisedR3(leadBend: 2.2).MovePart("R3", 34, 18), RuleIds.LeadMeetsBody, "C2.1", "R3"));
    }

    private static Project RaisedR3(double leadBend)
    {
        var f = Tiny.FootprintOf(Tiny.Parts.Single(p => p.Ref == "R3"));
        var raised = Rebuild(f, f.Height, leadBend, "res-raised");
        return Tiny with
        {
            Footprints = Tiny.Footprints.Add(raised),
            Parts = Tiny.Parts.Select(p => p.Ref != "R3" ? p : new Part(p.Ref, p.Value, raised.Name, p.Pins, p.Variant)).ToValueList(),
        };
    }

    private static Project Footprint(Project p, string name, Func<Footprint, Footprint> edit) =>
        p with { Footprints = p.Footprints.Select(f => f.Name == name ? edit(f) : f).ToValueList() };

    private static Footprint Rebuild(Footprint f, double height, double leadBend, string? name = null) =>
        new(name ?? f.Name, f.Family, f.Description, f.Body, height, f.Leads, f.Mount, f.Source, f.Variants, f.Marks, f.Shape, leadBend, f.OutsideLead);
}
