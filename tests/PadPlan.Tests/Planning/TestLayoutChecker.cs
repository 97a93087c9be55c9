using PadPlan.Model;

namespace PadPlan.Tests.Planning;

/// <summary>A small checker of the placement rules written for the tests only, independent of the engine's code: it works on the project records alone.
/// It stands in for the real checker (issue 5) until the two are merged.</summary>
public static class TestLayoutChecker
{
    private const double Eps = 1e-6;

    public static List<string> Check(Project project)
    {
        var problems = new List<string>();
        var layout = project.Layout ?? throw new ArgumentException("project has no layout");
        var rules = project.Rules;
        var board = project.Board;
        var (minX, minY, maxX, maxY) = (board.Margin, board.Margin, board.Width!.Value - board.Margin, board.Height!.Value - board.Margin);
        bool Inside(Point p) => p.X >= minX - Eps && p.X <= maxX + Eps && p.Y >= minY - Eps && p.Y <= maxY + Eps;
        // Keep-outs are checked on sample points of each island and body outline, and on ground landings.
        string? OnKeepout(Point p) => board.Keepouts.FirstOrDefault(k => k switch
        {
            CircleKeepout c => p.DistanceTo(c.Center) < c.Diameter / 2 - Eps,
            RectKeepout r => Math.Abs(p.X - r.Center.X) < r.Width / 2 - Eps && Math.Abs(p.Y - r.Center.Y) < r.Height / 2 - Eps,
            _ => false,
        })?.Id;

        var islands = new List<(Island Island, string Pad, int Index)>();
        foreach (var pad in layout.Pads)
        {
            var k = 0;
            foreach (var island in pad.Islands()) islands.Add((island, pad.Id, k++));
        }
        var byId = islands.ToDictionary(i => i.Island.Id, i => i.Island);
        foreach (var (island, _, _) in islands)
            foreach (var corner in Corners(island))
                if (!Inside(corner)) problems.Add($"pad {island.Id} reaches outside the board margin");
        foreach (var (island, _, _) in islands)
            foreach (var p in Samples(island))
                if (OnKeepout(p) is { } id) { problems.Add($"pad {island.Id} lies on keep-out {id}"); break; }
        for (var a = 0; a < islands.Count; a++)
            for (var b = a + 1; b < islands.Count; b++)
            {
                var (ia, ib) = (islands[a], islands[b]);
                if (ia.Pad == ib.Pad && Math.Abs(ia.Index - ib.Index) == 1) continue; // neighbouring segments of one strip
                var gap = EdgeGap(ia.Island, ib.Island);
                if (gap < rules.PadGap - Eps) problems.Add($"pads {ia.Island.Id} and {ib.Island.Id} are {gap:0.###} mm apart");
            }

        var load = new Dictionary<string, int>();
        var bodies = new List<(string Ref, List<Point> Poly)>();
        foreach (var placement in layout.Placements)
        {
            var part = project.FindPart(placement.Ref)!;
            var footprint = project.FootprintOf(part);
            var poly = footprint.Body.Select(placement.ToBoard).ToList();
            bodies.Add((part.Ref, poly));
            if (poly.Any(p => !Inside(p))) problems.Add($"body of {part.Ref} reaches outside the board margin");
            if (EdgeSamples(poly).Select(OnKeepout).FirstOrDefault(id => id is not null) is { } hit) problems.Add($"body of {part.Ref} lies on keep-out {hit}");
            foreach (var pin in part.Pins)
                if (!placement.Leads.Any(l => string.Equals(l.Pin, pin.Pin, StringComparison.OrdinalIgnoreCase)))
                    problems.Add($"lead {part.Ref}.{pin.Pin} has no landing");
            foreach (var landing in placement.Leads)
            {
                var lead = footprint.LeadForPin(landing.Pin, part.Variant)!;
                var netName = part.NetOf(landing.Pin);
                var net = netName is null ? null : project.FindNet(netName);
                var reach = placement.ToBoard(lead.Exit).DistanceTo(landing.At);
                var max = net is null ? lead.MaxReach : Math.Min(lead.MaxReach, rules.MaxLeadFor(net));
                if (reach < lead.MinReach - Eps || reach > max + Eps) problems.Add($"lead {part.Ref}.{landing.Pin} reaches {reach:0.###} mm, allowed {lead.MinReach}..{max}");
                if (landing.Pad is null)
                {
                    if (net?.Ground != true) problems.Add($"lead {part.Ref}.{landing.Pin} of net {netName} lands on the plane");
                    if (!Inside(landing.At)) problems.Add($"ground landing of {part.Ref}.{landing.Pin} is outside the board margin");
                    if (OnKeepout(landing.At) is { } k) problems.Add($"ground landing of {part.Ref}.{landing.Pin} lies on keep-out {k}");
                    foreach (var (island, _, _) in islands)
                        if (PointGap(landing.At, island) < rules.GroundGap - Eps) problems.Add($"ground landing of {part.Ref}.{landing.Pin} is too close to pad {island.Id}");
                    continue;
                }
                if (!byId.TryGetValue(landing.Pad, out var target)) { problems.Add($"lead {part.Ref}.{landing.Pin} lands on missing pad {landing.Pad}"); continue; }
                if (target.Net != netName) problems.Add($"lead {part.Ref}.{landing.Pin} of net {netName} lands on pad {target.Id} of net {target.Net}");
                if (-PointGap(landing.At, target) < lead.Diameter / 2 - Eps) problems.Add($"lead {part.Ref}.{landing.Pin} lands too near the edge of {target.Id}");
                load[target.Id] = load.GetValueOrDefault(target.Id) + 1;
            }
        }
        foreach (var (id, count) in load)
            if (count > project.Toolkit.CapacityOf(byId[id])) problems.Add($"pad {id} carries {count} leads, more than it holds");
        for (var a = 0; a < bodies.Count; a++)
            for (var b = a + 1; b < bodies.Count; b++)
                if (ConvexOverlap(bodies[a].Poly, bodies[b].Poly)) problems.Add($"bodies of {bodies[a].Ref} and {bodies[b].Ref} overlap");
        foreach (var jumper in layout.Jumpers)
            if (byId[jumper.From].Net != byId[jumper.To].Net) problems.Add($"jumper {jumper.Id} joins different nets");
        problems.AddRange(Disconnected(project, islands.Select(i => i.Island).ToList()));
        return problems;
    }

