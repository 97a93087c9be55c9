using Xunit;
using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.Rules;

namespace PadPlan.Tests.Rules;

/// <summary>Start from a valid layout, inject one fault, and expect the checker to name it with the right rule.</summary>
public class FaultInjectionTests
{
    private static readonly Project Tiny = ProjectFile.Read(TestPaths.TinyBuffer);
    private static readonly Project Dip = DipFixture.Project;

    private static CheckReport Check(Project p) => Checker.Check(p);

    private static Finding Expect(CheckReport report, string rule, params string[] items)
    {
        var hit = report.Findings.FirstOrDefault(f => f.RuleId == rule && items.All(f.Items.Contains));
        Assert.True(hit is not null,
            $"expected {rule} on {string.Join(", ", items)}; found:\n" + string.Join("\n", report.Findings.Select(f => $"{f.RuleId}: {f.Message}")));
        return hit!;
    }

    [Fact]
    public void Tiny_buffer_passes_clean()
    {
        var report = Check(Tiny);
        Assert.True(report.Findings.Count == 0, string.Join("\n", report.Findings.Select(f => $"{f.RuleId}: {f.Message}")));
    }

    [Fact]
    public void Dip_fixture_passes_clean()
    {
        var report = Check(Dip);
        Assert.True(report.Findings.Count == 0, string.Join("\n", report.Findings.Select(f => $"{f.RuleId}: {f.Message}")));
    }

    [Fact]
    public void Lead_moved_to_another_nets_pad()
    {
        // C2.2 belongs on OUT (P5); land it inside P4 (EMIT) instead.
        var report = Check(Tiny.MoveLanding("C2", "2", "P4", 34, 18.5));
        Assert.Equal(Severity.Error, Expect(report, RuleIds.LeadWrongPad, "C2.2", "P4").Severity);
        Expect(report, RuleIds.Open, "OUT");
        Assert.False(report.Passed(strict: false));
    }

    [Fact]
    public void Transistor_turned_half_round_with_its_leads_left_on_their_pads()
    {
        // Q1 (TO-92, C B E at 1.27 mm pitch) turned 180 degrees: E now leaves the body left of B, while E still lands on
        // P4 to the right and B on P2 to the left, so the two bare leads cross on the way.
        var report = Check(Tiny.ReplacePlacement("Q1", pl => new Placement(pl.Ref, pl.Position, Rotation.R180, pl.Leads)));
        var hit = Expect(report, RuleIds.LeadCrossing, "Q1.B", "Q1.E");
        Assert.Equal(Severity.Error, hit.Severity);
        Assert.Contains("cross", hit.Message);
        Assert.False(report.Passed(strict: false));
    }

    [Fact]
    public void Leads_swapped_between_their_pads()
    {
        // R1 stands vertical between P3 (VCC, above) and P2 (BASE, below); swapping its landings makes each lead run
        // along the other over the body: the same line, 0 mm apart.
        var swapped = Tiny.MoveLanding("R1", "1", "P2", 20, 17).MoveLanding("R1", "2", "P3", 20, 6.2);
        var report = Check(swapped);
        Expect(report, RuleIds.LeadCrossing, "R1.1", "R1.2");
    }

    [Fact]
    public void Leads_nearer_than_a_wider_lead_gap()
    {
        // The tiny buffer passes with the default 0.5 mm; asking 8 mm between bare leads of two nets turns Q1.C (VCC, to
        // P3) and R1.2 (BASE, to P2), about 5.5 mm apart surface to surface, into a finding that says how far apart they are.
        var report = Check(Tiny with { Rules = Tiny.Rules with { LeadGap = 8 } });
        var near = report.Findings.Where(f => f.RuleId == RuleIds.LeadCrossing).ToList();
        Assert.NotEmpty(near);
        Assert.Contains(near, f => f.Message.Contains("apart") && f.Items.Contains("Q1.C") && f.Items.Contains("R1.2") && f.Message.Contains("need 8 mm"));
    }

