using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Simulation;
using PadPlan.Tests.Import;
using PadPlan.Tests.Lvs;

namespace PadPlan.Tests.Simulation;

// Worked examples by hand, each checked against ngspice (Debian package ngspice, batch mode), the outside oracle.
public class OperatingPointTests
{
    private static OperatingPoint Simulate(string text, string file = "t.cir", string? parts = null)
    {
        var project = ImportFixture.Import(text, file, parts).Project;
        var result = Simulator.Run(project);
        Assert.True(result.Simulated, result.Reason);
        return result.Point!;
    }

    [NgspiceFact]
    public void A_divider_matches_the_hand_calculation()
    {
        var op = Simulate("""
            divider
            V1 vcc 0 12
            R1 vcc mid 3.3k
            R2 mid 0 6.8k
            .end
            """);
        // Ohm's law by hand: Vmid = 12 x 6.8k / (3.3k + 6.8k) = 8.0792 V; I = 12 / 10.1k = 1.1881 mA; P(R1) = (12 - 8.0792)^2 / 3.3k = 4.658 mW
        Assert.Equal(12 * 6.8 / 10.1, op.Volts("mid")!.Value, 4);
        Assert.Equal(12 / 10.1e3, op.SupplyCurrent, 7);
        Assert.Equal(Math.Pow(12 - 12 * 6.8 / 10.1, 2) / 3.3e3, op.Of("R1")!.Power, 6);
        Assert.Equal(12 / 10.1e3, op.Of("R1")!.LargestCurrent, 7);
    }

    /// <summary>
    /// A MOSFET written with three nodes and an NMOS model, which ngspice itself refuses ("not enough nodes": only VDMOS takes
    /// three), is simulated with its bulk on the source, as a discrete part has it. Square law by hand (level 1, Shichman and
    /// Hodges 1968; ngspice's default W = L, so beta = KP): Id = KP / 2 x (Vgs - Vt)^2 = 1 mA/V^2 x (5 - 2)^2 = 9 mA, so
    /// V(d) = 12 - 500 x 9 mA = 7.5 V, in saturation (Vds 7.5 V > Vgs - Vt = 3 V).
    /// </summary>
    [NgspiceFact]
    public void A_three_node_nmos_gets_its_bulk_on_the_source_and_matches_the_square_law()
    {
        const string Deck = """
            three-node mosfet
            V1 vdd 0 12
            R1 vdd g 7k
            R2 g 0 5k
            RD vdd d 500
            M1 d g 0 MN
            .model MN NMOS(LEVEL=1 VTO=2 KP=2m)
            .end
            """;
        var imported = ImportFixture.Import(Deck);
        var m1 = imported.Project.Imported!.Elements.Single(e => e.Name == "M1");
        Assert.Equal(["d", "g", "GND", "GND"], m1.Nodes.Select(n => n.Net)); // node 0 is read as the ground net
        Assert.Equal("S", m1.Nodes[3].Pin); // the bulk follows lead S wherever the layout puts it
        Assert.Contains(imported.Notes, n => n.Message.Contains("only a VDMOS model takes three", StringComparison.Ordinal));
        var op = Simulate(Deck);
        Assert.Equal(7.5, op.Volts("d")!.Value, 3);
    }

    [NgspiceFact]
    public void A_zener_shunt_regulator_matches_the_hand_calculation()
    {
        // Shunt regulator by hand (P. Horowitz and W. Hill, The Art of Electronics, 3rd ed., section 1.2.6 on zeners, from
        // memory): Vout is about Vz; the series resistor carries Is = (Vin - Vout) / Rs and the zener takes Is - Vout / RL.
        var op = Simulate("""
            title zener shunt
            net GND ground
            net V12 power 12V
            net VREG power
            J1 "12 V supply" landing-2 1=V12 2=GND
            R1 470R 1=V12 2=VREG
            D1 "8.2 V zener" diode-glass-do35 A=GND K=VREG
            R2 4k7 1=VREG 2=GND
            """, "z.ppn");
        var vout = op.Volts("VREG")!.Value;
        Assert.InRange(vout, 8.2 - 0.05, 8.2 + 0.2); // the generic zener breaks down at 8.2 V with 1 mA; 6 mA adds about n Vt ln 6
        var zener = (12 - vout) / 470 - vout / 4700;
        Assert.Equal(zener, -op.Of("D1")!.CurrentInto("A")!.Value, 6); // zener current runs cathode to anode
        Assert.Equal((12 - vout) / 470, op.SupplyCurrent, 6);
    }

