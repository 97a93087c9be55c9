using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>
/// Lower bounds under the wire a layout needs, used to judge a result ("lead / floor").
/// <para>Leads: each lead needs at least its minimum reach. Two leads of one part on different copper cannot both land close to
/// their exits: their landing points lie at least half a lead diameter inside pads that keep the pad gap (or a ground landing
/// keeps the ground gap from the pad), so the two leads together are at least that distance less the distance between their exits.
/// A part's floor is the best sum over disjoint pairs of its leads.</para>
/// <para>Jumpers (the pad-capacity bound): a net of k leads needs ceil(k / capacity) islands, capacity being that of the largest
/// island the planner cuts, and at least one island per strip segment it has; m islands need m - 1 jumpers, each at least the
/// gap between two islands plus their half sizes, centre to centre.</para>
/// </summary>
internal static class WireFloor
{
    /// <summary>Largest number of leads any single part's pair search enumerates exactly; beyond it, pairs are taken greedily (still a lower bound).</summary>
    private const int ExactLeads = 10;

    /// <summary>Lead floor of one part (mm).</summary>
    public static double LeadsOf(PlacementProblem p, ProblemItem item)
    {
        var leads = item.Leads.Where(l => p.Leads[l].OwnIsland < 0 && (p.Leads[l].Ground || p.Leads[l].Net >= 0)).ToArray();
        var pinned = item.Leads.Where(l => !leads.Contains(l)).Sum(l => p.Leads[l].MinReach);
        // excess[a, b]: how much two leads need together beyond their own minimum reaches
        var n = leads.Length;
        var excess = new double[n, n];
        var any = false;
        for (var a = 0; a < n; a++)
            for (var b = a + 1; b < n; b++)
            {
                var need = PairNeed(p, p.Leads[leads[a]], p.Leads[leads[b]]);
                var (la, lb) = (p.Leads[leads[a]], p.Leads[leads[b]]);
                var apart = Math.Sqrt((la.ExitX - lb.ExitX) * (la.ExitX - lb.ExitX) + (la.ExitY - lb.ExitY) * (la.ExitY - lb.ExitY));
                excess[a, b] = excess[b, a] = Math.Max(0, need - apart - la.MinReach - lb.MinReach);
                any |= excess[a, b] > 0;
            }
        var own = leads.Sum(l => p.Leads[l].MinReach);
        if (!any) return pinned + own;
        return pinned + own + (n <= ExactLeads ? BestMatching(excess, new bool[n], 0) : GreedyMatching(excess));
    }

    /// <summary>Distance two leads' landing points must keep: pads of different nets keep the pad gap (across a score, its width), a ground landing keeps the ground gap from a pad.</summary>
    private static double PairNeed(PlacementProblem p, ProblemLead a, ProblemLead b)
    {
        if (a.Ground && b.Ground) return 0;
        if (a.Ground || b.Ground) return p.Rules.GroundGap + (a.Ground ? b.Diameter : a.Diameter) / 2;
        if (a.Net == b.Net) return 0;
        var gap = HasSegment(p, a.Net) && HasSegment(p, b.Net) ? Math.Min(p.Rules.PadGap, p.Project.Toolkit.ScoreWidth) : p.Rules.PadGap;
        return gap + a.Diameter / 2 + b.Diameter / 2;
    }

    private static bool HasSegment(PlacementProblem p, int net) => p.Nets[net].Islands.Any(s => p.Islands[s].StripGroup >= 0);

    /// <summary>The largest total excess over disjoint pairs (exact, by trying each lead unpaired or paired with each later one).</summary>
    private static double BestMatching(double[,] excess, bool[] used, int from)
    {
        var n = used.Length;
        while (from < n && used[from]) from++;
        if (from >= n) return 0;
        used[from] = true;
        var best = BestMatching(excess, used, from + 1);
        for (var b = from + 1; b < n; b++)
        {
            if (used[b] || excess[from, b] <= 0) continue;
            used[b] = true;
            best = Math.Max(best, excess[from, b] + BestMatching(excess, used, from + 1));
            used[b] = false;
        }
        used[from] = false;
        return best;
    }

    private static double GreedyMatching(double[,] excess)
    {
        var n = excess.GetLength(0);
        var used = new bool[n];
        var pairs = new List<(double E, int A, int B)>();
        for (var a = 0; a < n; a++) for (var b = a + 1; b < n; b++) if (excess[a, b] > 0) pairs.Add((excess[a, b], a, b));
        var total = 0.0;
        foreach (var (e, a, b) in pairs.OrderByDescending(x => x.E))
            if (!used[a] && !used[b]) { used[a] = used[b] = true; total += e; }
        return total;
    }

    /// <summary>Jumper floor of one net (mm).</summary>
    public static double JumpersOf(PlacementProblem p, ProblemNet net)
    {
        var toolkit = p.Project.Toolkit;
        var largest = Math.Max(toolkit.RoundCapacity(toolkit.PunchDiameters[^1]), toolkit.RectCapacity(toolkit.StripWidths[^1], PlacerLimits.MaxRectLength));
        var segments = net.Islands.Count(s => p.Islands[s].StripGroup >= 0);
        var islands = Math.Max((net.Leads.Length + largest - 1) / largest, segments);
        if (islands <= 1) return 0;
        var gap = segments > 0 ? Math.Min(p.Rules.PadGap, toolkit.ScoreWidth) : p.Rules.PadGap;
        var smallest = Math.Min(toolkit.PunchDiameters[0], toolkit.StripWidths[0]);
        var half = (segments > 0 ? Math.Min(smallest, toolkit.StripPitch - toolkit.ScoreWidth) : smallest) / 2;
        return (islands - 1) * (gap + 2 * half);
    }
}