    [Fact]
    public void Jumper_deleted()
    {
        var report = Check(Dip.RemoveJumper("JP1"));
        Expect(report, RuleIds.Open, "OUT", "U1.1", "U1.2");
        Assert.DoesNotContain(report.Findings, f => f.RuleId == RuleIds.Short || f.RuleId.Contains("short"));
    }

    [Fact]
    public void Two_pads_overlap()
    {
        // P5 (OUT) slid left onto P4 (EMIT), its leads with it.
        var report = Check(Tiny.MoveRoundPad("P5", -7, 0));
        Expect(report, RuleIds.PadShort, "P4", "P5");
    }

    [Fact]
    public void Pad_pushed_off_the_board()
    {
        var report = Check(Tiny.MoveRoundPad("P5", 6, 0));
        Expect(report, RuleIds.BoardMargin, "P5");
        Assert.DoesNotContain(report.Findings, f => f.RuleId is RuleIds.Open or RuleIds.LeadOffPad);
    }

    [Fact]
    public void Pad_over_filled()
    {
        // P4 carries three leads; a 3.97 mm punch takes two (DOMAIN §2 capacity table, common practice).
        var report = Check(Tiny.ResizeRoundPad("P4", 3.97));
        Expect(report, RuleIds.PadCapacity, "P4");
        Assert.Equal([RuleIds.PadCapacity], report.Findings.Where(f => f.Severity == Severity.Error).Select(f => f.RuleId).Distinct());
    }

    [Fact]
    public void Lead_stretched_past_its_reach()
    {
        // C1 moved 12 mm down: its leads now span just over the footprint's 12 mm.
        var report = Check(Tiny.MovePart("C1", 13, 30));
        Expect(report, RuleIds.LeadReach, "C1.1");
    }

    [Fact]
    public void Three_hundred_volts_on_thin_stock()
    {
        // IPC-2221 Table 6-1, B2, 251-300 V: 1.25 mm, more than the 0.8 mm edge of the pad's own stock.
        var hv = Tiny.ReplaceNet("VCC", n => new Net(n.Name, n.Ground, n.Class, 300, n.VoltageEstimated, n.Current, n.MaxLead, n.Role));
        var thin = Check(hv.ResizeRoundPad("P3", 4.76, stock: 0.8));
        Expect(thin, RuleIds.HvCreepage, "P3");
        Expect(thin, RuleIds.HvCaution, "VCC");
        // The same voltage on 1.6 mm stock clears the 1.25 mm.
        Assert.DoesNotContain(Check(hv).Findings, f => f.RuleId == RuleIds.HvCreepage);
    }

    [Fact]
    public void High_voltage_across_a_strip_score()
    {
        // IPC-2221 Table 6-1, B2, 251-300 V: 1.25 mm; the score between A3 and A4 is 0.6 mm.
        var report = Check(Dip.ReplaceNet("VEE", n => new Net(n.Name, n.Ground, n.Class, -300, n.VoltageEstimated, n.Current, n.MaxLead, n.Role)));
        Expect(report, RuleIds.HvSpacing, "A3", "A4");
    }

    [Fact]
    public void Rf_lead_longer_than_its_class_allows()
    {
        // BASE as an rf net: 5 mm limit (DOMAIN §2, common practice); Q1.B spans about 6.7 mm.
        var report = Check(Tiny.ReplaceNet("BASE", n => n with { Class = NetClass.Rf }));
        Expect(report, RuleIds.LeadLength, "Q1.B");
        Assert.Contains(report.Estimates, e => e.StartsWith("BASE (rf)", StringComparison.Ordinal));
    }

    [Fact]
    public void Ground_landing_too_near_a_pad()
    {
        var report = Check(Tiny.MoveLanding("R2", "2", null, 20, 22));
        Expect(report, RuleIds.GroundGap, "R2.2", "P2");
    }

