namespace PadPlan.Planning;

/// <summary>Carries a layout from one plan of a project's pads to another plan of the same project (more pads on some nets).</summary>
internal static class LayoutCarry
{
    /// <summary>
    /// Every part, and the k-th planned pad of each net that both plans have, keeps its place, turn and ground landings; a pad
    /// the old plan lacked goes beside the lead of its net that overshoots most in the old layout (the next such lead for the
    /// next new pad). Both problems must come from the same project: parts and their leads are numbered alike.
    /// </summary>
    public static void Into(AnnealState from, AnnealState to)
    {
        var (a, b) = (from.Problem, to.Problem);
        var oldPads = PadsByNet(a);
        var taken = new Dictionary<int, int>();
        var fresh = new List<int>();
        for (var i = 0; i < b.Items.Length; i++)
        {
            var item = b.Items[i];
            if (item.Fixed) continue;
            var source = item.IsPart ? i : -1;
            if (!item.IsPart)
            {
                var net = b.Islands[item.Islands[0]].Net;
                var k = taken.GetValueOrDefault(net);
                taken[net] = k + 1;
                if (oldPads.TryGetValue(net, out var list) && k < list.Count) source = list[k];
            }
            if (source < 0) { fresh.Add(i); continue; }
            (to.X[i], to.Y[i], to.Rot[i]) = (from.X[source], from.Y[source], from.Rot[source]);
        }
        Array.Copy(from.GroundChoice, to.GroundChoice, Math.Min(from.GroundChoice.Length, to.GroundChoice.Length));
        var used = new Dictionary<int, int>();
        foreach (var i in fresh)
        {
            var net = b.Islands[b.Items[i].Islands[0]].Net;
            var shortest = ShortLeads(from, net);
            var k = used.GetValueOrDefault(net);
            used[net] = k + 1;
            if (shortest.Count == 0) continue;
            var lead = shortest[k % shortest.Count];
            var (ex, ey) = from.Exit(lead);
            var (ox, oy) = from.Outward(lead);
            var reach = Math.Max(b.Islands[b.Items[i].Islands[0]].HalfW, b.Islands[b.Items[i].Islands[0]].HalfH);
            var r = b.Region;
            to.X[i] = Math.Clamp(ex + ox * reach, r.MinX, r.MaxX);
            to.Y[i] = Math.Clamp(ey + oy * reach, r.MinY, r.MaxY);
        }
        to.Recompute();
    }

    /// <summary>The movable planned pads of each net, in item order.</summary>
    private static Dictionary<int, List<int>> PadsByNet(PlacementProblem p)
    {
        var byNet = new Dictionary<int, List<int>>();
        foreach (var item in p.Items)
        {
            if (item.Fixed || item.IsPart) continue;
            var net = p.Islands[item.Islands[0]].Net;
            if (!byNet.TryGetValue(net, out var list)) byNet[net] = list = [];
            list.Add(item.Index);
        }
        return byNet;
    }

    /// <summary>The free leads of a net, those that overshoot their reach most first.</summary>
    private static List<int> ShortLeads(AnnealState s, int net)
    {
        var p = s.Problem;
        return [.. p.Nets[net].FreeLeads
            .Select(l => (Lead: l, Over: s.IslandOf(l) is var island and >= 0 ? Overshoot(s, l, island) : double.PositiveInfinity))
            .OrderByDescending(x => x.Over).ThenBy(x => x.Lead).Select(x => x.Lead)];
    }

    private static double Overshoot(AnnealState s, int lead, int island)
    {
        s.Land(lead, island, out _, out _, out var v);
        return v;
    }
}
