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
        foreach (var item in p.Items)
        {
            var i = item.Index;
            var at = new Point(R(s.X[i] + shiftX), R(s.Y[i] + shiftY));
            if (item.KeptPad is not null) { pads.Add(item.KeptPad); continue; }
            if (item.Pad is { } planned)
            {
                var island = p.Islands[item.Islands[0]];
                pads.Add(planned.Shape == PlannedShape.Round
                    ? new RoundPad(island.Id, planned.Net, at, planned.Width, stock)
                    : s.Rot[i] == 1 && item.CanTurn
                        ? new RectPad(island.Id, planned.Net, at, planned.Height, planned.Width, stock)
                        : new RectPad(island.Id, planned.Net, at, planned.Width, planned.Height, stock));
                continue;
            }
            pads.AddRange(Strips(s, item, at));
            placements.Add(new Placement(item.Part!.Ref, at, (Rotation)(s.Rot[i] * 90), Landings(s, item, shiftX, shiftY)));
        }
        return new Layout(pads.ToValueList(), placements.ToValueList(), Jumpers(s).ToValueList());
    }

    private static ValueList<LeadLanding> Landings(AnnealState s, ProblemItem item, double shiftX, double shiftY)
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
                pad = p.Islands[island].Id;
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

    /// <summary>For every net on several islands, the shortest tree of straight jumpers between them (Prim, from the first island).</summary>
    private static IEnumerable<Jumper> Jumpers(AnnealState s)
    {
        var p = s.Problem;
        var count = 0;
        foreach (var net in p.Nets)
        {
            var isl = net.Islands;
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
                yield return new Jumper(GeneratedIds.Jumper(++count), p.Islands[isl[best.From]].Id, p.Islands[isl[best.To]].Id);
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