    [Fact]
    public void Ground_landing_on_a_pad()
    {
        var report = Check(Tiny.MoveLanding("R2", "2", null, 20, 20.5));
        Expect(report, RuleIds.GroundOnPad, "R2.2", "P2");
    }

    [Fact]
    public void Lead_landing_beside_its_pad_shorts_to_ground()
    {
        var report = Check(Tiny.MoveLanding("C1", "1", "P1", 11, 18));
        Expect(report, RuleIds.LeadOffPad, "C1.1");
    }

    [Fact]
    public void Landing_near_the_pad_edge()
    {
        // A 0.5 mm lead 0.1 mm in from the edge of P1 (centre 8, 18, radius 1.985).
        var report = Check(Tiny.MoveLanding("C1", "1", "P1", 9.885, 18));
        Expect(report, RuleIds.LeadEdge, "C1.1", "P1");
        Assert.True(report.Passed(strict: false));
        Assert.False(report.Passed(strict: true));
    }

    [Fact]
    public void Bodies_overlap()
    {
        // R3 slid onto R2: two resistors lying on the same pads meet along their length.
        var report = Check(Tiny.MovePart("R3", 21, 27));
        Expect(report, RuleIds.BodyOverlap, "R2", "R3");
    }

    [Fact]
    public void Body_over_another_nets_pad()
    {
        // C1 slid over segment A2 (net OUT), which it does not connect to.
        var report = Check(Dip.MovePart("C1", 29, 26.5));
        Assert.Equal(Severity.Warning, Expect(report, RuleIds.BodyOverPad, "C1", "A2").Severity);
    }

    [Fact]
    public void Pad_in_a_keepout()
    {
        var report = Check(Tiny with { Board = Tiny.Board with { Keepouts = ValueList.Of<Keepout>(new CircleKeepout("H1", new Point(22, 5), 3)) } });
        Expect(report, RuleIds.Keepout, "P3", "H1");
    }

    [Fact]
    public void Unplaced_part_and_unused_pad()
    {
        var report = Check(Tiny.WithLayout(l => l with { Placements = l.Placements.Where(p => p.Ref != "J2").ToValueList() }));
        Expect(report, RuleIds.PartUnplaced, "J2");
        // P5 still holds C2.2, so it is used; remove C2 too and P5 stands empty.
        var empty = Check(Tiny.WithLayout(l => l with { Placements = l.Placements.Where(p => p.Ref is not ("J2" or "C2")).ToValueList() }));
        Assert.Equal(Severity.Warning, Expect(empty, RuleIds.PadUnused, "P5").Severity);
    }

    [Fact]
    public void Jumper_between_two_nets()
    {
        var report = Check(Dip.WithLayout(l => l with { Jumpers = l.Jumpers.Add(new Jumper("JP2", "A3", "A4")) }));
        Expect(report, RuleIds.JumperShort, "JP2");
    }

    [Fact]
    public void Narrow_strip_on_a_high_current_net()
    {
        // IPC-2221 conductor formula: 10 A at a 10 deg C rise on 35 um copper needs about 7 mm; the 3 mm strip segment is too narrow.
        var report = Check(Dip.ReplaceNet("VCC", n => new Net(n.Name, n.Ground, n.Class, n.Voltage, n.VoltageEstimated, 10, n.MaxLead, n.Role)));
        Expect(report, RuleIds.StripCurrent, "B1");
    }

    [Fact]
    public void Automatic_board_size_with_a_layout()
    {
        var report = Check(Tiny with { Board = Board.Auto });
        Expect(report, RuleIds.BoardSize);
    }

    [Fact]
    public void No_layout_at_all()
    {
        var report = Check(Tiny with { Layout = null });
        Assert.Equal(RuleIds.LayoutMissing, Assert.Single(report.Findings).RuleId);
    }
}
