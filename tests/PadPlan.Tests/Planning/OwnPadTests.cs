using PadPlan.Model;
using PadPlan.Planning;
using Xunit;
using static PadPlan.Tests.Planning.TestCircuits;

namespace PadPlan.Tests.Planning;

/// <summary>
/// A net broken at an IC's strip segments (a lead that cannot reach one without running under a body) is planned again
/// with pads of its own: the lead lands beside its part and a wire link joins the pad to the segment
/// (docs/placement.md, "Automatic board"). A transistor whose base goes to one row of a DIP and whose collector goes to the
/// other cannot reach both over the body: common practice, no source, is a link.
/// </summary>
public class OwnPadTests
{
    private static Project TransistorAcrossDip() => Project("across", Board.Auto,
        [new Net("GND", Ground: true), new Net("VCC", Class: NetClass.Power), new Net("NB"), new Net("NC"), new Net("NE")],
        [
            Part("U1", "dip8", ("2", "NB"), ("7", "NC"), ("4", "GND"), ("8", "VCC")),
            Part("Q1", "to92", ("B", "NB"), ("C", "NC"), ("E", "NE")),
            Part("R1", "res-axial-250mw", ("1", "NE"), ("2", "GND")),
        ]);

    /// <summary>The same transistor with its base and collector on one row of the DIP (pins 2 and 3, TestFootprints.Dip8).</summary>
    private static Project TransistorBesideDip() => Project("beside", Board.Auto,
        [new Net("GND", Ground: true), new Net("VCC", Class: NetClass.Power), new Net("NB"), new Net("NC"), new Net("NE")],
        [
            Part("U1", "dip8", ("2", "NB"), ("3", "NC"), ("4", "GND"), ("8", "VCC")),
            Part("Q1", "to92", ("B", "NB"), ("C", "NC"), ("E", "NE")),
            Part("R1", "res-axial-250mw", ("1", "NE"), ("2", "GND")),
        ]);

    private static int PadsOf(PlacementProblem p, string net) => p.Islands.Count(s => s.Net >= 0 && p.Nets[s.Net].Net.Name == net && !p.Items[s.Item].IsPart);

