using PadPlan.Model;

namespace PadPlan.Tests.Rules;

/// <summary>
/// A second known-good plan, built in code: a DIP-8 op-amp follower on two scored strips, with a jumper
/// joining its output segment to the inverting-input segment, a coupling capacitor, and wire landings.
/// Our own invented circuit; the DIP outline follows JEDEC MS-001 (2.54 mm pitch, 7.62 mm row spacing).
/// </summary>
public static class DipFixture
{
    public static Footprint Dip8 { get; } = new(
        "dip8-test", "ics", "DIP-8 on scored strips",
        ValueList.Of(new Point(-4.65, -3.175), new Point(4.65, -3.175), new Point(4.65, 3.175), new Point(-4.65, 3.175)),
        3.3,
        ValueList.Of(
            Lead("1", -3.81, 3.81), Lead("2", -1.27, 3.81), Lead("3", 1.27, 3.81), Lead("4", 3.81, 3.81),
            Lead("5", 3.81, -3.81), Lead("6", 1.27, -3.81), Lead("7", -1.27, -3.81), Lead("8", -3.81, -3.81)),
        MountStyle.Strip, "JEDEC MS-001");

    private static FootprintLead Lead(string name, double x, double y) => new(name, new Point(x, y), 0.5, 0, 1.0);

    public static Footprint CapDisc { get; } = new(
        "cap-disc-test", "capacitors", "ceramic disc, 5 mm spacing",
        ValueList.Of(new Point(-3, -1.5), new Point(3, -1.5), new Point(3, 1.5), new Point(-3, 1.5)), 7,
        ValueList.Of(new FootprintLead("1", new Point(-2.5, 0), 0.5, 0, 12), new FootprintLead("2", new Point(2.5, 0), 0.5, 0, 12)),
        MountStyle.Upright, "typical, common practice");

    public static Footprint Landing1 { get; } = new(
        "landing1-test", "landings", "one wire",
        ValueList.Of(new Point(-1, -1), new Point(1, -1), new Point(1, 1), new Point(-1, 1)), 1,
        ValueList.Of(new FootprintLead("1", new Point(0, 0), 0.8, 0, 10)),
        MountStyle.Landing, "common practice, no source");

    public static Footprint Landing2 { get; } = new(
        "landing2-test", "landings", "two wires",
        ValueList.Of(new Point(-2.25, -1), new Point(2.25, -1), new Point(2.25, 1), new Point(-2.25, 1)), 1,
        ValueList.Of(new FootprintLead("1", new Point(-1.27, 0), 0.8, 0, 10), new FootprintLead("2", new Point(1.27, 0), 0.8, 0, 10)),
        MountStyle.Landing, "common practice, no source");

    private static ValueList<PinNet> Pins(params (string Pin, string Net)[] pins) => pins.Select(p => new PinNet(p.Pin, p.Net)).ToValueList();

    private static Placement Place(string reference, double x, double y, Rotation r, params (string Pin, string? Pad, double X, double Y)[] leads) =>
        new(reference, new Point(x, y), r, leads.Select(l => new LeadLanding(l.Pin, l.Pad, new Point(l.X, l.Y))).ToValueList());

    private static StripPad Strip(string id, double y, params (string Id, string? Net)[] segments) =>
        new(id, new Point(24.92, y), false, 3.0, segments.Select(s => new StripSegment(s.Id, s.Net, 2.54)).ToValueList());

    public static Project Project { get; } = new(
        "dip-follower",
        new Board(60, 40),
        Toolkit.Default,
        RuleSettings.Default,
        ValueList.Of(
            new Net("GND", Ground: true, Class: NetClass.Power),
            new Net("VCC", Class: NetClass.Power, Voltage: 12),
            new Net("VEE", Class: NetClass.Power, Voltage: -12),
            new Net("IN", Class: NetClass.Audio, Role: SignalRole.Input),
            new Net("NINP"),
            new Net("OUT", Class: NetClass.Audio, Role: SignalRole.Output)),
        ValueList.Of(
            new Part("U1", "dual op-amp", Dip8.Name, Pins(("1", "OUT"), ("2", "OUT"), ("3", "NINP"), ("4", "VEE"), ("8", "VCC"))),
            new Part("C1", "1u", CapDisc.Name, Pins(("1", "IN"), ("2", "NINP"))),
            new Part("J1", "input wire", Landing1.Name, Pins(("1", "IN"))),
            new Part("J2", "output wire", Landing1.Name, Pins(("1", "OUT"))),
            new Part("J3", "positive supply", Landing2.Name, Pins(("1", "VCC"), ("2", "GND"))),
            new Part("J4", "negative supply", Landing1.Name, Pins(("1", "VEE")))),
        ValueList.Of(Dip8, CapDisc, Landing1, Landing2),
        new Layout(
            ValueList.Of<Pad>(
                // Strip A under pins 1-4 (y = 20 + 3.81), strip B under pins 8-5 (y = 20 - 3.81); segments at the 2.54 mm pitch.
                Strip("SA", 23.81, ("A1", "OUT"), ("A2", "OUT"), ("A3", "NINP"), ("A4", "VEE")),
                Strip("SB", 16.19, ("B1", "VCC"), ("B2", null), ("B3", null), ("B4", null)),
                new RoundPad("P1", "IN", new Point(33, 35.5), 3.97)),
            ValueList.Of(
                Place("U1", 30, 20, Rotation.R0,
                    ("1", "A1", 26.19, 23.81), ("2", "A2", 28.73, 23.81), ("3", "A3", 31.27, 23.81), ("4", "A4", 33.81, 23.81),
                    ("5", "B4", 33.81, 16.19), ("6", "B3", 31.27, 16.19), ("7", "B2", 28.73, 16.19), ("8", "B1", 26.19, 16.19)),
                Place("C1", 33, 31, Rotation.R270, ("1", "P1", 33, 35), ("2", "A3", 31.27, 24.9)),
                Place("J1", 37, 35.5, Rotation.R0, ("1", "P1", 34.2, 35.5)),
                Place("J2", 25.9, 29, Rotation.R0, ("1", "A1", 25.9, 24.8)),
                Place("J3", 22, 10, Rotation.R0, ("1", "B1", 25.9, 15.2), ("2", null, 23.27, 12)),
                Place("J4", 38.5, 24.8, Rotation.R0, ("1", "A4", 34.3, 24.8))),
            ValueList.Of(new Jumper("JP1", "A1", "A2"))));
}
