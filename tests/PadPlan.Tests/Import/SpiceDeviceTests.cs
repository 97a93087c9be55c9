using PadPlan.Model;

namespace PadPlan.Tests.Import;

// Element line syntax: Berkeley SPICE3 user's manual (Quarles), chapters on elements: R, C, L with optional model and
// fields; D area off; Q nc nb ne [ns] model [area]; J nd ng ns model [area]; M nd ng ns nb model. ngspice user manual,
// "VDMOS": Mname nd ng ns [tj tc] mname [thermal].
public class SpiceDeviceTests
{
    [Fact]
    public void A_three_node_mosfet_takes_its_model_after_the_source()
    {
        var p = SpiceCorpus.Import("dev-mos-three-node").Project;
        var m = p.FindPart("MQ1")!;
        Assert.Equal(["d", "g", "s"], m.Pins.Select(x => x.Net).Order(StringComparer.Ordinal));
        Assert.StartsWith("PWRM", m.Value);
    }

    [Fact]
    public void Thermal_nodes_and_the_thermal_keyword_are_read_and_the_thermal_network_is_left_off()
    {
        var r = SpiceCorpus.Import("dev-mos-thermal");
        var m = r.Project.FindPart("MQ1")!;
        Assert.StartsWith("PWRM", m.Value);
        Assert.Equal(3, m.Pins.Count);
        Assert.DoesNotContain(r.Project.Nets, n => n.Name is "tn" or "tcn");
        Assert.Null(r.Project.FindPart("Xth"));
        Assert.Contains(r.Notes, n => n.Message.StartsWith("Xth:") && n.Message.Contains("left off"));
        Assert.Contains(r.Notes, n => n.Message.StartsWith("MQ1:") && n.Message.Contains("thermal nodes"));
    }

    [Fact]
    public void A_four_node_mosfet_has_its_bulk_on_the_source_lead()
    {
        var r = SpiceCorpus.Import("dev-mos-four-node");
        Assert.Equal(3, r.Project.FindPart("M1")!.Pins.Count);
        var element = r.Project.Imported!.Elements.Single(e => e.Name == "M1");
        Assert.Equal(element.Nodes[2].Pin, element.Nodes[3].Pin); // bulk node rides on the source lead
    }

    [Fact]
    public void A_bjt_with_a_substrate_node_and_one_with_an_area_factor()
    {
        var p = SpiceCorpus.Import("dev-bjt-substrate").Project;
        Assert.StartsWith("QSMALL", p.FindPart("Q1")!.Value);
        Assert.StartsWith("QSMALL", p.FindPart("Q2")!.Value);
        Assert.Equal("e2", p.FindPart("Q2")!.NetOf("E"));
    }

    [Fact]
    public void Passive_optional_fields_and_resistor_models_are_read()
    {
        var p = SpiceCorpus.Import("dev-passive-options").Project;
        Assert.Equal("10k", p.FindPart("R1")!.Value);
        Assert.Equal("10n", p.FindPart("C1")!.Value);
        Assert.Equal("1m", p.FindPart("L1")!.Value);
        Assert.Equal("RTHIN", p.FindPart("R2")!.Value); // its size comes from the model and its geometry
    }

    [Fact]
    public void Jfet_and_diode_with_area_and_off()
    {
        var p = SpiceCorpus.Import("dev-jfet-diode").Project;
        Assert.StartsWith("JSMALL", p.FindPart("J1")!.Value);
        Assert.Equal("DSMALL", p.FindPart("D1")!.Value);
        Assert.Equal(("vdd", "k"), (p.FindPart("D1")!.NetOf("A"), p.FindPart("D1")!.NetOf("K")));
    }

    [Fact]
    public void Behavioural_sources_lines_and_switches_are_left_off_each_with_a_warning_and_a_summary_line()
    {
        var r = SpiceCorpus.Import("dev-behavioural");
        foreach (var name in new[] { "E1", "G1", "B1", "F1", "H1", "T1", "S1", "W1" })
        {
            Assert.Contains(r.Notes, n => n.Message.StartsWith(name + ":") && n.Message.Contains("left off the board"));
            Assert.Contains(r.Project.Imported!.Summary, l => l.Topic == "left off" && l.Item == name);
            Assert.Null(r.Project.FindPart(name));
        }
    }

    [Fact]
    public void Two_and_three_port_subcircuit_calls_get_two_and_three_lead_footprints()
    {
        Assert.Equal("sip-2", SpiceCorpus.Import("sub-two-port").Project.FindPart("X1")!.Footprint);
        var reg = SpiceCorpus.Import("sub-regulator");
        var u1 = reg.Project.FindPart("U1")!;
        Assert.Equal("sip-3", u1.Footprint);
        // the usual regulator order 1 in, 2 common, 3 out (common practice, from memory)
        Assert.Equal(("vin", "GND", "vout"), (u1.NetOf("1"), u1.NetOf("2"), u1.NetOf("3")));
        Assert.Contains(reg.Project.Imported!.Summary, l => l.Topic == "subcircuit" && l.Became.Contains("regulator pinout"));
        var shunt = SpiceCorpus.Import("sub-shunt-reference").Project.FindPart("U1")!;
        // the usual shunt reference order 1 ref, 2 anode, 3 cathode (common practice, from memory)
        Assert.Equal(("r", "GND", "k"), (shunt.NetOf("1"), shunt.NetOf("2"), shunt.NetOf("3")));
    }

