using PadPlan.Model;

namespace PadPlan.Tests.Planning;

/// <summary>Footprints defined in code for the placement tests, modelled on the fixture's embedded ones (examples/tiny-buffer) plus a DIP-8 on strips.</summary>
public static class TestFootprints
{
    private static ValueList<Point> Box(double w, double h) => ValueList.Of(new Point(-w / 2, -h / 2), new Point(w / 2, -h / 2), new Point(w / 2, h / 2), new Point(-w / 2, h / 2));

    // DOMAIN 4: 1/4 W axial resistor body about 6.3 x 2.4 mm, lead 0.6 mm (typical, common practice);
    // minimum reach 1.7 mm from IPC-A-610 lead forming as in the fixture.
    public static Footprint Resistor { get; } = new("res-axial-250mw", "resistors", "Axial resistor 1/4 W", Box(6.3, 2.4), 2.4,
        ValueList.Of(new FootprintLead("1", new Point(-3.15, 0), 0.6, 1.7, 20), new FootprintLead("2", new Point(3.15, 0), 0.6, 1.7, 20)),
        MountStyle.Axial, "typical, common practice");

    public static Footprint DiscCap { get; } = new("cap-disc-5mm", "capacitors", "Ceramic disc, 5 mm lead spacing", Box(6, 3), 7,
        ValueList.Of(new FootprintLead("1", new Point(-2.5, 0), 0.5, 0, 12), new FootprintLead("2", new Point(2.5, 0), 0.5, 0, 12)),
        MountStyle.Upright, "typical, common practice");

    // JEDEC TO-226: 1.27 mm lead pitch, body about 4.6 mm.
    public static Footprint To92 { get; } = new("to92", "transistors", "TO-92 transistor", Box(4.8, 3.6), 5.2,
        ValueList.Of(new FootprintLead("1", new Point(-1.27, 0), 0.45, 0, 12), new FootprintLead("2", new Point(0, 0), 0.45, 0, 12), new FootprintLead("3", new Point(1.27, 0), 0.45, 0, 12)),
        MountStyle.Upright, "JEDEC TO-226", ValueList.Of(new PinVariant("EBC", ValueList.Of("E", "B", "C"))));

    public static Footprint Landing1 { get; } = new("landing-1", "landings", "Wire landing, one wire", Box(2, 2), 1,
        ValueList.Of(new FootprintLead("1", new Point(0, 0), 0.8, 0, 10)), MountStyle.Landing, "common practice, no source");

    // JEDEC MS-001: 2.54 mm pitch, rows 7.62 mm apart; body about 6.35 x 9.3 mm for 8 pins.
    // Pins count down the left row and back up the right row, as seen from above.
    public static Footprint Dip8 { get; } = new("dip8", "ics", "DIP-8 on scored strips", Box(6.35, 9.3), 4,
        ValueList.Of(
            new FootprintLead("1", new Point(-3.81, -3.81), 0.5, 0, 1), new FootprintLead("2", new Point(-3.81, -1.27), 0.5, 0, 1),
            new FootprintLead("3", new Point(-3.81, 1.27), 0.5, 0, 1), new FootprintLead("4", new Point(-3.81, 3.81), 0.5, 0, 1),
            new FootprintLead("5", new Point(3.81, 3.81), 0.5, 0, 1), new FootprintLead("6", new Point(3.81, 1.27), 0.5, 0, 1),
            new FootprintLead("7", new Point(3.81, -1.27), 0.5, 0, 1), new FootprintLead("8", new Point(3.81, -3.81), 0.5, 0, 1)),
        MountStyle.Strip, "JEDEC MS-001");

    public static ValueList<Footprint> All { get; } = ValueList.Of(Resistor, DiscCap, To92, Landing1, Dip8);
}
