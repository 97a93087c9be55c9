using PadPlan.Model;
using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>
/// Leads on RF nets: each millimetre of lead adds about 1 nH (straight round wire, Grover's formula; Terman's handbook gives the
/// same order for thin leads, from memory), so the longest RF lead sets a net's worst stray inductance. The placer weights it
/// and the summary reports it.
/// </summary>
public class RfLeadTests
{
    [Fact]
    public void Summary_reports_the_longest_lead_on_an_rf_net_as_measured_on_the_written_layout()
    {
        var project = TestCircuits.DipStage(Board.Auto);
        project = project with { Nets = project.Nets.Select(n => n.Name == "IN" ? n with { Class = NetClass.Rf } : n).ToValueList() };
        var result = Placer.Place(project, PlacerSettings.Default);
        Assert.True(result.Succeeded, result.Failure?.Message);
        var placed = result.Project!;
        // Measured here from the written layout alone: the straight distance from the lead's exit on the body (footprint geometry,
        // turned and moved with the part) to where it lands.
        var longest = 0.0;
        foreach (var placement in placed.Layout!.Placements)
        {
            var part = placed.FindPart(placement.Ref)!;
            var footprint = placed.FindFootprint(part.Footprint)!;
            foreach (var landing in placement.Leads.Where(l => part.NetOf(l.Pin) == "IN"))
                longest = Math.Max(longest, placement.ToBoard(footprint.LeadForPin(landing.Pin, part.Variant)!.Exit).DistanceTo(landing.At));
        }
        Assert.True(longest > 0, "the IN net has leads, so its longest lead has a length");
        Assert.Equal(longest, result.Summary!.LongestRfLead, 9);
        Assert.Contains(result.Summary.Lines(), l => l.Contains("longest on an RF net", StringComparison.Ordinal));
        // Without an RF net nothing is reported.
        var plain = Placer.Place(TestCircuits.DipStage(Board.Auto), PlacerSettings.Default);
        Assert.Equal(0, plain.Summary!.LongestRfLead);
        Assert.DoesNotContain(plain.Summary.Lines(), l => l.Contains("RF net", StringComparison.Ordinal));
    }

    [Fact]
    public void The_longest_lead_of_an_rf_net_is_weighted_in_the_cost_on_top_of_the_rf_factor()
    {
        // The same layout costed twice: net N1 marked RF, and the same net marked general.
        var rf = TestCircuits.Random(11, 14);
        var general = rf with { Nets = rf.Nets.Select(n => n.Class == NetClass.Rf ? n with { Class = NetClass.General } : n).ToValueList() };
        var weights = CostWeights.Default;
        var a = new AnnealState(ProblemBuilder.Build(rf, PlacerSettings.Default, weights));
        new Annealer(a, 3).Scatter();
        var b = new AnnealState(ProblemBuilder.Build(general, PlacerSettings.Default, weights));
        b.CopyFrom(a);
        a.Recompute();
        var net = a.Problem.Nets.Single(n => n.Net.Class == NetClass.Rf);
        var lengths = net.FreeLeads.Select(l => a.Land(l, a.IslandOf(l), out _, out _, out _)).ToArray();
        Assert.True(lengths.Length >= 2, "the RF net needs leads of its own for the check to mean anything");
        // docs/placement.md, "Cost": a lead of length L costs L (1 + L / 10 mm), RF leads RfFactor times; each RF net's longest lead
        // costs RfLongestLead per mm more.
        var extra = lengths.Sum(len => (weights.RfFactor - 1) * len * (1 + len / weights.LongLead)) + weights.RfLongestLead * lengths.Max();
        Assert.Equal(b.Cost + extra, a.Cost, 6);
    }
}
