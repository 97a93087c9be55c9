using PadPlan.Import;
using PadPlan.Model;

namespace PadPlan.Tests.Output;

/// <summary>
/// A dense placed board built in code from library footprints: parts in a grid of 15 x 13 mm cells, cycling through an
/// axial resistor, a TO-92 transistor (EBC), a radial electrolytic and a glass diode, each lead on its own round pad
/// (every third part with one lead on the plane). Invented circuit; only the geometry matters.
/// </summary>
public static class SyntheticBoard
{
    private const double CellWidth = 15;
    private const double CellHeight = 13;
    private const double PadDiameter = 2.6;

    public static Project Build(int count)
    {
        var library = FootprintLibrary.Load();
        var kinds = new[] { ("R", "res-axial-250mw", (string?)null, "10k"), ("Q", "to92", "EBC", "NPN"), ("C", "cap-elec-5mm", null, "10u"), ("D", "diode-glass-do35", null, "1N") };
        var footprints = kinds.Select(k => library.Footprints.First(f => f.Name == k.Item2)).ToList();
        var columns = (int)Math.Ceiling(Math.Sqrt(count * 2.0));
        var rows = (int)Math.Ceiling(count / (double)columns);
        var (width, height) = (columns * CellWidth + 10, rows * CellHeight + 10);
        var nets = new List<Net> { new("GND", Ground: true) };
        var parts = new List<Part>();
        var pads = new List<Pad>();
        var placements = new List<Placement>();
        for (var n = 0; n < count; n++)
        {
            var (prefix, _, variant, value) = kinds[n % kinds.Length];
            var footprint = footprints[n % kinds.Length];
            var reference = $"{prefix}{n + 1}";
            var at = new Point(5 + (n % columns + 0.5) * CellWidth, 5 + (n / columns + 0.4) * CellHeight);
            var pins = footprint.PinNames(variant);
            var landings = new List<LeadLanding>();
            var pinNets = new List<PinNet>();
            var bodyBottom = footprint.Body.Max(p => p.Y);
            for (var i = 0; i < footprint.Leads.Count; i++)
            {
                var exit = footprint.Leads[i].Exit;
                var spot = footprint.Mount == MountStyle.Axial
                    ? at + new Point(exit.X + Math.Sign(exit.X) * 2.4, 0)
                    : at + new Point((i - (footprint.Leads.Count - 1) / 2.0) * 3.4, bodyBottom + 2.6);
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
        return new Project("synthetic-200", new Board(width, height), Toolkit.Default, RuleSettings.Default, nets.ToValueList(), parts.ToValueList(), footprints.ToValueList(), layout);
    }
}