    [NgspiceFact]
    public void A_common_emitter_bias_matches_the_textbook_method()
    {
        // Voltage-divider bias by the Thevenin method (A. S. Sedra and K. C. Smith, Microelectronic Circuits, the section
        // on biasing a discrete BJT stage with one supply; chapter and section number from memory, not checked):
        // Vbb = 12 x 10k / 57k = 2.105 V, Rb = 47k || 10k = 8.246k, IE = (Vbb - 0.65) / (RE + Rb / (hFE + 1)), hFE 200.
        var op = Simulate("""
            title ce bias
            net GND ground
            net V12 power 12V
            J1 "12 V supply" landing-2 1=V12 2=GND
            R1 47k 1=V12 2=B
            R2 10k 1=B 2=GND
            R3 4k7 1=V12 2=C
            R4 1k 1=E 2=GND
            Q1 "NPN small-signal" to92/EBC C=C B=B E=E
            """, "ce.ppn");
        var vbb = 12 * 10.0 / 57;
        var rb = 47e3 * 10e3 / 57e3;
        var ie = (vbb - 0.65) / (1e3 + rb / 201);
        var vc = 12 - 4.7e3 * ie * 200 / 201;
        Assert.Equal(ie * 1e3, op.Volts("E")!.Value, 1);
        Assert.InRange(op.Volts("E")!.Value, ie * 1e3 - 0.05, ie * 1e3 + 0.05);
        Assert.InRange(op.Volts("C")!.Value, vc - 0.25, vc + 0.25);
        // the transistor's dissipation is Vce Ic + Vbe Ib, within the hand figure's tolerance
        var vce = op.Volts("C")!.Value - op.Volts("E")!.Value;
        Assert.InRange(op.Of("Q1")!.Power, 0.9 * vce * ie, 1.1 * vce * ie);
    }

    [NgspiceFact]
    public void A_reversed_emitter_bypass_electrolytic_is_an_error_with_both_lead_voltages()
    {
        // our own fault deck: the bypass capacitor's + lead on ground, its - lead on the emitter (about +1.4 V)
        var project = Placed("""
            reversed bypass
            VCC vcc 0 12
            R1 vcc b 47k
            R2 b 0 10k
            RC vcc c 4.7k
            RE e 0 1k
            CE 0 e 47u
            Q1 c b e QN
            .model QN NPN(BF=200)
            """, """{"format": "padplan-parts/1", "parts": {"CE": {"footprint": "cap-elec-5mm"}}}""");
        var report = Checker.Check(project, new CheckOptions(Simulation: Simulator.Run(project)));
        var finding = Assert.Single(report.Findings, f => f.RuleId == RuleIds.CapReversed);
        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Contains("CE", finding.Message);
        Assert.Contains("0.00 V", finding.Message);
        Assert.Matches(@"at 1\.[0-9]{2} V", finding.Message);
    }

    [NgspiceFact]
    public void A_quarter_watt_resistor_at_0_65_W_is_an_error_with_its_watts()
    {
        // our own fault deck: 220 ohm straight across 12 V dissipates 12^2 / 220 = 0.6545 W on a 1/4 W footprint
        var project = Placed("""
            hot resistor
            V1 vcc 0 12
            R1 vcc 0 220
            """, """{"format": "padplan-parts/1", "parts": {"R1": {"footprint": "res-axial-250mw"}}}""");
        var report = Checker.Check(project, new CheckOptions(Simulation: Simulator.Run(project)));
        var finding = Assert.Single(report.Findings, f => f.RuleId == RuleIds.ResistorPower);
        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Contains("0.655 W", finding.Message);
        Assert.Contains("0.25 W", finding.Message);
    }

