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
        project = project with { Nets = project.Nets.Select(n => n.Name == "REF" ? n with { Class = NetClass.Rf } : n).ToValueList() };
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
            foreach (var landing in placement.Leads.Where(l => part.NetOf(l.Pin) == "REF"))
                longest = Math.Max(longest, placement.ToBoard(footprint.LeadForPin(landing.Pin, part.Variant)!.Exit).DistanceTo(landing.At));
        }
        // REF joins two axial resistors, whose leads bend down beside the body: their reach is never zero.
        Assert.True(longest > 0.5, $"the REF net's longest lead is {longest} mm");
        Assert.Equal(longest, result.Summary!.LongestRfLead, 9);
        Assert.Contains("longest on an RF net", string.Join("\n", result.Summary.Lines()), StringComparison.Ordinal);
        // Without an RF net nothing is reported.
        var plain = Placer.Place(TestCircuits.DipStage(Board.Auto), PlacerSettings.Default);
        Assert.Equal(0, plain.Summary!.LongestRfLead);
        Assert.DoesNotContain(plain.Summary.Lines(), l => l.Contains("RF net", StringComparison.Ordinal));
    }

    [Fact]
    public void The_longest_lead_of_an_rf_net_is_weighted_in_the_cost_on_top_of_the_rf_factor()
    {
        // The same layout costed twice: the net with the most free leads marked RF, and every net general.
        var circuit = TestCircuits.Random(11, 14);
        var general = circuit with { Nets = circuit.Nets.Select(n => n with { Class = NetClass.General }).ToValueList() };
        var weights = CostWeights.Default;
        var chosen = ProblemBuilder.Build(general, PlacerSettings.Default, weights).Nets.Where(n => !n.Net.Ground).MaxBy(n => n.FreeLeads.Length)!.Net.Name;
        var rf = general with { Nets = general.Nets.Select(n => n.Name == chosen ? n with { Class = NetClass.Rf } : n).ToValueList() };
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
