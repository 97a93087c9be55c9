using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Tests.Import;

public class SpiceImportTests
{
    [Fact]
    public void Every_element_kind_becomes_a_part_on_its_default_footprint()
    {
        var r = ImportFixture.ImportData("every-element.cir");
        var p = r.Project;
        string Fp(string reference) => p.FindPart(reference)!.Footprint;
        Assert.Equal("res-axial-250mw", Fp("r2"));
        Assert.Equal("cap-disc-5mm", Fp("C1"));
        Assert.Equal("cap-elec-8mm", Fp("C2"));      // 100 µF
        Assert.Equal("choke-axial", Fp("L1"));
        Assert.Equal("to92", Fp("Q1"));
        Assert.Equal("to92", Fp("J1"));
        Assert.Equal("to92", Fp("M1"));
        Assert.Equal("diode-glass-do35", Fp("D1"));
        Assert.Equal("led-5mm", Fp("D2"));
        Assert.Equal("dip-8", Fp("X1"));
        Assert.True(p.FindPart("X2")!.FootprintAssumed);
        Assert.Contains(r.Notes, n => n.Message.Contains("ODDCHIP") && n.Message.Contains("parts map"));
        // the '+' line continued C2; '*' and ';' comments, tabs and mixed case were read past
        Assert.Equal("out", p.FindPart("C2")!.NetOf("+"));
        Assert.Equal("base", p.FindPart("r2")!.NetOf("1")); // "BASE" and "base" are one node
        // the MOSFET's bulk is tied to its source, the BJT substrate of Q2 to ground: no lead for either
        Assert.Equal(3, p.FindPart("M1")!.Pins.Count);
        Assert.Equal(3, p.FindPart("Q2")!.Pins.Count);
        // X1 uses the .subckt pin names inp inn vcc vee out: a single op-amp on the usual DIP-8 pins
        Assert.Equal(["2", "3", "4", "6", "7"], p.FindPart("X1")!.Pins.Select(x => x.Pin).Order());
        Assert.Equal("out", p.FindPart("X1")!.NetOf("6"));
    }

    [Fact]
    public void Sources_become_wire_landings_and_give_their_nets_voltages()
    {
        var p = ImportFixture.ImportData("every-element.cir").Project;
        var supply = p.Parts.Single(x => x.Value.StartsWith("supply"));
        Assert.Equal("landing-2", supply.Footprint);
        Assert.Equal(("vcc", "GND"), (supply.NetOf("1"), supply.NetOf("2")));
        Assert.Equal(12, p.FindNet("vcc")!.Voltage);
        Assert.False(p.FindNet("vcc")!.VoltageEstimated);
        Assert.Equal(NetClass.Power, p.FindNet("vcc")!.Class);
        var input = p.FindNet("in")!;
        Assert.Equal(SignalRole.Input, input.Role);
        Assert.Equal(0.1, input.Voltage!.Value, 9); // SIN(0 0.1 1k): offset 0 + amplitude 0.1
        // reached from vcc through R1 and L1: estimated, marked so
        Assert.Equal((12.0, true), (p.FindNet("base")!.Voltage!.Value, p.FindNet("base")!.VoltageEstimated));
        Assert.Equal((12.0, true), (p.FindNet("coll")!.Voltage!.Value, p.FindNet("coll")!.VoltageEstimated));
        Assert.Null(p.FindNet("emit")!.Voltage);
        Assert.DoesNotContain(p.Parts, x => x.Ref.StartsWith('V'));
    }

    [Fact]
    public void High_voltage_reaches_through_resistors_and_marks_nets_hv()
    {
        var p = ImportFixture.ImportData("valve-hv.cir").Project;
        Assert.Equal(NetClass.Hv, p.FindNet("b+")!.Class);
        Assert.Equal((250.0, true, NetClass.Hv), (p.FindNet("anode")!.Voltage!.Value, p.FindNet("anode")!.VoltageEstimated, p.FindNet("anode")!.Class));
        Assert.Null(p.FindNet("out")!.Voltage); // behind a capacitor: no DC path
        Assert.Contains(p.Parts, x => x.Value.StartsWith("heater wires"));
    }

