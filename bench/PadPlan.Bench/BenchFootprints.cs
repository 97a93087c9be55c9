using PadPlan.Model;

namespace PadPlan.Bench;

/// <summary>The footprints the synthetic circuits use, with typical dimensions and the bundled library's typical heights (docs/footprints.md).</summary>
internal static class BenchFootprints
{
    private static ValueList<Point> Box(double w, double h) => ValueList.Of(new Point(-w / 2, -h / 2), new Point(w / 2, -h / 2), new Point(w / 2, h / 2), new Point(-w / 2, h / 2));

    private static FootprintLead Lead(string name, double x, double y, double d, double min, double max) => new(name, new Point(x, y), d, min, max);

    public static Footprint Resistor { get; } = new("res-axial-250mw", "resistors", "Axial resistor 1/4 W", Box(6.3, 2.4), 2.4,
        ValueList.Of(Lead("1", -3.15, 0, 0.6, 1.7, 20), Lead("2", 3.15, 0, 0.6, 1.7, 20)), MountStyle.Axial, "typical, common practice");

    public static Footprint DiscCap { get; } = new("cap-disc-5mm", "capacitors", "Ceramic disc, 5 mm lead spacing", Box(6, 3), 7,
        ValueList.Of(Lead("1", -2.5, 0, 0.5, 0, 12), Lead("2", 2.5, 0, 0.5, 0, 12)), MountStyle.Upright, "typical, common practice", shape: BodyShape.Disc, leadBend: 1.0);

    public static Footprint Electrolytic { get; } = new("cap-radial-6.3mm", "capacitors", "Radial electrolytic, 6.3 mm can", Octagon(6.3), 11,
        ValueList.Of(Lead("+", -1.25, 0, 0.5, 0, 12), Lead("-", 1.25, 0, 0.5, 0, 12)), MountStyle.Upright, "typical, common practice", shape: BodyShape.Cylinder, leadBend: 0.5);

    public static Footprint To92 { get; } = new("to92", "transistors", "TO-92 transistor", Box(4.8, 3.6), 7.5,
        ValueList.Of(Lead("1", -1.27, 0, 0.45, 0, 12), Lead("2", 0, 0, 0.45, 0, 12), Lead("3", 1.27, 0, 0.45, 0, 12)),
        MountStyle.Upright, "JEDEC TO-226", ValueList.Of(new PinVariant("EBC", ValueList.Of("E", "B", "C"))), shape: BodyShape.To92, leadBend: 2.5);

    public static Footprint Landing { get; } = new("landing-1", "landings", "Wire landing, one wire", Octagon(2), 1,
        ValueList.Of(Lead("1", 0, 0, 0.8, 0, 10)), MountStyle.Landing, "common practice, no source");

    public static Footprint Dip8 { get; } = Dip(8, 9.3);
    public static Footprint Dip14 { get; } = Dip(14, 19);

    public static ValueList<Footprint> All { get; } = ValueList.Of(Resistor, DiscCap, Electrolytic, To92, Landing, Dip8, Dip14);

    /// <summary>A 300 mil DIP (JEDEC MS-001): 2.54 mm pitch, rows 7.62 mm apart, pins down the left row and back up the right.</summary>
    private static Footprint Dip(int pins, double length)
    {
        var half = pins / 2;
        var leads = new List<FootprintLead>();
        for (var i = 0; i < half; i++) leads.Add(Lead($"{i + 1}", -3.81, (i - (half - 1) / 2.0) * 2.54, 0.5, 0, 1));
        for (var i = 0; i < half; i++) leads.Add(Lead($"{half + i + 1}", 3.81, ((half - 1) / 2.0 - i) * 2.54, 0.5, 0, 1));
        return new Footprint($"dip{pins}", "ics", $"DIP-{pins} on scored strips", Box(6.35, length), 4, leads.ToValueList(), MountStyle.Strip, "JEDEC MS-001", leadBend: 0.5);
    }

    private static ValueList<Point> Octagon(double d) =>
        Enumerable.Range(0, 8).Select(k => new Point(d / 2 * Math.Cos((k + 0.5) * Math.PI / 4), d / 2 * Math.Sin((k + 0.5) * Math.PI / 4))).ToValueList();
}
