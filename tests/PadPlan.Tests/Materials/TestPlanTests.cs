using PadPlan.Output.Tables;
using PadPlan.Model;
using PadPlan.Materials;
using static PadPlan.Tests.Materials.Circuits;

namespace PadPlan.Tests.Materials;

public sealed class TestPlanTests
{
    private static List<string[]> Rows(Project project) => TestPlanTables.Tables(project)[0].Rows.Select(r => r.ToArray()).ToList();

    [Fact]
    public void Every_pad_is_tested_against_the_plane_and_joined_pads_must_beep()
    {
        var project = BuildOrderTests.LinkedProject();
        var rows = Rows(project);
        foreach (var island in project.Layout!.Islands())
            Assert.Single(rows, r => r[1] == "apart" && r[2] == island.Id && r[3] == DcPaths.Plane);
        var joined = Assert.Single(rows, r => r[1] == "joined" && r[2] == "P2");
        Assert.Equal(("P3", "beeps"), (joined[3], joined[4]));
        Assert.Contains("jumper W1", joined[5]);
        var ground = Assert.Single(rows, r => r[1] == "joined" && r[2] == DcPaths.Plane);
        Assert.Equal("C1.2", ground[3]);
        Assert.Equal(Enumerable.Range(1, rows.Count).Select(i => i.ToString()), rows.Select(r => r[0]));
    }

    // Neighbours: P1-P2 are 10 mm apart centre to centre with 4.76 mm discs, 5.24 mm edge to edge: beyond 5 mm, but
    // each pad is always tested against its nearest other-net pad. P2 and P3 share a net, so they are never "apart".
    [Fact]
    public void Near_pads_of_other_nets_are_tested_apart_and_same_net_pads_are_not()
    {
        var rows = Rows(BuildOrderTests.LinkedProject());
        var apart = rows.Where(r => r[1] == "apart" && r[3] != DcPaths.Plane).Select(r => (r[2], r[3])).ToList();
        Assert.Contains(("P1", "P2"), apart);
        Assert.Contains(("P3", "P4"), apart);
        Assert.DoesNotContain(("P2", "P3"), apart);
        Assert.Contains("5.24 mm apart", rows.Single(r => r[2] == "P1" && r[3] == "P2")[5]);
    }

    [Fact]
    public void Neighbouring_strip_segments_are_tested_for_an_uncut_score()
    {
        var layout = Circuits.MixedLayout();
        var project = Project([], Nets("N1", "N2", "N3", "N4", "N5", "N6", "N7", "N8"), layout);
        var rows = Rows(project);
        var score = Assert.Single(rows, r => r[2] == "U1.1" && r[3] == "U1.2");
        Assert.Contains("score is cut through", score[5]);
        Assert.Equal("silent", score[4]);
        // 15 islands, each once against the plane.
        Assert.Equal(15, rows.Count(r => r[3] == DcPaths.Plane));
    }

    // LC tank on pads: the tank pad reads low to the plane through L1 and the sheet says so rather than "silent".
    [Fact]
    public void A_coil_to_ground_is_expected_to_read_low_on_the_sheet()
    {
        var pads = ValueList.Of<Pad>(new RoundPad("P1", "IN", new Point(10, 10), 4.76), new RoundPad("P2", "TANK", new Point(20, 10), 6.35));
        var layout = new Layout(pads, ValueList<Placement>.Empty, ValueList<Jumper>.Empty);
        var project = Project(
            [Part("C1", "100p", "cap", "1=IN", "2=TANK"), Part("L1", "2u2", "choke", "1=TANK", "2=GND"), Part("C2", "330p", "cap", "1=TANK", "2=GND")],
            Nets("GND", "IN", "TANK"), layout);
        var rows = Rows(project);
        Assert.Equal("reads low via L1", rows.Single(r => r[2] == "P2" && r[3] == DcPaths.Plane)[4]);
        Assert.Equal("silent", rows.Single(r => r[2] == "P1" && r[3] == DcPaths.Plane)[4]);
        var paths = TestPlanTables.Tables(project)[1];
        Assert.Equal(["plane", "TANK", "low, about 0 Ω", "L1"], paths.Rows.Single().Take(4));
    }
}
