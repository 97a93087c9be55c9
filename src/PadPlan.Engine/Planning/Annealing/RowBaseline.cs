namespace PadPlan.Planning;

/// <summary>The yardstick placer for the benchmark: parts in rows in netlist order, unturned, each pad at the middle of its net's lead exits. No search at all.</summary>
internal static class RowBaseline
{
    private const double Spacing = 4.0;

    public static AnnealState Place(PlacementProblem problem)
    {
        var s = new AnnealState(problem);
        var r = problem.Region;
        double x = r.MinX, y = r.MinY, rowHeight = 0;
        foreach (var item in problem.Items.Where(i => i.IsPart && !i.Fixed))
        {
            var (w, h) = (item.BodyMaxX - item.BodyMinX, item.BodyMaxY - item.BodyMinY);
            if (x + w > r.MaxX && x > r.MinX) { x = r.MinX; y += rowHeight + Spacing; rowHeight = 0; }
            s.X[item.Index] = x - item.BodyMinX;
            s.Y[item.Index] = y - item.BodyMinY;
            x += w + Spacing;
            rowHeight = Math.Max(rowHeight, h);
        }
        s.Recompute();
        foreach (var item in problem.Items.Where(i => i.Pad is not null))
        {
            var net = problem.Nets[problem.Islands[item.Islands[0]].Net];
            var exits = net.Leads.Select(s.Exit).ToList();
            if (exits.Count == 0) continue;
            s.X[item.Index] = exits.Average(e => e.X);
            s.Y[item.Index] = exits.Average(e => e.Y);
        }
        s.Recompute();
        return s;
    }
}
