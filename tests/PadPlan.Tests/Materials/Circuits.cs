using PadPlan.Model;

namespace PadPlan.Tests.Materials;

/// <summary>Small circuits and layouts built in code for the materials tests: invented values, generic parts.</summary>
public static class Circuits
{
    private static Footprint TwoLead(string name, string family, MountStyle mount, double height) => new(
        name, family, $"test {family}", ValueList.Of(new Point(-2, -1), new Point(2, -1), new Point(2, 1), new Point(-2, 1)), height,
        ValueList.Of(new FootprintLead("1", new Point(-3, 0), 0.6, 0, 20), new FootprintLead("2", new Point(3, 0), 0.6, 0, 20)), mount, "test, invented");

    private static Footprint Leads(string name, string family, MountStyle mount, double height, params string[] leads) => new(
        name, family, $"test {family}", ValueList.Of(new Point(-3, -3), new Point(3, -3), new Point(3, 3), new Point(-3, 3)), height,
        leads.Select((l, i) => new FootprintLead(l, new Point(i * 2.54, 0), 0.5, 0, 12)).ToValueList(), mount, "test, invented");

    /// <summary>Footprints for the test circuits: heights decide the soldering order.</summary>
    public static ValueList<Footprint> Footprints { get; } = ValueList.Of(
        TwoLead("res", "resistors", MountStyle.Axial, 2.4),
        TwoLead("diode", "diodes", MountStyle.Axial, 2.0),
        TwoLead("cap", "capacitors", MountStyle.Upright, 7),
        TwoLead("elko", "capacitors", MountStyle.Upright, 12.5),
        TwoLead("choke", "inductors", MountStyle.Upright, 10),
        Leads("to92", "transistors", MountStyle.Upright, 5.2, "C", "B", "E"),
        Leads("dip8", "ics", MountStyle.Strip, 4.5, "1", "2", "3", "4", "5", "6", "7", "8"),
        Leads("xfmr", "transformers", MountStyle.Upright, 15, "1", "2", "3", "4"),
        Leads("wire1", "landings", MountStyle.Landing, 1, "1"),
        Leads("wire2", "landings", MountStyle.Landing, 1, "1", "2"));

    public static Part Part(string reference, string value, string footprint, params string[] pinNets) =>
        new(reference, value, footprint, pinNets.Select(pn => pn.Split('=')).Select(a => new PinNet(a[0], a[1])).ToValueList());

    public static Project Project(IEnumerable<Part> parts, IEnumerable<Net> nets, Layout? layout = null) =>
        new("test", new Board(80, 60), Toolkit.Default, RuleSettings.Default, nets.ToValueList(), parts.ToValueList(), Footprints, layout);

    public static Net Gnd => new("GND", Ground: true, Class: NetClass.Power);

    /// <summary>Nets by name; "GND" is ground, names starting VCC/V+ are power.</summary>
    public static IEnumerable<Net> Nets(params string[] names) => names.Select(n =>
        n == "GND" ? Gnd : n.StartsWith("VCC", StringComparison.Ordinal) ? new Net(n, Class: NetClass.Power) : new Net(n));

    /// <summary>
    /// A layout with a DIP-8 on two scored strips (2.54 mm segments, 3 mm wide), two rectangles, round pads of two
    /// punch sizes and two thicknesses, and a jumper: 8 segments + 2 rectangles + 5 rounds = 15 islands.
    /// </summary>
    public static Layout MixedLayout()
    {
        ValueList<StripSegment> Row(int first) => Enumerable.Range(first, 4).Select(i => new StripSegment($"U1.{i}", $"N{i}", 2.54)).ToValueList();
        var pads = new Pad[]
        {
            new StripPad("SA", new Point(20, 20), vertical: false, width: 3, Row(1)),
            new StripPad("SB", new Point(20, 27.62), vertical: false, width: 3, Row(5)),
            new RectPad("R1", "N1", new Point(40, 20), 5, 8),
            new RectPad("R2", "N2", new Point(50, 20), 5, 8, StockThickness: 0.8),
            new RoundPad("P1", "N3", new Point(10, 10), 4.76),
            new RoundPad("P2", "N4", new Point(10, 20), 4.76),
            new RoundPad("P3", "N5", new Point(10, 30), 3.97),
            new RoundPad("P4", "N6", new Point(10, 40), 4.76, StockThickness: 0.8),
            new RoundPad("P5", "N6", new Point(30, 40), 4.76, StockThickness: 0.8),
        };
        return new Layout(pads.ToValueList(), ValueList<Placement>.Empty, ValueList.Of(new Jumper("W1", "P4", "P5")));
    }
}
