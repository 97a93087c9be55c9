using System.Globalization;
using PadPlan.Import;
using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Planning;
using PadPlan.Simulation;
using PadPlan.Tests.Import;
using PadPlan.Tests.Lvs;

namespace PadPlan.Tests.Simulation;

// The continuity plan checked against ngspice (Debian package ngspice, batch mode): for each "apart" pair a meter's
// diode test (3 V behind 2.4 kΩ, about 1 mA, common practice for handheld meters) is put on the circuit with its
// supplies removed, both ways round; the reading class (beeps / diode drop / open) must be the one the sheet prints.
public class ContinuityAgainstSimulatorTests
{
    private static string Deck(string name) => Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Simulation", "Decks", name);

    internal static Project Placed(string name)
    {
        var map = PartsMap.Read(Deck(name + ".parts.json"), ImportFixture.Library);
        var imported = NetlistImporter.ImportFile(Deck(name + ".cir"), new ImportOptions(ImportFixture.Library, map)).Project;
        var result = Placer.Place(imported, new PlacerSettings(Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        return result.Project!;
    }

    private enum Reading { Beeps, Diode, Open }

    [NgspiceTheory]
    [InlineData("jfet-vfo")]
    [InlineData("jfet-buffer")]
    public void Every_apart_reading_on_the_sheet_is_what_a_meter_reads_on_the_simulated_board(string name)
    {
        var project = Placed(name);
        var paths = DcPaths.Find(project);
        var deck = CircuitDeck.Of(project, powered: false);
        var program = NgspiceProgram.Find(SimulationOptions.Default)!;
        var nets = project.Layout!.Islands().ToDictionary(i => i.Id, i => i.Net ?? "", StringComparer.Ordinal);
        string NetOf(string probe) => probe == DcPaths.Plane ? project.Nets.First(n => n.Ground).Name : nets[probe];
        double Meter(string plus, string minus)
        {
            var (output, failure) = NgspiceProgram.Run(program, deck.WithDiodeTest(plus, minus), TimeSpan.FromSeconds(20));
            Assert.Null(failure);
            var (values, why) = NgspiceOutput.Parse(output!);
            Assert.True(values is not null, why);
            double V(string net) => deck.Nodes.TryGetValue(net, out var n) && n != "0" ? values!.Nodes[n] : 0;
            return V(plus) - V(minus);
        }
        var checkedRows = 0;
        foreach (var row in TestPlan.Tests(project, paths).Where(r => r.Test == "apart"))
        {
            var sheet = row.Expect.StartsWith("beeps", StringComparison.Ordinal) || row.Expect.StartsWith("reads low", StringComparison.Ordinal) ? Reading.Beeps
                : row.Expect.StartsWith("diode", StringComparison.Ordinal) ? Reading.Diode
                : row.Expect.StartsWith("silent", StringComparison.Ordinal) ? Reading.Open : (Reading?)null;
            if (sheet is null) continue; // "may read low": the netlist does not say
            var (a, b) = (NetOf(row.ProbeA), NetOf(row.ProbeB));
            var (forward, reverse) = (Meter(a, b), Meter(b, a));
            var low = Math.Min(forward, reverse);
            // a junction's drop (silicon, germanium, Schottky) reads under 1 V one way and far more the other; anything
            // else that is not a beep (a resistor path, a junction behind resistors) leaves a beeper silent
            var bothWays = row.Expect.Contains("both ways", StringComparison.Ordinal);
            var simulated = low < 0.06 ? Reading.Beeps
                : low < 1.0 && (bothWays ? Math.Max(forward, reverse) < 1.0 : Math.Abs(forward - reverse) > 0.3) ? Reading.Diode : Reading.Open;
            Assert.True(sheet == simulated, $"row {row.Number} {row.ProbeA}-{row.ProbeB} ({a} / {b}): the sheet says '{row.Expect}', the simulated meter reads {forward:0.###} V one way and {reverse:0.###} V the other ({simulated}).");
            if (sheet == Reading.Diode && row.Expect.Contains("red on ", StringComparison.Ordinal))
            {
                var red = row.Expect.Split("red on ")[1].Split(';')[0];
                Assert.Equal(forward < reverse ? row.ProbeA : row.ProbeB, red);
                var range = row.Expect.Split(' ')[1].Split('-').Select(x => double.Parse(x, CultureInfo.InvariantCulture)).ToArray();
                Assert.InRange(low, range[0] - 0.05, range[1] + 0.05); // the generic models' drop at about 1 mA against the trade's range
            }
            checkedRows++;
        }
        Assert.True(checkedRows > 3, $"only {checkedRows} rows checked");
    }

    [Fact]
    public void The_jfet_vfo_plan_has_a_diode_reading_across_every_junction_and_lists_the_jfet()
    {
        var project = Placed("jfet-vfo");
        var paths = DcPaths.Find(project);
        // gate to source is the JFET's gate junction (N-channel: gate is the anode) across the clamp diode D1 (anode on
        // the plane, which the source choke joins to the source): a diode both ways, never "silent"
        var gs = paths.Between("gate", "src");
        Assert.Equal(DcReading.OneWay, gs.Reading);
        Assert.True(gs.Junction!.BothWays);
        Assert.Contains("J1", gs.Through);
        Assert.Contains(paths.Paths, p => p.Through.Contains("J1", StringComparison.Ordinal));
        var islands = project.Layout!.Islands().ToDictionary(i => i.Id, i => i.Net);
        foreach (var row in TestPlan.Tests(project, paths).Where(r => r.Test == "apart" && r.Expect == "silent"))
        {
            var (a, b) = (row.ProbeB == DcPaths.Plane ? "GND" : islands[row.ProbeB]!, islands[row.ProbeA]!);
            Assert.NotEqual(DcReading.OneWay, paths.Between(a, b).Reading);
        }
        var table = TestPlanTables.PathTable(project, paths);
        Assert.Contains(table.Rows, r => r.Any(c => c.Contains("J1", StringComparison.Ordinal)));
    }

    [NgspiceFact]
    public void Every_printed_voltage_of_the_vfo_is_ngspices_to_the_printed_precision()
    {
        // the oracle: ngspice on the deck as written, with no PadPlan code in between (tests/PadPlan.Tests/Lvs/Ngspice.cs)
        var oracle = Ngspice.OperatingPoint(File.ReadAllText(Deck("jfet-vfo.cir")));
        var project = Placed("jfet-vfo");
        var simulation = Simulator.Run(project);
        Assert.True(simulation.Simulated, simulation.Reason);
        foreach (var net in project.Nets.Where(n => !n.Ground))
        {
            var printed = NetVoltage.Short(net, simulation);
            var expected = oracle[net.Name.ToLowerInvariant()].ToString("0.00", CultureInfo.InvariantCulture);
            Assert.Equal($" ({expected} V sim.)", printed);
        }
        // the regulated rail shows the zener's simulated voltage, not the 12 V upper bound
        Assert.StartsWith(" (6.", NetVoltage.Short(project.FindNet("vreg"), simulation), StringComparison.Ordinal);
        var power = PowerUpTable.For(project, simulation);
        Assert.Contains(power.Rows, r => r[1] == "Measure vreg to the plane" && r[3].StartsWith(oracle["vreg"].ToString("0.00", CultureInfo.InvariantCulture), StringComparison.Ordinal));
        // the bench supply's current limit: the simulated 12 V current (the oracle's branch current) x 1.5
        var current = -oracle["vsup#branch"];
        Assert.Contains(power.Rows, r => r[3].Contains($"current limit {NetVoltage.Amps(Math.Max(current * 1.5, current + 0.005))}", StringComparison.Ordinal));
    }
}