    [Fact]
    public void K_coupled_windings_become_one_toroid_with_a_lead_per_winding_end()
    {
        var p = ImportFixture.ImportData("coupled.cir").Project;
        Assert.DoesNotContain(p.Parts, x => x.Ref is "L1" or "L2");
        var t = p.Parts.Single(x => x.Footprint.StartsWith("toroid"));
        Assert.Equal("toroid-13mm-4", t.Footprint);
        Assert.True(t.FootprintAssumed);
        Assert.Equal(["in", "GND", "vcc", "out"], t.Pins.Select(x => x.Net));
    }

    [Fact]
    public void Dual_op_amp_sections_share_one_dip8_with_the_usual_pinout()
    {
        var r = ImportFixture.ImportData("dual-opamp.cir");
        var u2 = r.Project.FindPart("U2")!;
        Assert.Equal("dip-8", u2.Footprint);
        // usual dual pinout (common practice, no source): A out 1, -in 2, +in 3; V- 4; B +in 5, -in 6, out 7; V+ 8
        Assert.Equal(["o1", "fb1", "in", "vn", "o1", "fb2", "out", "vp"], u2.Pins.Select(x => x.Net));
        Assert.DoesNotContain(r.Project.Parts, x => x.Ref.StartsWith("U2", StringComparison.Ordinal) && x.Ref != "U2");
    }

    [Fact]
    public void A_parts_map_can_put_sections_on_other_leads()
    {
        var map = """
            { "format": "padplan-parts/1",
              "parts": { "U2": { "footprint": "dip-14", "sections": {
                  "A": { "inp": "3", "inn": "2", "out": "1", "vcc": "4", "vee": "11" },
                  "B": { "inp": "5", "inn": "6", "out": "7", "vcc": "4", "vee": "11" } } } } }
            """;
        var text = File.ReadAllText(ImportFixture.Data("dual-opamp.cir"));
        var u2 = ImportFixture.Import(text, "dual.cir", map).Project.FindPart("U2")!;
        Assert.Equal("dip-14", u2.Footprint);
        Assert.Equal("vn", u2.NetOf("11"));
        Assert.Equal("out", u2.NetOf("7"));
    }

    // Each TO-92 pin order: the SPICE collector, base and emitter must land on the leads that order names.
    [Theory]
    [InlineData("EBC", "e", "b", "c"), InlineData("CBE", "c", "b", "e"), InlineData("ECB", "e", "c", "b")]
    [InlineData("BCE", "b", "c", "e"), InlineData("BEC", "b", "e", "c"), InlineData("CEB", "c", "e", "b")]
    public void Spice_pin_order_maps_to_the_right_to92_leads(string order, string lead1, string lead2, string lead3)
    {
        var text = "pin order\nV1 c 0 9\nR1 c b 10k\nR2 e 0 1k\nR3 b 0 10k\nQ1 c b e QN\n.model QN NPN\n.end\n";
        var map = $$"""{ "format": "padplan-parts/1", "values": { "QN": { "footprint": "to92", "variant": "{{order}}" } } }""";
        var p = ImportFixture.Import(text, "q.cir", map).Project;
        var q = p.FindPart("Q1")!;
        var fp = p.FootprintOf(q);
        var leads = fp.Leads.Select((_, i) => q.NetOf(fp.PinNames(q.Variant)[i])).ToList();
        Assert.Equal([lead1, lead2, lead3], leads);
        // and the collector's physical lead is where the order letter C sits
        Assert.Equal(fp.Leads[order.IndexOf('C')], fp.LeadForPin("C", q.Variant));
    }

    [Theory]
    [InlineData("DGS", "d", "g", "s"), InlineData("SGD", "s", "g", "d"), InlineData("GDS", "g", "d", "s")]
    public void Spice_jfet_pin_order_maps_to_the_right_to92_leads(string order, string lead1, string lead2, string lead3)
    {
        var text = $"jfet\nV1 d 0 9\nR1 g 0 1meg\nR2 s 0 1k\nJ1 d g s JN\n.model JN NJF\n";
        var p = ImportFixture.Import(text, "j.cir", $$"""{ "format": "padplan-parts/1", "parts": { "j1": { "variant": "{{order}}" } } }""").Project;
        var j = p.FindPart("J1")!;
        var names = p.FootprintOf(j).PinNames(j.Variant);
        Assert.Equal([lead1, lead2, lead3], names.Select(n => j.NetOf(n)));
    }

