using PadPlan.Model;
using PadPlan.ProjectFiles;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>The test-side checker must itself see broken layouts, or the placement tests prove nothing.</summary>
public class TestLayoutCheckerTests
{
    private static readonly Project Fixture = ProjectFile.Read(TestPaths.TinyBuffer);

    private static Project WithPad(string id, Func<RoundPad, Pad> change) => Fixture with
    {
        Layout = Fixture.Layout! with { Pads = Fixture.Layout.Pads.Select(p => p.Id == id ? change((RoundPad)p) : p).ToValueList() },
    };

    [Fact]
    public void The_hand_placed_fixture_passes() => Assert.Empty(TestLayoutChecker.Check(Fixture));

    [Fact]
    public void Pads_too_close_are_found()
    {
        // P1 (3.97 mm) at x 8 and P2 (6.35 mm) at x 20: moving P1 to x 14.5 leaves 14.5 + 1.985 = 16.485 vs 20 - 3.175 = 16.825, a 0.34 mm gap.
        var problems = TestLayoutChecker.Check(WithPad("P1", p => new RoundPad(p.Id, p.Net, new Point(14.5, 18), p.Diameter)));
        Assert.Contains(problems, p => p.StartsWith("pads P1 and P2"));
    }

    [Fact]
    public void A_lead_off_its_pad_and_a_keep_out_are_found()
    {
        var moved = WithPad("P5", p => new RoundPad(p.Id, p.Net, new Point(43, 25), p.Diameter));
        Assert.Contains(TestLayoutChecker.Check(moved), p => p.Contains("lands too near the edge of P5"));
        var holed = Fixture with { Board = Fixture.Board with { Keepouts = ValueList.Of<Keepout>(new CircleKeepout("hole", new Point(32, 18), 3)) } };
        Assert.Contains(TestLayoutChecker.Check(holed), p => p.Contains("keep-out hole"));
    }

    // R3 moved to 1 mm beside R2: their 2.4 mm wide bodies overlap by 1.4 mm.
    [Fact]
    public void Overlapping_bodies_are_found()
    {
        var placements = Fixture.Layout!.Placements.Select(p => p.Ref == "R3" ? new Placement(p.Ref, new Point(21, 27), p.Rotation, p.Leads) : p).ToValueList();
        var broken = Fixture with { Layout = Fixture.Layout with { Placements = placements } };
        Assert.Contains(TestLayoutChecker.Check(broken), p => p.Contains("bodies of") && p.Contains("R3"));
    }
}
