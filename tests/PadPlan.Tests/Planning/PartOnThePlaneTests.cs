using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Rules;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>
/// A part whose leads all go to ground stands on the plane, a stock thickness below a part on pads: the placer's own form of
/// the lead-meets-body rule must see that, or it calls legal a layout the checker fails (found on a 500-part benchmark
/// circuit: a DIP's ground lead 0.15 mm under such a transistor).
/// </summary>
public class PartOnThePlaneTests
{
    [Fact]
    public void A_lead_under_a_part_that_stands_on_the_plane_is_a_violation_for_the_placer_as_for_the_checker()
    {
        // A TO-92 (JEDEC TO-226 pitch, as TestFootprints) standing 2 mm up on its leads; the 2 mm is this test's own choice.
        var raised = new Footprint("to92-raised", "transistors", "TO-92 standing 2 mm up", TestFootprints.To92.Body, 5.2, TestFootprints.To92.Leads,
            MountStyle.Upright, "JEDEC TO-226", TestFootprints.To92.Variants, leadBend: 2.0);
        var project = TestCircuits.Project("plane-standing", Board.Auto,
            [new Net("GND", Ground: true), new Net("VCC", Class: NetClass.Power), new Net("N1")],
            [
                TestCircuits.Part("U1", "dip8", ("1", "N1"), ("4", "GND"), ("8", "VCC")),
                TestCircuits.Part("R1", "res-axial-250mw", ("1", "N1"), ("2", "VCC")),
                TestCircuits.Part("Q1", "to92-raised", ("1", "GND"), ("2", "GND"), ("3", "GND")),
            ]) with { Footprints = TestFootprints.All.Add(raised) };
        var problem = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default);
        var state = new AnnealState(problem);
        new Annealer(state, 3).SpringStart();
        var (u1, q1) = (0, 2);
        // U1's pin 4 leaves the body at (-3.81, 3.81), here (56.19, 63.81), and on its first ground landing drops straight down
        // there. Q1, turned a quarter (3.6 x 4.8 mm), stands over that spot, 0.43 mm clear of U1's body (the body gap is 0.3).
        (state.X[u1], state.Y[u1], state.Rot[u1]) = (60, 60, 0);
        (state.X[q1], state.Y[q1], state.Rot[q1]) = (54.59, 63.81, 1);
        state.GroundChoice[problem.Items[u1].GroundLeads.Single(l => problem.Leads[l].Pin == "4")] = 0;
        state.Recompute();
        var layout = LayoutWriter.Write(state, 0, 0);
        var checker = Checker.Check(project with { Layout = layout }).Findings
            .Where(f => f.RuleId == RuleIds.LeadMeetsBody && f.Message.Contains("U1.4", StringComparison.Ordinal)).ToList();
        // The checker (Solids: a part stands on the highest copper its leads land on) finds U1.4 under Q1's body.
        Assert.NotEmpty(checker);
        Assert.Contains(state.Problems(), p => p.Contains("U1.4", StringComparison.Ordinal) && p.Contains("Q1", StringComparison.Ordinal));
    }
}