    [Fact]
    public void Values_use_spice_scale_factors()
    {
        // SPICE: "M" and "m" are milli, "meg" is mega
        var p = ImportFixture.Import("values\nR1 a 0 100M\nR2 a b 1meg\nC1 b 0 100nF\nL1 a c 4.7uH\nR3 c 0 1k\n").Project;
        Assert.Equal(["R1", "1M", "100n", "4u7", "1k"], p.Parts.Select(x => x.Value));
    }

    [Fact]
    public void Include_and_lib_are_reported_not_followed_and_brace_expressions_are_evaluated()
    {
        // ngspice manual, ".param" and brace expressions: {rv} takes the parameter's value
        var r = ImportFixture.Import("notes\n.include models.lib\n.lib parts.lib TYP\n.param rv=10k\nR1 a 0 {rv}\nR2 a 0 1k\n");
        Assert.Contains(r.Notes, n => n.Line == 2 && n.Message.Contains("not followed"));
        Assert.Contains(r.Notes, n => n.Line == 3 && n.Message.Contains("not followed"));
        Assert.Contains(r.Notes, n => n.Line == 5 && n.Message.Contains("evaluates to 10k"));
        Assert.Equal("10k", r.Project.FindPart("R1")!.Value);
    }

    [Fact]
    public void A_net_with_a_single_connection_is_a_warning()
    {
        var r = ImportFixture.Import("lonely\nR1 a 0 1k\nR2 a dangling 1k\n");
        Assert.Contains(r.Notes, n => n.Message.Contains("net dangling has only one connection"));
    }

    [Fact]
    public void A_zero_volt_source_joins_its_nodes()
    {
        var p = ImportFixture.Import("probe\nV1 vcc 0 5\nVsense vcc vcc2 0\nR1 vcc2 0 1k\n").Project;
        Assert.Equal("vcc", p.FindPart("R1")!.NetOf("1"));
    }

    [Theory]
    [InlineData("t\nR1 a 0 1k\n9x a b\n", 3, "unknown element letter")]
    [InlineData("t\nR1 a\n", 2, "missing nodes")]
    [InlineData("t\nR1 a 1k\n", 2, "missing value")]
    [InlineData("t\nQ1 c b QN\n", 2, "missing nodes")]
    [InlineData("t\n* comment only\n+ 1k\n", 3, "continuation")]
    [InlineData("t\nR1 a 0 1k\nC1 a 0 x12\n", 3, "bad value")]
    [InlineData("t\nR1 a 0 1k\nr1 a 0 2k\n", 3, "duplicate reference")]
    [InlineData("t\nR1 a 0 1k\nK1 L1 L2 0.9\n", 3, "not an inductor")]
    [InlineData("t\n.subckt AMP a b c\n.ends\nX1 a b AMP\n", 4, "has 3 pins")]
    public void Bad_spice_names_the_line(string text, int line, string message)
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import(text, "bad.cir"));
        Assert.Equal(line, e.Line);
        Assert.Contains(message, e.Message);
    }

    [Fact]
    public void An_unknown_footprint_in_a_parts_map_names_its_line_and_suggests()
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import("t\nR1 a 0 1k\n", "x.cir", "{\n \"format\": \"padplan-parts/1\",\n \"parts\": {\n  \"R1\": { \"footprint\": \"res-axial-250\" }\n }\n}"));
        Assert.Equal("parts.json", e.File);
        Assert.Equal(4, e.Line);
        Assert.Contains("res-axial-250mw", e.Message);
    }

    [Fact]
    public void Pins_that_do_not_match_the_mapped_footprint_are_an_error()
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import("t\nD1 a 0 DX\nR1 a 0 1k\n", "d.cir", """{ "format": "padplan-parts/1", "parts": { "D1": { "footprint": "res-axial-250mw" } } }"""));
        Assert.Equal(2, e.Line);
        Assert.Contains("does not match footprint", e.Message);
    }

    [Fact]
    public void Binary_garbage_is_refused_with_its_line()
    {
        var bytes = "title\nR1 a 0 1k\n"u8.ToArray().Concat(new byte[] { 0, 1, 2, 0xff, 0xfe }).ToArray();
        var e = Assert.Throws<InputException>(() => PadPlan.Import.NetlistImporter.Import(bytes, "g.cir", new PadPlan.Import.ImportOptions(ImportFixture.Library)));
        Assert.Equal(3, e.Line);
        Assert.Contains("not a text netlist", e.Message);
    }
}
