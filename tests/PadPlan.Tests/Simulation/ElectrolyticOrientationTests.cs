using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Simulation;
using PadPlan.Tests.Cli;
using PadPlan.Tests.Import;
using PadPlan.Tests.Lvs;

namespace PadPlan.Tests.Simulation;

/// <summary>
/// A SPICE capacitor has no polarity, so the deck's node order says nothing about which lead of an electrolytic is +.
/// With the operating point found by ngspice, the import turns such a capacitor so + is on the higher net. The worked
/// example is a divider by hand (Ohm's law): 9 V over 10k and 10k puts node b at 4.5 V, while the input node, returned to
/// ground through 100k, sits at 0 V; the deck names the input first, so C1 arrives reversed by 4.5 V.
/// </summary>
public class ElectrolyticOrientationTests
{
    private const string Deck = """
        coupling capacitor written input first
        V1 vcc 0 DC 9
        R1 vcc b 10k
        R2 b 0 10k
        R3 in 0 100k
        C1 in b 10u
        .end
        """;

    [NgspiceFact]
    public void A_deck_capacitor_on_an_electrolytic_is_turned_so_plus_is_on_the_higher_net()
    {
        var imported = ImportFixture.Import(Deck).Project;
        Assert.Equal("cap-elec-6.3mm", imported.FindPart("C1")!.Footprint);
        Assert.Equal("in", imported.FindPart("C1")!.NetOf("+")); // the deck's node order: first node +
        var op = Simulator.Run(imported).Point!;
        Assert.Equal(4.5, op.Volts("b")!.Value, 3);
        Assert.Contains(Checker.Check(imported with { Layout = Layout.Empty }, new CheckOptions(Simulation: SimulationResult.Of(op))).Findings, f => f.RuleId == RuleIds.CapReversed);

        var turned = ElectrolyticOrientation.Orient(imported, op);
        var c1 = turned.FindPart("C1")!;
        Assert.Equal(("b", "in"), (c1.NetOf("+"), c1.NetOf("-")));
        var line = Assert.Single(turned.Imported!.Summary, l => l.Topic == "polarity");
        Assert.Equal("C1", line.Item);
        Assert.StartsWith("+ on b (4.50 V at the operating point), - on in (0.00 V)", line.Became);
        // the deck line still joins the same nets in the same order: the simulation is the same circuit
        Assert.Equal(["in", "b"], turned.Imported.Elements.Single(e => e.Name == "C1").Nodes.Select(n => n.Net));
        var again = Simulator.Run(turned);
        Assert.Equal(4.5, again.Point!.Volts("b")!.Value, 3);
        Assert.DoesNotContain(Checker.Check(turned with { Layout = Layout.Empty }, new CheckOptions(Simulation: again)).Findings, f => f.RuleId == RuleIds.CapReversed);
    }

    /// <summary>A PadPlan netlist states the polarity (+= and -=): it is the builder's word and is never turned; the check reports it.</summary>
    [NgspiceFact]
    public void A_stated_polarity_is_never_turned()
    {
        var project = ImportFixture.Import("""
            net GND ground
            net VCC power 9V
            R1 10k 1=VCC 2=B
            R2 10k 1=B 2=GND
            R3 100k 1=IN 2=GND
            C1 10u cap-elec-6.3mm +=IN -=B
            """, "t.ppn").Project;
        var op = Simulator.Run(project).Point!;
        Assert.Equal("IN", ElectrolyticOrientation.Orient(project, op).FindPart("C1")!.NetOf("+"));
    }

    [NgspiceFact]
    public void Import_says_which_capacitors_it_turned()
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "coupling.cir");
        File.WriteAllText(deck, Deck);
        var run = CliRunner.Run("import", deck, "-o", Path.Combine(dir, "coupling.padplan.json"));
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("polarity", run.Err);
        Assert.Contains("+ on b (4.50 V at the operating point)", run.Err);
        var check = CliRunner.Run("check", Path.Combine(dir, "coupling.padplan.json"), "-q");
        Assert.DoesNotContain("cap-reversed", check.Out);
    }
}
