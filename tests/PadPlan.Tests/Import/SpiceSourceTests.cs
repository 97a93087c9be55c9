using PadPlan.Import;
using PadPlan.Model;

namespace PadPlan.Tests.Import;

// Syntax of independent sources: ngspice user manual, chapter "Voltage and Current Sources", section "Independent
// Sources for Voltage or Current" (DC, AC mag phase, PULSE, SIN, EXP, PWL with r= and td=, SFFM, AM).
public class SpiceSourceTests
{
    private static (string Role, double? Volts, Net Net) Landing(string deck, string net)
    {
        var r = SpiceCorpus.Import(deck);
        var n = r.Project.FindNet(net)!;
        var landing = r.Project.Parts.Single(p => p.Footprint.StartsWith("landing") && p.Pins.Any(x => x.Net == net));
        return (landing.Value, n.Voltage, n);
    }

    [Theory]
    // deck, hot net, landing text starts with, net voltage (sign kept)
    [InlineData("src-dc-bare", "vcc", "supply wires (V1, 12 V DC)", 12.0)]
    [InlineData("src-dc-negative", "vee", "supply wires (VEE, -9 V DC)", -9.0)]
    [InlineData("src-pwl-ramp", "1", "supply wires (vcc, 15 V settled)", 15.0)]           // PWL(0 0 1m 15) settles at its last value
    [InlineData("src-pwl-negative-delay", "6", "supply wires (vee, -10 V settled)", -10.0)] // td= delays, does not change levels
    [InlineData("src-sine-input", "10", "input wires (V2, 300 mV peak)", 0.3)]           // SIN(VO VA ...): VO 0, VA 0.3
    [InlineData("src-pulse-input", "in", "input wires (Vp, 5 V peak)", 5.0)]             // PULSE(V1 V2 ...): larger level
    [InlineData("src-exp-input", "in", "input wires (Vx, 2 V peak)", 2.0)]               // EXP(V1 V2 ...)
    [InlineData("src-sffm-input", "in", "input wires (Vf, 500 mV peak)", 0.5)]           // SFFM(VO VA ...)
    [InlineData("src-am-input", "in", "input wires (Va, 1 V peak)", 1.0)]                // AM(VA VO ...): VA (VO + 1)
    [InlineData("src-ac-input", "in", "input wires (Vin, 1 V peak)", 1.0)]               // AC mag 1 with DC 0
    [InlineData("param-sine-amplitude", "in", "input wires (V1, 1.44 V peak)", 1.44)]    // SINE(0 {V} 1K) with .param V=1.44
    [InlineData("param-expressions", "vn", "supply wires (V1, -10 V DC)", -10.0)]        // dc {vs}, vs=-(3+2)*2
    public void Each_source_function_becomes_what_it_does(string deck, string net, string landing, double volts)
    {
        var (role, v, n) = Landing(deck, net);
        Assert.Equal(landing, role);
        Assert.Equal(volts, v!.Value, 9);
        Assert.Equal(role.StartsWith("supply"), n.Class == NetClass.Power);
    }

    [Fact]
    public void Letter_case_spacing_commas_and_parentheses_do_not_matter()
    {
        var p = SpiceCorpus.Import("src-case-spacing").Project;
        Assert.Equal(5.0, p.FindNet("A")!.Voltage);
        Assert.Equal(1.0, p.FindNet("IN")!.Voltage);
        Assert.Equal(SignalRole.Input, p.FindNet("IN")!.Role);
    }

    [Fact]
    public void A_zero_volt_probe_joins_its_nodes_and_says_so_in_the_summary()
    {
        var r = SpiceCorpus.Import("src-current-probe");
        Assert.Equal("vcc", r.Project.FindPart("R1")!.NetOf("1"));
        Assert.Contains(r.Project.Imported!.Summary, l => l.Item == "Vsense" && l.Became.Contains("current probe: nodes joined"));
    }

    [Fact]
    public void A_loop_probe_is_joined_with_a_warning()
    {
        var r = SpiceCorpus.Import("src-loop-probe");
        Assert.Equal(r.Project.FindPart("R1")!.NetOf("2"), r.Project.FindPart("R2")!.NetOf("1")); // OUT and OUT1 are one net
        Assert.Contains(r.Notes, n => n.Line == 4 && n.Message.Contains("loop-gain probe") && n.Message.Contains("joined"));
        Assert.DoesNotContain(r.Project.Parts, p => p.Value.Contains("V3"));
    }

    [Fact]
    public void A_source_between_two_live_nodes_is_kept_apart_and_the_warning_names_both_and_how_to_join()
    {
        var r = SpiceCorpus.Import("src-kept-apart");
        var note = Assert.Single(r.Notes, n => n.Message.StartsWith("Vb:"));
        Assert.Contains("a and b are kept apart", note.Message);
        Assert.Contains("Vb a b 0", note.Message);
        var w = r.Project.Parts.Single(p => p.Value.Contains("Vb"));
        Assert.Equal(("a", "b"), (w.NetOf("1"), w.NetOf("2")));
    }

    [Fact]
    public void Current_sources_give_a_current_source_landing_and_a_zero_amp_output_port()
    {
        var p = SpiceCorpus.Import("src-current-sources").Project;
        Assert.Contains(p.Parts, x => x.Value == "current source wires (I1, 1 mA settled)" || x.Value == "current source wires (I1, 1 mA DC)");
        Assert.Contains(p.Parts, x => x.Value == "output wires (Iout)");
    }

    [Fact]
    public void An_unevaluable_expression_is_a_warning_naming_it_and_a_parts_map_way_out()
    {
        var r = SpiceCorpus.Import("param-unevaluable");
        Assert.Contains(r.Notes, n => n.Line == 3 && n.Message.Contains("{sqrt(g)*5} cannot be evaluated") && n.Message.Contains("\"nets\""));
        Assert.Contains(r.Notes, n => n.Line == 4 && n.Message.Contains("{pwr(g,3)*1k} cannot be evaluated") && n.Message.Contains("\"parts\""));
        Assert.Contains(r.Project.Imported!.Summary, l => l.Topic == "assumed" && l.Item == "R1");
    }

    [Theory]
    // ngspice manual, ".param" and "Parameters, functions, expressions": numbers with scale factors, + - * /, ( ), unary minus, other parameters
    [InlineData("1k", 1000.0)]
    [InlineData("{2*(3+4)}", 14.0)]
    [InlineData("{-a/4}", -2.5)]
    [InlineData("{a*1meg - 2u}", 10e6 - 2e-6)]
    [InlineData("'-(a+b)'", -15.0)]
    [InlineData("{1e-3*a}", 0.01)]
    public void Expressions_evaluate_with_parameters(string text, double expected)
    {
        var parameters = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase) { ["a"] = 10, ["b"] = 5 };
        Assert.Equal(expected, SpiceValues.Number(text, parameters)!.Value, 12);
    }

    [Theory]
    [InlineData("{sqrt(a)}")]
    [InlineData("{a**2}")]
    [InlineData("{unknown*2}")]
    [InlineData("{a > 2}")]
    public void Expressions_with_anything_else_are_not_evaluated(string text) =>
        Assert.Null(SpiceValues.Number(text, new Dictionary<string, double> { ["a"] = 10 }));
}
