using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Rules;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>
/// The project holds every lead's landing rounded to 0.01 mm, and the checker judges those. A lead whose run the placer found
/// just clear of another part's body could then pass a few thousandths too near it once written: found on a 500-part
/// benchmark circuit, where `place` made a layout and the checker failed it. The placer now keeps the same margin inside this
/// rule as inside every other (PlacerLimits.Safety).
/// </summary>
public class RoundedLandingTests
{
    // The footprint library's 6.3 mm radial can: an octagon round the can (circumradius 3.15 mm), standing 0.5 mm up on
    // leads 2.5 mm apart (typical, common practice).
    private static readonly Footprint Can = new("can-6.3", "capacitors", "Radial can, 6.3 mm",
        Enumerable.Range(0, 8).Select(k => new Point(3.15 * Math.Cos((22.5 + 45 * k) * Math.PI / 180), 3.15 * Math.Sin((22.5 + 45 * k) * Math.PI / 180))).ToValueList(), 11,
        ValueList.Of(new FootprintLead("+", new Point(-1.25, 0), 0.5, 0, 12), new FootprintLead("-", new Point(1.25, 0), 0.5, 0, 12)),
        MountStyle.Upright, "typical, common practice", leadBend: 0.5);

    [Fact]
    public void A_run_the_checker_fails_once_its_landing_is_rounded_is_broken_for_the_placer_too()
    {
        // The layout as the benchmark circuit's placement left it (R1 and C1 there were R486 and C488): R1 lies along y and its
        // lead 1 runs from (320.64, 210.28) down to the pad, landing where its minimum reach (1.7 mm) ends, at
        // (322.0017, 209.2130) unrounded: 0.0027 mm clear of C1's body widened by the lead's radius. Written, it is (322, 209.21),
        // 0.0002 mm inside.
        var project = TestCircuits.Project("rounded", Board.Auto.WithSize(340, 230),
            [new Net("GND", Ground: true), new Net("N1")],
            [TestCircuits.Part("R1", "res-axial-250mw", ("1", "N1"), ("2", "GND")), TestCircuits.Part("C1", "can-6.3", ("+", "N1"), ("-", "N1"))])
            with { Footprints = TestFootprints.All.Add(Can) };
        var layout = new Layout(
            ValueList.Of<Pad>(new RectPad("P1", "N1", new Point(325.65, 207.02), 8, 5.08)),
            ValueList.Of(
                new Placement("R1", new Point(320.64, 213.43), Rotation.R90, ValueList.Of(new LeadLanding("1", "P1", new Point(322, 209.21)), new LeadLanding("2", null, new Point(321.86, 215.36)))),
                new Placement("C1", new Point(322.08, 206), Rotation.R270, ValueList.Of(new LeadLanding("+", "P1", new Point(322.08, 207.25)), new LeadLanding("-", "P1", new Point(322.08, 204.76))))),
            ValueList<Jumper>.Empty);
        var placed = project with { Layout = layout };
        // The checker fails the written layout.
        Assert.Contains(Checker.Check(placed).Findings, f => f.RuleId == RuleIds.LeadMeetsBody && f.Message.Contains("R1.1", StringComparison.Ordinal) && f.Message.Contains("C1", StringComparison.Ordinal));
        // The placer, holding everything where it is, finds the same lead too near the same body.
        var state = new AnnealState(ProblemBuilder.Build(placed, PlacerSettings.Default with { KeepExisting = true }, CostWeights.Default)) { Slack = 0 };
        state.Recompute();
        Assert.Contains(state.Problems(), p => p.Contains("R1.1", StringComparison.Ordinal) && p.Contains("C1", StringComparison.Ordinal));
    }
}
