using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>
/// The continuity test sheet for the finished, unpowered board: the probe points of each net that must beep together,
/// each pad's isolation from the plane and from its near neighbours of other nets (finds burrs, uncut scores and solder
/// bridges), with the readings that parts make on purpose worked out from the netlist so the builder is not misled.
/// </summary>
public static class TestPlan
{
    /// <summary>Other-net pads this close, edge to edge, are tested against each other (mm); a bridge or burr rarely spans more. Common practice, no source.</summary>
    public const double NeighbourGap = 5.0;

    /// <summary>Every test in order: joined nets, each island against the plane, near neighbours of other nets.</summary>
    public static IReadOnlyList<ContinuityTest> Tests(Project project, DcPaths paths)
    {
        var layout = project.Layout ?? throw new ArgumentException("the project has no layout; place it first.", nameof(project));
        var islands = layout.Islands().OrderBy(i => i.Id, NaturalOrder.Comparer).ToList();
        var rows = new List<ContinuityTest>();
        void Row(string test, string a, string b, string expect, string why) =>
            rows.Add(new ContinuityTest(rows.Count + 1, test, a, b, expect, why));

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

        return rows;
    }

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

    private static string LinkText(Layout layout, string a, string b)
    {
        var link = layout.Jumpers.FirstOrDefault(j => (j.From == a && j.To == b) || (j.From == b && j.To == a));
        return link is not null ? $"through jumper {link.Id}" : "through the jumpers between them";
    }

    private static bool SameStrip(Layout layout, string a, string b) =>
        layout.Pads.OfType<StripPad>().Any(s => s.Segments.Any(x => x.Id == a) && s.Segments.Any(x => x.Id == b));
}
