using PadPlan.Model;
using PadPlan.Output.Sheets;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Output;

/// <summary>Plans for the sheet tests: the tiny-buffer fixture, and a DIP on two scored strips with a keep-out on a board of any size.</summary>
public static class SheetFixtures
{
    public static readonly DateOnly Date = new(2025, 3, 1);

    public static SheetOptions Options(Paper? paper = null) => new(paper ?? Paper.A4, Date);

    public static Project TinyBuffer() => ProjectFile.Read(TestPaths.TinyBuffer);

    /// <summary>
    /// An 8-lead DIP (300 mil, pitch 2.54 mm, rows 7.62 mm apart: JEDEC MS-001) on two horizontal scored strips, a bypass
    /// capacitor, an input resistor with a ground landing, a round mounting-hole keep-out, on a board of the given size.
    /// The name and one value hold XML-special characters to prove the escaping.
    /// </summary>
    public static Project DipOnStrips(double width = 70, double height = 50, string name = "<in&out> \"amp\"", double supplyVolts = 12)
    {
        var dip = new Footprint("dip8", "ics", "DIP-8, 300 mil", ValueList.Of(new Point(-5, -2.5), new Point(5, -2.5), new Point(5, 2.5), new Point(-5, 2.5)), 4,
            Enumerable.Range(0, 8).Select(i => new FootprintLead((i + 1).ToString(), i < 4 ? new Point(-3.81 + 2.54 * i, 3.81) : new Point(3.81 - 2.54 * (i - 4), -3.81), 0.5, 0, 3)).ToValueList(),
            MountStyle.Strip, "JEDEC MS-001");
        var axial = new Footprint("res", "resistors", "axial", ValueList.Of(new Point(-3.15, -1.2), new Point(3.15, -1.2), new Point(3.15, 1.2), new Point(-3.15, 1.2)), 2.4,
            ValueList.Of(new FootprintLead("1", new Point(-3.15, 0), 0.6, 1.7, 20), new FootprintLead("2", new Point(3.15, 0), 0.6, 1.7, 20)), MountStyle.Axial, "typical");
        var nets = ValueList.Of(new Net("GND", Ground: true), new Net("VCC", Class: NetClass.Power, Voltage: supplyVolts), new Net("IN"), new Net("OUT"), new Net("FB"), new Net("NC"));
        var pinNets = new[] { "OUT", "FB", "IN", "GND", "NC", "NC", "NC", "VCC" };
        var parts = ValueList.Of(
            new Part("U1", "dual op-amp <8-pin>", "dip8", pinNets.Select((n, i) => new PinNet((i + 1).ToString(), n)).ToValueList()),
            new Part("R1", "10k & 1%", "res", ValueList.Of(new PinNet("1", "IN"), new PinNet("2", "GND"))));
        // DIP centred at (cx, cy); lower strip carries pins 1-4, upper strip pins 8-5 (left to right)
        var (cx, cy) = (width / 2, height / 2);
        var lower = new StripPad("S1", new Point(cx - 5.08, cy + 3.81), false, 3.0,
            Enumerable.Range(0, 4).Select(i => new StripSegment($"S1{(char)('a' + i)}", pinNets[i] == "GND" ? null : pinNets[i], 2.54)).ToValueList());
        var upper = new StripPad("S2", new Point(cx - 5.08, cy - 3.81), false, 3.0,
            Enumerable.Range(0, 4).Select(i => new StripSegment($"S2{(char)('a' + i)}", pinNets[7 - i], 2.54)).ToValueList());
        var inPad = new RoundPad("P1", "IN", new Point(cx - 14, cy + 3.81), 3.97);
        var leads = Enumerable.Range(0, 8).Select(i =>
        {
            var pin = (i + 1).ToString();
            var local = i < 4 ? new Point(-3.81 + 2.54 * i, 3.81) : new Point(3.81 - 2.54 * (i - 4), -3.81);
            var at = new Point(cx, cy) + local;
            var pad = i < 4 ? $"S1{(char)('a' + i)}" : $"S2{(char)('a' + (7 - i))}";
            return new LeadLanding(pin, pad, at);
        }).ToValueList();
        var layout = new Layout(
            ValueList.Of<Pad>(lower, upper, inPad),
            ValueList.Of(
                new Placement("U1", new Point(cx, cy), Rotation.R0, leads),
                new Placement("R1", new Point(cx - 14, cy + 11), Rotation.R90, ValueList.Of(new LeadLanding("1", "P1", new Point(cx - 14, cy + 5.3)), new LeadLanding("2", null, new Point(cx - 14, cy + 16.5))))),
            ValueList<Jumper>.Empty);
        var board = new Board(width, height, cornerRadius: 2, keepouts: ValueList.Of<Keepout>(new CircleKeepout("H1", new Point(6, 6), 6.5), new RectKeepout("K1", new Point(width - 8, height - 7), 8, 6)));
        return new Project(name, board, Toolkit.Default, RuleSettings.Default, nets, parts, ValueList.Of(dip, axial), layout, "test plan");
    }
}
