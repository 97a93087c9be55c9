using PadPlan.Model;
using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>The floor under lead and jumper length: a worked example by hand, and no layout in the test corpus below it.</summary>
public class WireFloorTests
{
    private static PlacementProblem Problem(Project project) => ProblemBuilder.Build(project with { Layout = null }, PlacerSettings.Default, CostWeights.Default);

    [Fact]
    public void Transistor_on_three_nets_needs_the_pad_gap_between_neighbouring_landings()
    {
        // JEDEC TO-226 (TO-92): leads 1.27 mm apart, 0.45 mm thick. Landing points on pads of two nets keep the pad gap (1.0 mm by
        // default) plus half a lead each: 1.0 + 0.45 = 1.45 mm, so E and B together need 1.45 - 1.27 = 0.18 mm of lead; C cannot
        // pair with E as well (2.54 mm apart is far enough). Worked by hand from the rule.
        var project = TestCircuits.Project("to92", Board.Auto, [new Net("GND", Ground: true), new Net("A"), new Net("B"), new Net("C")],
            [TestCircuits.Part("Q1", "to92", ("E", "A"), ("B", "B"), ("C", "C"))]);
        Assert.Equal(0.18, Problem(project).LeadLengthFloor, 6);
    }

    [Fact]
    public void A_ground_lead_beside_a_pad_is_bound_by_the_ground_gap()
    {
        // Ground landing 1.0 mm (ground gap) from the pad's edge, the pad's lead 0.225 mm inside it: 1.225 mm < 1.27 mm pitch, no bound;
        // B and C on two nets: 0.18 mm as above. Worked by hand from the rule.
        var project = TestCircuits.Project("to92", Board.Auto, [new Net("GND", Ground: true), new Net("B"), new Net("C")],
            [TestCircuits.Part("Q1", "to92", ("E", "GND"), ("B", "B"), ("C", "C"))]);
        Assert.Equal(0.18, Problem(project).LeadLengthFloor, 6);
    }

    [Fact]
    public void A_net_of_more_leads_than_the_largest_pad_holds_needs_a_jumper()
    {
        // Default toolkit: the largest planned island is an 8 mm strip cut 30 mm long, 3 x 11 = 33 leads; 34 leads need two islands,
        // one jumper of at least the pad gap plus two of the smallest half sizes (3 mm strip: 1.5 mm; 3.18 mm punch: 1.59 mm).
        var parts = Enumerable.Range(1, 17).Select(i => TestCircuits.Part($"R{i}", "res-axial-250mw", ("1", "BUS"), ("2", "BUS"))).ToList();
        var project = TestCircuits.Project("bus", Board.Auto, [new Net("GND", Ground: true), new Net("BUS")], parts);
        Assert.Equal(1.0 + 2 * 1.5, Problem(project).JumperFloor, 6);
    }

    public static TheoryData<string> Corpus()
    {
        var data = new TheoryData<string> { "hand:tiny-buffer" };
        foreach (var name in ExampleProjects.Names()) data.Add("placed:" + name);
        data.Add("chain:40");
        data.Add("random:16");
        return data;
    }

    [Theory]
    [MemberData(nameof(Corpus))]
    public void No_layout_in_the_corpus_beats_the_floor(string which)
    {
        var (kind, name) = (which.Split(':')[0], which.Split(':')[1]);
        var project = kind switch
        {
            "hand" => PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer),
            "chain" => Placed(TestCircuits.Chain(7, int.Parse(name))),
            "random" => Placed(TestCircuits.Random(4, int.Parse(name))),
            _ => Placed(ExampleProjects.Unplaced(name)),
        };
        var problem = Problem(project);
        var layout = project.Layout!;
        foreach (var item in problem.Items.Where(i => i.IsPart))
        {
            var placement = layout.Placements.Single(p => p.Ref == item.Part!.Ref);
            var lead = placement.Leads.Sum(l => placement.ToBoard(item.Footprint!.LeadForPin(l.Pin, item.Part!.Variant)!.Exit).DistanceTo(l.At));
            var floor = WireFloor.LeadsOf(problem, item);
            Assert.True(lead >= floor - 0.01, $"{item.Part!.Ref}: {lead:0.00} mm of leads, floor {floor:0.00} mm");
        }
        var islands = layout.Islands().ToDictionary(i => i.Id, StringComparer.Ordinal);
        foreach (var net in problem.Nets)
        {
            var wire = layout.Jumpers.Where(j => islands[j.From].Net == net.Net.Name).Sum(j => islands[j.From].Center.DistanceTo(islands[j.To].Center));
            var floor = WireFloor.JumpersOf(problem, net);
            Assert.True(wire >= floor - 0.01, $"net {net.Net.Name}: {wire:0.00} mm of jumpers, floor {floor:0.00} mm");
        }
    }

    private static Project Placed(Project project)
    {
        var result = Placer.Place(project, new PlacerSettings(Seed: 2, Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        return result.Project!;
    }
}
