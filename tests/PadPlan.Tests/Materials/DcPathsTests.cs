using PadPlan.Model;
using PadPlan.Materials;
using static PadPlan.Tests.Materials.Circuits;

namespace PadPlan.Tests.Materials;

public sealed class DcPathsTests
{
    // Hand-checked: an LC tank to ground. The coil joins TANK to the plane at DC (a few ohms of wire at most);
    // the capacitors block DC, so IN reads open to both.
    [Fact]
    public void Lc_tank_reads_low_to_the_plane_through_the_coil_only()
    {
        var project = Project(
            [Part("C1", "100p", "cap", "1=IN", "2=TANK"), Part("L1", "2u2", "choke", "1=TANK", "2=GND"), Part("C2", "330p", "cap", "1=TANK", "2=GND")],
            Nets("GND", "IN", "TANK"));
        var paths = DcPaths.Find(project);
        var tank = paths.Between("TANK", "GND");
        Assert.Equal(DcReading.Low, tank.Reading);
        Assert.Equal(0, tank.Ohms!.Value, 9);
        Assert.Equal("L1", tank.Through);
        Assert.Equal(DcReading.Open, paths.Between("IN", "GND").Reading);
        Assert.Equal(DcReading.Open, paths.Between("IN", "TANK").Reading);
        Assert.Single(paths.Paths);
    }

    // Hand-checked: a common-emitter stage. R1 47k / R2 10k divider, RC 4.7k, RE 47 Ω (below the 50 Ω threshold).
    // VCC to ground through resistors is R1 + R2 = 57 kΩ: silent. EMIT reads 47 Ω to the plane. The NPN's base-emitter
    // and base-collector junctions conduct with + on the base; through the 47 Ω emitter resistor the base also reads
    // low one way to the plane.
    [Fact]
    public void Transistor_bias_network_has_only_the_junctions_and_the_low_emitter_resistor()
    {
        var project = Project(
            [
                Part("R1", "47k", "res", "1=VCC", "2=BASE"), Part("R2", "10k", "res", "1=BASE", "2=GND"),
                Part("RC", "4k7", "res", "1=VCC", "2=COLL"), Part("RE", "47R", "res", "1=EMIT", "2=GND"),
                Part("Q1", "NPN small-signal", "to92", "C=COLL", "B=BASE", "E=EMIT"),
            ],
            Nets("GND", "VCC", "BASE", "COLL", "EMIT"));
        var paths = DcPaths.Find(project);
        var emit = paths.Between("EMIT", "GND");
        Assert.Equal(DcReading.Low, emit.Reading);
        Assert.Equal(47, emit.Ohms!.Value, 9);
        Assert.Equal("RE", emit.Through);
        Assert.Equal(DcReading.OneWay, paths.Between("BASE", "EMIT").Reading);
        Assert.Equal(DcReading.OneWay, paths.Between("BASE", "COLL").Reading);
        Assert.Equal(DcReading.OneWay, paths.Between("BASE", "GND").Reading);
        Assert.Contains("+ (red) on the BASE side", paths.Between("BASE", "EMIT").Note);
        Assert.Equal(DcReading.Open, paths.Between("VCC", "GND").Reading);
        Assert.Equal(DcReading.Open, paths.Between("COLL", "EMIT").Reading); // two junctions back to back
        Assert.Equal(DcReading.Open, paths.Between("VCC", "BASE").Reading);
        Assert.Equal(4, paths.Paths.Count);
    }

