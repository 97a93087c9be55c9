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

    [Fact]
    public void A_net_on_a_strip_gets_no_pad_of_its_own_until_asked()
    {
        var project = TransistorAcrossDip();
        var plain = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default);
        var asked = ProblemBuilder.Build(project, PlacerSettings.Default, CostWeights.Default, new SortedSet<string>(["NC"], StringComparer.Ordinal));
        int PadsOf(PlacementProblem p, string net) => p.Islands.Count(s => s.Net >= 0 && p.Nets[s.Net].Net.Name == net && !p.Items[s.Item].IsPart);
        Assert.Equal(0, PadsOf(plain, "NC")); // the collector may land on pin 7's segment
        Assert.Equal(1, PadsOf(asked, "NC")); // now it has a pad of its own as well
        Assert.Equal(PadsOf(plain, "NB"), PadsOf(asked, "NB")); // other nets are planned as before
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
}