    [Fact]
    public void Ports_named_by_lead_numbers_use_that_pinout_not_the_call_order()
    {
        var r = SpiceCorpus.Import("sub-opamp-numbered");
        var u1 = r.Project.FindPart("U1")!;
        Assert.Equal("dip-8", u1.Footprint);
        // .subckt AMP8 2 3 6 7 4 called as inv in out vp vn: the single op-amp pinout (2 -in, 3 +in, 6 out, 7 V+, 4 V-)
        Assert.Equal(("inv", "in", "out", "vp", "vn"), (u1.NetOf("2"), u1.NetOf("3"), u1.NetOf("6"), u1.NetOf("7"), u1.NetOf("4")));
        Assert.Contains(r.Notes, n => n.Message.Contains("single op-amp pinout"));
    }

    [Fact]
    public void A_one_port_call_whose_body_uses_ground_gets_a_ground_lead()
    {
        // .subckt LOADCELL p with R1 p 0 inside: the part joins b to the plane, so it needs two leads, not a one-lead DIP
        var r = SpiceCorpus.Import("sub-one-port-ground");
        var x1 = r.Project.FindPart("X1")!;
        Assert.Equal("sip-2", x1.Footprint);
        Assert.Equal(("b", "GND"), (x1.NetOf("1"), x1.NetOf("2")));
        Assert.Contains(r.Notes, n => n.Message.StartsWith("X1:") && n.Message.Contains("ground lead"));
    }

    [Fact]
    public void Numbered_ports_that_fit_no_standard_pinout_go_on_three_leads_in_call_order()
    {
        // ports 7 6 11 are the model's node numbers: no DIP pinout has a three-lead part on 6, 7 and 11
        var r = SpiceCorpus.Import("sub-numbered-shunt");
        var u1 = r.Project.FindPart("U1")!;
        Assert.Equal("sip-3", u1.Footprint);
        Assert.Equal(("r", "GND", "k"), (u1.NetOf("1"), u1.NetOf("2"), u1.NetOf("3")));
        Assert.DoesNotContain(r.Notes, n => n.Message.Contains("lead numbers"));
    }

    [Fact]
    public void A_mosfet_bulk_is_tied_to_its_source_lead_whatever_net_the_deck_puts_it_on()
    {
        // M1's bulk on 0, M2's on vss, M3's on its source: all three become lead S in the export, each off-source one with the same note
        var r = ImportFixture.Import("""
            three MOSFETs with their bulk on ground, on a negative rail and on the source
            .model SMALLN NMOS(VTO=1 KP=2m)
            V1 vdd 0 9
            V2 vss 0 -5
            Vg g 0 2.5
            R1 vdd d1 2.2k
            M1 d1 g s1 0 SMALLN
            R2 s1 0 100
            R3 vdd d2 2.2k
            M2 d2 g s2 vss SMALLN
            R4 s2 0 100
            R5 vdd d3 2.2k
            M3 d3 g s3 s3 SMALLN
            R6 s3 0 100
            .end
            """);
        foreach (var name in new[] { "M1", "M2", "M3" })
        {
            var element = r.Project.Imported!.Elements.Single(e => e.Name == name);
            Assert.Equal(element.Nodes[2].Pin, element.Nodes[3].Pin);
            Assert.Equal(3, r.Project.FindPart(name)!.Pins.Count);
        }
        var notes = r.Notes.Where(n => n.Message.Contains("ties the bulk to its source")).Select(n => n.Message[..3]).ToList();
        Assert.Equal(["M1:", "M2:"], notes);
    }

    [Fact]
    public void A_thermal_network_on_an_ambient_source_and_the_source_stay_off_the_board()
    {
        var r = SpiceCorpus.Import("dev-mos-thermal-ambient");
        var p = r.Project;
        Assert.Null(p.FindPart("Xca"));
        Assert.Null(p.FindPart("ca"));
        Assert.DoesNotContain(p.Parts, x => x.Value.Contains("VTamb", StringComparison.Ordinal));
        Assert.DoesNotContain(p.Nets, n => n.Name == "tamb");
        Assert.Contains(p.Imported!.Summary, l => l.Topic == "left off" && l.Item == "VTamb");
        Assert.Contains(p.Imported!.Summary, l => l.Topic == "left off" && l.Item == "Xca");
        // the supply V1 still gets its landing
        Assert.Contains(p.Parts, x => x.Value.Contains("V1", StringComparison.Ordinal));
    }
}
