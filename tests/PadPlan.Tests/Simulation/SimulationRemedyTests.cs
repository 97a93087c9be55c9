using PadPlan.Simulation;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Simulation;

/// <summary>
/// The check's note when there is no operating point must say what to do about this reason: installing ngspice does not help
/// when ngspice ran and refused the deck (as it did for a three-node NMOS before its bulk was tied to the source).
/// </summary>
public class SimulationRemedyTests
{
    [Theory]
    [InlineData(SimulationResult.NoSimulator, "Install ngspice")]
    [InlineData(SimulationResult.SwitchedOff, "Leave out --ngspice none")]
    [InlineData("ngspice printed no operating point (Error on line 7 or its substitute:)", "ngspice refused the deck PadPlan wrote")]
    [InlineData("ngspice found the circuit unsolvable at DC (singular matrix: a supply across a winding)", "ngspice ran but found no operating point: mend what the reason names")]
    public void The_remedy_follows_the_reason(string reason, string remedy)
    {
        Assert.StartsWith(remedy, SimulationResult.Without(reason).Remedy, StringComparison.Ordinal);
        if (reason != SimulationResult.NoSimulator) Assert.DoesNotContain("Install ngspice", SimulationResult.Without(reason).Remedy, StringComparison.Ordinal);
    }

    /// <summary>A VDMOS model takes three nodes in ngspice (its power MOSFET model has no bulk), so nothing is added to it.</summary>
    [Fact]
    public void A_three_node_vdmos_stays_three_nodes()
    {
        var project = ImportFixture.Import("vdmos\nV1 vdd 0 12\nRD vdd d 10\nRG vdd g 1k\nM1 d g 0 PWR\n.model PWR VDMOS(VTO=3 KP=5)\n.end\n").Project;
        Assert.Equal(3, project.Imported!.Elements.Single(e => e.Name == "M1").Nodes.Count);
    }
}