    /// <summary>Every net's islands must form one piece through its jumpers.</summary>
    private static IEnumerable<string> Disconnected(Project project, List<Island> islands)
    {
        var parent = islands.ToDictionary(i => i.Id, i => i.Id);
        string Find(string x) => parent[x] == x ? x : parent[x] = Find(parent[x]);
        foreach (var j in project.Layout!.Jumpers) parent[Find(j.From)] = Find(j.To);
        foreach (var group in islands.Where(i => i.Net is not null).GroupBy(i => i.Net))
            if (group.Select(i => Find(i.Id)).Distinct().Count() > 1) yield return $"net {group.Key} is split over pads not joined by jumpers";
    }

    private static IEnumerable<Point> Samples(Island i)
    {
        for (var a = 0; a < 16; a++)
            for (var f = 0.0; f <= 1.0; f += 0.25)
                yield return i.Shape == IslandShape.Round
                    ? i.Center + new Point(Math.Cos(a * Math.PI / 8), Math.Sin(a * Math.PI / 8)) * (f * i.Width / 2)
                    : new Point(i.Left + i.Width * (a % 4) / 3.0, i.Top + i.Height * (a / 4) / 3.0);
    }

    private static IEnumerable<Point> EdgeSamples(List<Point> poly)
    {
        for (var k = 0; k < poly.Count; k++)
            for (var f = 0.0; f < 1.0; f += 0.1)
                yield return poly[k] + (poly[(k + 1) % poly.Count] - poly[k]) * f;
    }

    private static IEnumerable<Point> Corners(Island i) =>
        [new Point(i.Left, i.Top), new Point(i.Right, i.Top), new Point(i.Right, i.Bottom), new Point(i.Left, i.Bottom)];

    /// <summary>Signed distance from a point to an island's edge: negative inside.</summary>
    private static double PointGap(Point p, Island i)
    {
        if (i.Shape == IslandShape.Round) return p.DistanceTo(i.Center) - i.Width / 2;
        var dx = Math.Abs(p.X - i.Center.X) - i.Width / 2;
        var dy = Math.Abs(p.Y - i.Center.Y) - i.Height / 2;
        return dx > 0 || dy > 0 ? Math.Sqrt(Math.Max(dx, 0) * Math.Max(dx, 0) + Math.Max(dy, 0) * Math.Max(dy, 0)) : Math.Max(dx, dy);
    }

    private static double EdgeGap(Island a, Island b)
    {
        if (a.Shape == IslandShape.Round && b.Shape == IslandShape.Round) return a.Center.DistanceTo(b.Center) - a.Width / 2 - b.Width / 2;
        if (a.Shape == IslandShape.Round) return PointGap(a.Center, b) - a.Width / 2;
        if (b.Shape == IslandShape.Round) return PointGap(b.Center, a) - b.Width / 2;
        var dx = Math.Max(a.Left - b.Right, b.Left - a.Right);
        var dy = Math.Max(a.Top - b.Bottom, b.Top - a.Bottom);
        return dx > 0 && dy > 0 ? Math.Sqrt(dx * dx + dy * dy) : Math.Max(dx, dy);
    }

    /// <summary>Separating-axis test for two convex polygons; touching edges do not count as overlap.</summary>
    private static bool ConvexOverlap(List<Point> a, List<Point> b)
    {
        foreach (var poly in new[] { a, b })
            for (var i = 0; i < poly.Count; i++)
            {
                var edge = poly[(i + 1) % poly.Count] - poly[i];
                var axis = new Point(-edge.Y, edge.X);
                var (minA, maxA) = Project(a, axis);
                var (minB, maxB) = Project(b, axis);
                if (maxA <= minB + Eps || maxB <= minA + Eps) return false;
            }
        return true;
    }

    private static (double Min, double Max) Project(List<Point> poly, Point axis)
    {
        var values = poly.Select(p => p.X * axis.X + p.Y * axis.Y).ToList();
        return (values.Min(), values.Max());
    }
}
