using PadPlan.Output;
using PadPlan.Model;
using PadPlan.Output.Tables;

namespace PadPlan.Output.Materials;

/// <summary>
/// The continuity test sheet for the finished, unpowered board: the probe points of each net that must beep together,
/// each pad's isolation from the plane and from its near neighbours of other nets (finds burrs, uncut scores and solder
/// bridges), with the readings that parts make on purpose worked out from the netlist so the builder is not misled.
/// </summary>
public static class TestPlan
{
    /// <summary>Other-net pads this close, edge to edge, are tested against each other (mm); a bridge or burr rarely spans more. Common practice, no source.</summary>
    public const double NeighbourGap = 5.0;

    public static IReadOnlyList<ReportTable> Tables(Project project, double threshold = DcPaths.DefaultThreshold)
    {
        var paths = DcPaths.Find(project, threshold);
        return [Sheet(project, paths), PathTable(project, paths)];
    }

    public static ReportTable Sheet(Project project, DcPaths paths)
    {
        var layout = project.Layout ?? throw new ArgumentException("the project has no layout; place it first.", nameof(project));
        var islands = layout.Islands().OrderBy(i => i.Id, NaturalOrder.Comparer).ToList();
        var rows = new List<string[]>();
        void Row(string test, string a, string b, string expect, string why) =>
            rows.Add([(rows.Count + 1).ToString(), test, a, b, expect, why, ""]);

        foreach (var net in islands.Where(i => i.Net is not null).GroupBy(i => i.Net!).OrderBy(g => g.Key, StringComparer.Ordinal))
        {
            var first = net.First();
            foreach (var other in net.Skip(1))
                Row("joined", first.Id, other.Id, "beeps", $"both on {net.Key}: {LinkText(layout, first.Id, other.Id)}");
        }
        var grounded = layout.Placements.OrderBy(p => p.Ref, NaturalOrder.Comparer)
            .SelectMany(p => p.Leads.Where(l => l.OnPlane).Select(l => $"{p.Ref}.{l.Pin}")).ToList();
        if (grounded.Count > 0)
            Row("joined", DcPaths.Plane, string.Join(" ", grounded), "each beeps", "probe each ground lead at its joint: silence means it is not soldered to the plane");

        foreach (var island in islands)
            Row("apart", island.Id, DcPaths.Plane, Expect(paths, island.Net, DcPaths.Plane), $"{island.Net ?? "no net"} to ground: a burr at the pad edge or glue-through shorts it");

        var seen = new HashSet<(string, string)>();
        foreach (var island in islands.Where(i => i.Net is not null))
        {
            var others = islands.Where(o => o.Net is not null && o.Net != island.Net).Select(o => (Island: o, Gap: IslandGap.Between(island, o))).OrderBy(x => x.Gap).ThenBy(x => x.Island.Id, NaturalOrder.Comparer).ToList();
            var near = others.Where(x => x.Gap <= NeighbourGap).ToList();
            if (near.Count == 0 && others.Count > 0) near.Add(others[0]);
            foreach (var (other, gap) in near)
            {
                var key = string.CompareOrdinal(island.Id, other.Id) < 0 ? (island.Id, other.Id) : (other.Id, island.Id);
                if (!seen.Add(key)) continue;
                var (netA, netB) = key.Item1 == island.Id ? (island.Net, other.Net) : (other.Net, island.Net);
                var why = SameStrip(layout, island.Id, other.Id)
                    ? $"{netA} / {netB}: neighbouring segments; silence shows the score is cut through"
                    : $"{netA} / {netB}, {Mm.Of(gap)} mm apart: finds a solder bridge or burr";
                Row("apart", key.Item1, key.Item2, Expect(paths, island.Net!, other.Net!), why);
            }
        }

        var notes = new List<string>
        {
            "Test the board unpowered, with a continuity beeper. 'beeps' = must sound; 'silent' = must not; other entries are readings the parts make on purpose.",
            $"A beeper sounds below roughly 30-50 Ω (meters differ; common practice, no source): paths below {Mm.Of(paths.Threshold)} Ω through parts are listed as reading low.",
            "Electrolytic capacitors may beep briefly while they charge from the meter; the sound should stop.",
            "ICs: internal protection diodes may make a pin read low one way round to a supply or ground pin.",
        };
        if (Cautions.HighVoltageWarning(project) is { } hv) notes.Add("Caution: " + hv);
        return ReportTable.Create("Continuity test plan", ["#", "Test", "Probe A", "Probe B", "Expect", "Why", "Done"], rows, notes);
    }

    public static ReportTable PathTable(Project project, DcPaths paths) => ReportTable.Create(
        "Paths through parts (these read low on a sound board)",
        ["Net A", "Net B", "Reads", "Through", "Note"],
        paths.Paths.Select(p => new[] { p.NetA, p.NetB, ReadingText(p), p.Through, p.Note }),
        [
            paths.Paths.Count == 0
                ? "No part makes a path that reads low: every 'apart' test must be silent."
                : $"Worked out from the netlist: windings, beads and fuses about 0 Ω; resistor networks as the meter sees them (series and parallel); threshold {Mm.Of(paths.Threshold)} Ω. '{DcPaths.Plane}' is ground.",
        ]);

    private static string Expect(DcPaths paths, string? a, string b)
    {
        if (a is null) return "silent";
        var path = paths.Between(a, b);
        if (path.NetA == path.NetB) return "beeps (same net)";
        return path.Reading switch
        {
            DcReading.Low => $"reads low via {path.Through}",
            DcReading.OneWay => $"one way only, via {path.Through}",
            DcReading.Maybe => $"may read low via {path.Through}",
            _ => "silent",
        };
    }

    private static string ReadingText(DcPath path) => path.Reading switch
    {
        DcReading.Low => path.Ohms is { } r && r >= 1e-6 ? $"low, about {r.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture)} Ω" : "low, about 0 Ω",
        DcReading.OneWay => "low one way only",
        _ => "may read low",
    };

    private static string LinkText(Layout layout, string a, string b)
    {
        var link = layout.Jumpers.FirstOrDefault(j => (j.From == a && j.To == b) || (j.From == b && j.To == a));
        return link is not null ? $"through wire link {link.Id}" : "through the wire links between them";
    }

    private static bool SameStrip(Layout layout, string a, string b) =>
        layout.Pads.OfType<StripPad>().Any(s => s.Segments.Any(x => x.Id == a) && s.Segments.Any(x => x.Id == b));
}
