using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>Turns a finished run into layout records: pads (kept ones unchanged), strips under DIPs, placements with every lead's landing, and jumpers. Coordinates are rounded to 0.01 mm.</summary>
internal static class LayoutWriter
{
    public static Layout Write(AnnealState s, double shiftX = 0, double shiftY = 0)
    {
        var p = s.Problem;
        var stock = p.Project.Toolkit.StockThickness;
        var pads = new List<Pad>();
        var placements = new List<Placement>();
        var made = MadeIslands(s);
        var ids = Ids(s, made);
        foreach (var item in p.Items)
        {
            var i = item.Index;
            var at = new Point(R(s.X[i] + shiftX), R(s.Y[i] + shiftY));
            if (item.KeptPad is not null) { pads.Add(item.KeptPad); continue; }
            if (item.Pad is { } planned)
            {
                if (!made[item.Islands[0]]) continue;
                var island = p.Islands[item.Islands[0]];
                pads.Add(planned.Shape == PlannedShape.Round
                    ? new RoundPad(ids[item.Islands[0]], planned.Net, at, planned.Width, stock)
                    : s.Rot[i] == 1 && item.CanTurn
                        ? new RectPad(ids[item.Islands[0]], planned.Net, at, planned.Height, planned.Width, stock)
                        : new RectPad(ids[item.Islands[0]], planned.Net, at, planned.Width, planned.Height, stock));
                continue;
            }
            pads.AddRange(Strips(s, item, at));
            placements.Add(new Placement(item.Part!.Ref, at, (Rotation)(s.Rot[i] * 90), Landings(s, item, ids, shiftX, shiftY)));
        }
        return new Layout(pads.ToValueList(), placements.ToValueList(), Jumpers(s, made, ids).ToValueList());
    }

    /// <summary>
    /// The islands the layout makes: every strip segment and kept pad, and each planned pad that a lead lands on. A planned
    /// pad the run left with no lead (its net's leads all found room on nearer pads) would be reached only by a wire link
    /// and join nothing, so it is not made.
    /// </summary>
    private static bool[] MadeIslands(AnnealState s)
    {
        var p = s.Problem;
        var made = p.Islands.Select(island => p.Items[island.Item].Pad is null).ToArray();
        for (var l = 0; l < p.Leads.Length; l++)
            if (!p.Leads[l].Ground && p.Leads[l].Net >= 0 && s.IslandOf(l) is var island and >= 0) made[island] = true;
        return made;
    }

    private static ValueList<LeadLanding> Landings(AnnealState s, ProblemItem item, string[] ids, double shiftX, double shiftY)
    {
        var p = s.Problem;
        var landings = new List<LeadLanding>();
        foreach (var l in item.Leads)
        {
            var lead = p.Leads[l];
            double x, y;
            string? pad;
            if (lead.Ground)
            {
                (x, y) = s.GroundPoint(l);
                pad = null;
            }
            else if (lead.OwnIsland >= 0)
            {
                (x, y) = s.Exit(l);
                pad = p.Islands[lead.OwnIsland].Id;
            }
            else
            {
                var island = s.IslandOf(l);
                s.Land(l, island, out x, out y, out _);
                pad = ids[island];
            }
            landings.Add(new LeadLanding(lead.Pin, pad, new Point(R(x + shiftX), R(y + shiftY))));
        }
        return landings.ToValueList();
    }

    /// <summary>Each strip run in board coordinates; a strip always starts at its top or left end, so a turned part may list its segments backwards.</summary>
    private static IEnumerable<Pad> Strips(AnnealState s, ProblemItem item, Point at)
    {
        var rot = s.Rot[item.Index];
        var toolkit = s.Problem.Project.Toolkit;
        for (var k = 0; k < item.Strips.Count; k++)
        {
            var run = item.Strips[k];
            var length = run.Pitch * run.Pins.Count;
            var (ax, ay) = Geometry.Rotate(rot, run.Start.X, run.Start.Y);
            var (dx, dy) = Geometry.Rotate(rot, run.Vertical ? 0 : 1, run.Vertical ? 1 : 0);
            var segments = run.Pins.Select(pin => new StripSegment($"{item.Part!.Ref}-{pin.Pin}", pin.Net, run.Pitch)).ToList();
            var vertical = Math.Abs(dy) > 0.5;
            var forward = vertical ? dy > 0 : dx > 0;
            var start = forward ? new Point(at.X + ax, at.Y + ay) : new Point(at.X + ax + dx * length, at.Y + ay + dy * length);
            if (!forward) segments.Reverse();
            yield return new StripPad($"{item.Part!.Ref}-S{k + 1}", new Point(R(start.X), R(start.Y)), vertical, run.Width, segments.ToValueList(), run.Score, toolkit.StockThickness);
        }
    }

    /// <summary>The id each island is written with: planned pads numbered again in order over the pads made (as the problem
    /// builder numbered them, skipping the ids of strips and kept pads), so a pad not made leaves no gap.</summary>
    private static string[] Ids(AnnealState s, bool[] made)
    {
        var p = s.Problem;
        var used = new HashSet<string>(p.Islands.Where(i => p.Items[i.Item].Pad is null).Select(i => i.Id), StringComparer.Ordinal);
        var number = 0;
        return p.Islands.Select((island, k) =>
        {
            if (p.Items[island.Item].Pad is null || !made[k]) return island.Id;
            string id;
            do id = GeneratedIds.Pad(++number); while (!used.Add(id));
            return id;
        }).ToArray();
    }

    /// <summary>For every net on several made islands, the shortest tree of straight jumpers between them (Prim, from the first island).</summary>
    private static IEnumerable<Jumper> Jumpers(AnnealState s, bool[] made, string[] ids)
    {
        var p = s.Problem;
        var count = 0;
        foreach (var net in p.Nets)
        {
            var isl = net.Islands.Where(i => made[i]).ToArray();
            if (isl.Length < 2) continue;
            var inTree = new bool[isl.Length];
            inTree[0] = true;
            for (var added = 1; added < isl.Length; added++)
            {
                (int From, int To, double D) best = (-1, -1, double.MaxValue);
                for (var a = 0; a < isl.Length; a++)
                {
                    if (!inTree[a]) continue;
                    for (var b = 0; b < isl.Length; b++)
                    {
                        if (inTree[b]) continue;
                        var (ax, ay, _, _) = s.IslandBox(isl[a]);
                        var (bx, by, _, _) = s.IslandBox(isl[b]);
                        var d = Math.Sqrt((ax - bx) * (ax - bx) + (ay - by) * (ay - by));
                        if (d < best.D) best = (a, b, d);
                    }
                }
                inTree[best.To] = true;
                yield return new Jumper(GeneratedIds.Jumper(++count), ids[isl[best.From]], ids[isl[best.To]]);
            }
        }
    }

    /// <summary>Rounds to the written step (0.01 mm), never writing -0.</summary>
    private static double R(double v)
    {
        var r = Math.Round(v, 2);
        return r == 0 ? 0 : r;
    }
}