    [NgspiceFact]
    public void A_parts_map_rating_overrides_the_footprints_typical_one()
    {
        var project = Placed("""
            rated resistor
            V1 vcc 0 12
            R1 vcc 0 220
            """, """{"format": "padplan-parts/1", "parts": {"R1": {"footprint": "res-axial-250mw", "ratedPower": 2}}}""");
        var report = Checker.Check(project, new CheckOptions(Simulation: Simulator.Run(project)));
        Assert.DoesNotContain(report.Findings, f => f.RuleId == RuleIds.ResistorPower);
    }

    [Fact]
    public void Without_ngspice_the_check_says_so()
    {
        Assert.Null(NgspiceProgram.Find(SimulationOptions.Default, _ => null));
        var project = Placed("""
            plain
            V1 vcc 0 12
            R1 vcc 0 1k
            """);
        var report = Checker.Check(project, new CheckOptions(Simulation: SimulationResult.NotFound));
        var note = Assert.Single(report.Findings, f => f.RuleId == RuleIds.OperatingPoint);
        Assert.Contains("no simulator found: upper bound from DC paths", note.Message);
    }

    [NgspiceFact]
    public void A_time_limit_stops_ngspice_with_a_clear_reason()
    {
        var project = ImportFixture.Import("t\nV1 a 0 1\nR1 a 0 1k\n.end\n").Project;
        var result = Simulator.Run(project, new SimulationOptions(TimeLimit: TimeSpan.FromTicks(1)));
        // either ngspice finished within the tick (impossible on any machine) or it was stopped with the reason
        Assert.False(result.Simulated);
        Assert.Contains("time limit", result.Reason);
    }

    [Fact]
    public void Non_convergence_and_a_singular_circuit_are_reported_in_words()
    {
        // what ngspice 39 prints for a circuit that does not converge (sample from a run of our own)
        var (none, why) = NgspiceOutput.Parse("Circuit: x\n\nNote: Starting dynamic gmin stepping\nWarning: Dynamic gmin stepping failed\nError: no convergence in dc operating point\nop simulation(s) aborted\n");
        Assert.Null(none);
        Assert.Contains("did not converge", why);

        var (values, failure) = NgspiceOutput.Parse("Circuit: x\n\nWarning: singular matrix:  check node n1\n\nNote: Starting dynamic gmin stepping\nWarning: Dynamic gmin stepping failed\nError: no convergence in dc operating point\nop simulation(s) aborted\n");
        Assert.Null(values);
        Assert.Contains("singular", failure);
    }

    [NgspiceFact]
    public void A_signal_source_across_a_winding_is_left_off_at_power_up()
    {
        // our own deck: an input source straight across a link winding makes the DC matrix singular in ngspice; at the
        // bench no generator is connected, so the operating point leaves it off and keeps the supply
        var op = Simulate("""
            link input
            VSUP vcc 0 DC 9
            VIN in 0 SIN(0 10m 1meg)
            L1 in 0 1u
            R1 vcc c 1k
            R2 c 0 1k
            .end
            """, parts: """{"format": "padplan-parts/1", "nets": {"in": {"role": "input"}}}""");
        Assert.Equal(4.5, op.Volts("c")!.Value, 6); // divider by hand: 9 x 1k / 2k
        Assert.Equal(9 / 2e3, op.SupplyCurrent, 9);
    }

    private static Project Placed(string deck, string? parts = null)
    {
        var imported = ImportFixture.Import(deck, "t.cir", parts).Project;
        var placed = PadPlan.Planning.Placer.Place(imported, new PadPlan.Planning.PlacerSettings(Effort: PadPlan.Planning.Effort.Quick));
        Assert.True(placed.Succeeded, placed.Failure?.Message);
        return placed.Project!;
    }
}