    // Hand-checked: rectifier, reservoir, choke, smoothing capacitor and 1 kΩ bleeder. RAW and VOUT are joined by the
    // choke (about 0 Ω); AC to RAW and to VOUT conduct one way through D1 (+ on the anode side); VOUT to ground is the
    // 1 kΩ bleeder: silent.
    [Fact]
    public void Supply_with_choke_reads_low_across_the_choke_and_one_way_through_the_rectifier()
    {
        var project = Project(
            [
                Part("J1", "supply in", "wire2", "1=AC", "2=GND"), Part("D1", "rectifier", "diode", "A=AC", "K=RAW"),
                Part("C1", "470u", "elko", "1=RAW", "2=GND"), Part("L1", "10m", "choke", "1=RAW", "2=VOUT"),
                Part("C2", "100u", "elko", "1=VOUT", "2=GND"), Part("R1", "1k", "res", "1=VOUT", "2=GND"),
            ],
            Nets("GND", "AC", "RAW", "VOUT"));
        var paths = DcPaths.Find(project);
        Assert.Equal((DcReading.Low, "L1"), (paths.Between("RAW", "VOUT").Reading, paths.Between("RAW", "VOUT").Through));
        Assert.Equal((DcReading.OneWay, "D1"), (paths.Between("AC", "RAW").Reading, paths.Between("AC", "RAW").Through));
        Assert.Equal(DcReading.OneWay, paths.Between("AC", "VOUT").Reading);
        Assert.Contains("+ (red) on the AC side", paths.Between("AC", "VOUT").Note);
        Assert.Equal(DcReading.Open, paths.Between("VOUT", "GND").Reading);
        Assert.Equal(DcReading.Open, paths.Between("RAW", "GND").Reading);
        Assert.Equal(DcReading.Open, paths.Between("AC", "GND").Reading);
        // With a meter that beeps below 2 kΩ, the 1 kΩ bleeder reads low from both RAW and VOUT.
        var loose = DcPaths.Find(project, threshold: 2000);
        Assert.Equal(1000, loose.Between("RAW", "GND").Ohms!.Value, 9);
        Assert.Equal("L1, R1", loose.Between("RAW", "GND").Through);
    }

    // Series and parallel resistors, worked by hand: three 100 Ω in parallel = 33.3 Ω (reads low although each alone
    // does not); two 30 Ω in series = 60 Ω (silent although each alone would beep).
    [Fact]
    public void Parallel_resistors_can_read_low_and_series_ones_not()
    {
        var project = Project(
            [
                Part("R1", "100R", "res", "1=A", "2=B"), Part("R2", "100", "res", "1=A", "2=B"), Part("R3", "100 ohm", "res", "1=A", "2=B"),
                Part("R4", "30R", "res", "1=C", "2=M"), Part("R5", "30R", "res", "1=M", "2=D"),
            ],
            Nets("A", "B", "C", "M", "D"));
        var paths = DcPaths.Find(project);
        Assert.Equal(100.0 / 3, paths.Between("A", "B").Ohms!.Value, 9);
        Assert.Equal(DcReading.Open, paths.Between("C", "D").Reading);
        Assert.Equal(DcReading.Low, paths.Between("C", "M").Reading);
    }

    // Wheatstone bridge of five equal resistors R between opposite corners: R (the bridge is balanced, the middle
    // resistor carries no current). Textbook result, e.g. any circuit-theory text on bridge networks.
    [Fact]
    public void Effective_resistance_of_a_balanced_bridge_is_r()
    {
        var edges = new List<(int, int, double, string)> { (0, 1, 10, "a"), (0, 2, 10, "b"), (1, 3, 10, "c"), (2, 3, 10, "d"), (1, 2, 10, "e") };
        var r = DcPaths.EffectiveResistance(5, edges);
        Assert.Equal(10, r(0, 3)!.Value, 9);
        // Adjacent corners 0 and 1, by nodal analysis by hand (1 A in at 0, node 1 at 0 V, all 10 Ω):
        // node 3: 2 V3 = V2; node 2: 3 V2 = V0 + V3, so V0 = 2.5 V2; node 0: (2 V0 - V2) / 10 = 1, so V0 = 6.25 V.
        Assert.Equal(6.25, r(0, 1)!.Value, 9);
        Assert.Null(r(0, 4));
    }

    [Fact]
    public void Transformer_pins_are_listed_as_depending_on_the_winding()
    {
        var project = Project([Part("T1", "audio transformer", "xfmr", "1=P1", "2=GND", "3=S1", "4=S2")], Nets("GND", "P1", "S1", "S2"));
        var paths = DcPaths.Find(project);
        Assert.Equal(6, paths.Paths.Count);
        Assert.All(paths.Paths, p => Assert.Equal(DcReading.Maybe, p.Reading));
        Assert.Contains("same winding", paths.Between("S1", "S2").Note);
    }
}