    [Fact]
    public void A_net_on_a_strip_gets_no_pad_of_its_own_until_asked()
    {
        var project = TransistorBesideDip();
        var plain = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default);
        var asked = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default, new SortedSet<string>(["NC"], StringComparer.Ordinal));
        Assert.Equal(0, PadsOf(plain, "NC")); // the collector may land on pin 3's segment
        Assert.Equal(1, PadsOf(asked, "NC")); // now it has a pad of its own as well
        Assert.Equal(PadsOf(plain, "NB"), PadsOf(asked, "NB")); // other nets are planned as before
    }

    /// <summary>
    /// A transistor wired to both rows of a DIP (base on pin 2, collector on pin 7, either side of the body: JEDEC MS-001 rows
    /// 7.62 mm apart, as TestFootprints.Dip8) cannot land on both rows' segments without a lead under the body unless it
    /// stands off the IC's end. A net the IC carries on both rows, or that the part shares with no IC, does not count.
    /// </summary>
    [Fact]
    public void A_part_wired_to_both_rows_of_an_IC_is_found()
    {
        Assert.Equal(new Dictionary<string, int> { ["NB"] = 1, ["NC"] = 1 }, AcrossRows.Of(TransistorAcrossDip()));
        Assert.Empty(AcrossRows.Of(TransistorBesideDip()));
        var both = TransistorAcrossDip() with { Parts = TransistorAcrossDip().Parts.Select(p => p.Ref == "U1" ? Part("U1", "dip8", ("2", "NB"), ("6", "NB"), ("7", "NC"), ("4", "GND"), ("8", "VCC")) : p).ToValueList() };
        Assert.Empty(AcrossRows.Of(both)); // NB is on both rows now, so NC alone is on one
    }

    /// <summary>
    /// On a circuit too large to be placed for steadiness, such nets get a pad of their own for every part wired across from
    /// the start: the benchmark's 500-part circuit, where two transistors are each wired to pins 10 and 1 or 5 (across the
    /// body) of one DIP-14 and share net N268, found no legal layout at quick effort without it. On a small circuit, and with
    /// anything held, the plan is as before.
    /// </summary>
    [Fact]
    public void A_large_circuit_plans_pads_for_parts_wired_across_an_IC_from_the_start()
    {
        var large = PadPlan.Bench.SyntheticCircuit.Make(500, 1500);
        var across = AcrossRows.Of(large);
        Assert.Equal(2, across["N268"]);
        Assert.Equal(2, PadsOf(ProblemBuilder.Build(large, PlacerSettings.Default, CostWeights.Default), "N268"));
        var small = ProblemBuilder.Build(TransistorAcrossDip(), PlacerSettings.Default, CostWeights.Default);
        Assert.Equal(0, PadsOf(small, "NC"));
    }

    /// <summary>
    /// A lead whose part stands beyond the IC, so that every way onto the IC's segment runs under the IC's body, takes its
    /// net's own pad when the net has one, though the segment is nearer: the checker fails a lead under a body
    /// (lead-meets-body), and the written layout passes it.
    /// </summary>
    [Fact]
    public void A_lead_from_beyond_an_IC_takes_its_nets_pad_not_the_segment_past_the_body()
    {
        var project = TransistorAcrossDip() with { Board = new Board(80, 60) };
        var problem = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default, new SortedSet<string>(["NB"], StringComparer.Ordinal));
        var state = new AnnealState(problem);
        new Annealer(state, 1).SpringStart();
        int Item(string name) => Enumerable.Range(0, problem.Items.Length).Single(i => problem.Items[i].Name == name);
        var (u1, q1, r1) = (Item("U1"), Item("Q1"), Item("R1"));
        var pad = Enumerable.Range(0, problem.Items.Length).Single(i => problem.Items[i].Pad?.Net == "NB");
        var baseLead = Enumerable.Range(0, problem.Leads.Length).Single(l => problem.Leads[l].Item == q1 && problem.Leads[l].Pin == "B");
        // U1 at (30, 30), unturned: pin 2's segment is bare to the left of the body (TestFootprints.Dip8: pins 1-4 on the left).
        // Q1 stands to the right of the body, its base about 10 mm from the segment's bare end through the IC; the net's pad
        // lies 12.7 mm above the base (its edge about 11 mm), clear of everything.
        (state.X[u1], state.Y[u1], state.Rot[u1]) = (30, 30, 0);
        (state.X[q1], state.Y[q1], state.Rot[q1]) = (36.5, 28.73, 0);
        (state.X[r1], state.Y[r1], state.Rot[r1]) = (45, 45, 0);
        (state.X[pad], state.Y[pad]) = (36.5, 16);
        state.Slack = 0;
        state.Recompute();
        var (ex, ey) = state.Exit(baseLead);
        var segment = problem.Items[u1].Islands.Single(s => problem.Islands[s].Net >= 0 && problem.Nets[problem.Islands[s].Net].Net.Name == "NB");
        var toSegment = state.Land(baseLead, segment, out _, out _, out _);
        var toPad = state.Land(baseLead, problem.Items[pad].Islands[0], out _, out _, out _);
        Assert.True(toSegment < toPad, $"the segment ({toSegment:0.0} mm) must be the nearer island (pad {toPad:0.0} mm, exit {ex:0.0}, {ey:0.0})");
        Assert.Equal(problem.Items[pad].Islands[0], state.IslandOf(baseLead));
        var written = project with { Layout = LayoutWriter.Write(state, 0, 0) };
        Assert.DoesNotContain(PadPlan.Rules.Checker.Check(written).Findings, f => f.RuleId == PadPlan.Rules.RuleIds.LeadMeetsBody && f.Message.Contains("Q1.B", StringComparison.Ordinal));
    }

    /// <summary>
    /// The benchmark's random 200-part circuit (ICs on scored strips, TO-92 transistors landing on their segments from both
    /// rows) found no legal layout at quick effort once bodies had heights; planning the broken nets again with their own
    /// pads places it, and the independent checker agrees.
    /// </summary>
    [Fact]
    public void Quick_effort_places_the_benchmark_200_part_circuit_with_heights_and_the_checker_agrees()
    {
        var result = Placer.Place(PadPlan.Bench.SyntheticCircuit.Make(200, 1), new PlacerSettings(Seed: 1, Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        var findings = CheckerVerdict.Check(result.Project!);
        Assert.True(findings.Count == 0, string.Join("\n", findings));
    }

    /// <summary>Two resistors on one net, 60 mm apart: one pad cannot be within both leads' reach (the net's lead limit, 15 mm by default: common practice, no source).</summary>
    private static Project ResistorsFarApart() => Project("far", new Board(100, 40),
        [new Net("GND", Ground: true), new Net("NA"), new Net("NS"), new Net("NB")],
        [
            Part("R1", "res-axial-250mw", ("1", "NA"), ("2", "NS")),
            Part("R2", "res-axial-250mw", ("1", "NS"), ("2", "NB")),
        ]);

    private static AnnealState FarApart(PlacementProblem problem)
    {
        var state = new AnnealState(problem);
        new Annealer(state, 1).SpringStart();
        (state.X[0], state.Y[0], state.Rot[0]) = (15, 20, 0);
        (state.X[1], state.Y[1], state.Rot[1]) = (75, 20, 0);
        // NS's one pad just beyond R1's lead 2 (which leaves at x = 18.15), as a run that could not serve both would leave it.
        var pad = problem.Items.Single(i => !i.IsPart && problem.Nets[problem.Islands[i.Islands[0]].Net].Net.Name == "NS").Index;
        (state.X[pad], state.Y[pad]) = (21, 20);
        state.Recompute();
        return state;
    }

    [Fact]
    public void A_broken_net_whose_leads_lie_far_apart_is_named_with_its_groups()
    {
        var state = FarApart(ProblemBuilder.Build(ResistorsFarApart(), PlacerSettings.Default, CostWeights.Default));
        var split = state.NetsSplitApart();
        Assert.Equal(2, split["NS"]); // R1.2 and R2.1, 60 mm apart, more than twice the net's lead limit
        Assert.False(split.ContainsKey("NA")); // one lead: one group
    }

    /// <summary>
    /// A failed layout carried over to the plan that gives the split net a pad per group keeps every part where it was, and
    /// the new pad goes beside the lead that fell short, so that net is no longer broken (a wire link joins its two pads).
    /// </summary>
    [Fact]
    public void A_failed_layout_carried_to_the_new_plan_keeps_its_parts_and_puts_the_new_pad_beside_the_short_lead()
    {
        var project = ResistorsFarApart();
        var old = FarApart(ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default));
        var replan = new PadReplan();
        Assert.True(replan.Learn(old));
        var problem = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default, replan.OwnPads, replan.Split);
        var carried = new AnnealState(problem);
        LayoutCarry.Into(old, carried);
        Assert.Equal((15.0, 75.0), (carried.X[0], carried.X[1]));
        var ns = Array.FindIndex(problem.Nets, n => n.Net.Name == "NS");
        Assert.Equal(2, problem.Nets[ns].Islands.Length);
        Assert.DoesNotContain(carried.Problems(), p => p.Contains("net NS", StringComparison.Ordinal));
        Assert.False(replan.Learn(carried)); // nothing more to learn: the plan stays as it is
    }
}
