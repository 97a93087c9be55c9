using PadPlan.Import;
using PadPlan.Model;

namespace PadPlan.Tests.Output;

/// <summary>
/// A dense placed board built in code from library footprints: parts in a grid of cells (15 x 13 mm, or smaller for a
/// compact board), cycling through an axial resistor, a TO-92 transistor (EBC), a radial electrolytic and a glass
/// diode, each lead on its own round pad (every third part with one lead on the plane). Invented circuit; only the
/// geometry matters.
/// </summary>
public static class SyntheticBoard
{
    private const double CellWidth = 15;
    private const double CellHeight = 13;
    private const double PadDiameter = 2.6;

    public static Project Build(int count) => Build(count, (int)Math.Ceiling(Math.Sqrt(count * 2.0)), CellWidth, CellHeight, "res-axial-250mw", 2.4, 3.4, 2.6);

    /// <summary>
    /// As many parts as asked on a board no larger than 160 x 100 mm (the size the assembly view promises to print on
    /// one page): cells shrink with the count, down to about 9.4 x 9 mm for 150 parts, a density like the CW filter
    /// example's (82 x 52 mm, 41 parts: about 104 mm² a part).
    /// </summary>
    public static Project Compact(int count)
    {
        var columns = (int)Math.Ceiling(Math.Sqrt(count * 1.6));
        var rows = (int)Math.Ceiling(count / (double)columns);
        var (cw, ch) = (Math.Min(CellWidth, 150.0 / columns), Math.Min(CellHeight, 90.0 / rows));
        return Build(count, columns, cw, ch, "res-axial-125mw", Math.Min(2.4, (cw - 4.2 - PadDiameter) / 2 - 0.5), Math.Min(3.4, (cw - PadDiameter - 1) / 2), Math.Min(2.6, PadDiameter / 2 + 0.6));
    }

    private static Project Build(int count, int columns, double cellWidth, double cellHeight, string resistor, double axialGap, double uprightPitch, double uprightDrop)
    {
        var library = FootprintLibrary.Load();
        var kinds = new[] { ("R", resistor, (string?)null, "10k"), ("Q", "to92", "EBC", "NPN"), ("C", "cap-elec-5mm", null, "10u"), ("D", "diode-glass-do35", null, "1N") };
        var footprints = kinds.Select(k => library.Footprints.First(f => f.Name == k.Item2)).ToList();
        var rows = (int)Math.Ceiling(count / (double)columns);
        var (width, height) = (Math.Ceiling(columns * cellWidth + 10), Math.Ceiling(rows * cellHeight + 10));
        var nets = new List<Net> { new("GND", Ground: true) };
        var parts = new List<Part>();
        var pads = new List<Pad>();
        var placements = new List<Placement>();
        for (var n = 0; n < count; n++)
        {
            var (prefix, _, variant, value) = kinds[n % kinds.Length];
            var footprint = footprints[n % kinds.Length];
            var reference = $"{prefix}{n + 1}";
            var at = new Point(5 + (n % columns + 0.5) * cellWidth, 5 + (n / columns + 0.35) * cellHeight);
            var pins = footprint.PinNames(variant);
            var landings = new List<LeadLanding>();
            var pinNets = new List<PinNet>();
            var bodyBottom = footprint.Body.Max(p => p.Y);
            for (var i = 0; i < footprint.Leads.Count; i++)
            {
                var exit = footprint.Leads[i].Exit;
                var spot = footprint.Mount == MountStyle.Axial
                    ? at + new Point(exit.X + Math.Sign(exit.X) * axialGap, 0)
                    : at + new Point((i - (footprint.Leads.Count - 1) / 2.0) * uprightPitch, bodyBottom + uprightDrop);
                if (n % 3 == 0 && i == footprint.Leads.Count - 1)
                {
                    pinNets.Add(new PinNet(pins[i], "GND"));
                    landings.Add(new LeadLanding(pins[i], null, spot));
                    continue;
                }
                var net = $"N{n + 1}_{i + 1}";
                nets.Add(new Net(net));
                var pad = $"P{pads.Count + 1}";
                pads.Add(new RoundPad(pad, net, spot, PadDiameter));
                pinNets.Add(new PinNet(pins[i], net));
                landings.Add(new LeadLanding(pins[i], pad, spot));
            }
            parts.Add(new Part(reference, value, footprint.Name, pinNets.ToValueList(), variant));
            placements.Add(new Placement(reference, at, Rotation.R0, landings.ToValueList()));
        }
        var layout = new Layout(pads.ToValueList(), placements.ToValueList(), ValueList<Jumper>.Empty);
        return new Project($"synthetic-{count}", new Board(width, height), Toolkit.Default, RuleSettings.Default, nets.ToValueList(), parts.ToValueList(), footprints.ToValueList(), layout);
    }
}
