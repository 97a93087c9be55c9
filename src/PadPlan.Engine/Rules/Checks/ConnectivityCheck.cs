using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Rebuilds the circuit from geometry alone (landing points in copper, jumpers, touching pads, ground landings on the plane) and compares it with the netlist: shorts, opens, unused pads.</summary>
internal static class ConnectivityCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        var plan = ctx.Plan;
        var copper = plan.Copper;
        var plane = copper.Count;
        var leads = ctx.LandedLeads.ToList();
        var sets = new UnionFind(copper.Count + 1 + leads.Count);
        var findings = new List<Finding>();
        var shorted = new HashSet<int>();
        void Shorted(int node) => shorted.Add(node);

        for (var j = 0; j < leads.Count; j++)
        {
            var lead = leads[j];
            var node = plane + 1 + j;
            var under = ctx.Under(lead);
            if (under.Count == 0) sets.Union(node, plane);
            foreach (var c in under) sets.Union(node, ctx.IndexOf(c));
            var f = LeadFinding(ctx, lead, under);
            if (f is not null)
            {
                findings.Add(f);
                if (f.Severity == Severity.Error) Shorted(node);
            }
        }

        foreach (var jumper in plan.Layout.Jumpers)
        {
            var from = plan.CopperById(jumper.From);
            var to = plan.CopperById(jumper.To);
            if (from is null || to is null)
            {
                var whole = from is null ? jumper.From : jumper.To;
                findings.Add(Findings.Error(RuleIds.JumperEnd,
                    $"jumper {jumper.Id} ends on strip {whole} as a whole; a strip is several isolated segments.",
                    "Name the segment the jumper is soldered to.", null, jumper.Id, whole));
                continue;
            }
            sets.Union(ctx.IndexOf(from), ctx.IndexOf(to));
            var (a, b) = (ctx.NetOf(from), ctx.NetOf(to));
            if (a is not null && b is not null && a != b)
            {
                findings.Add(Findings.Error(RuleIds.JumperShort,
                    $"jumper {jumper.Id} joins {from.Id} (net {a}) to {to.Id} (net {b}).",
                    "Move the jumper end to a pad of the same net, or remove it.", from.Island.Center, jumper.Id, from.Id, to.Id, a, b));
                Shorted(ctx.IndexOf(from));
            }
        }

        foreach (var (i, k, gap) in ctx.Pairs)
        {
            if (gap > CheckContext.Eps || copper[i].IsNeighbourSegment(copper[k])) continue;
            sets.Union(i, k);
            var (a, b) = (ctx.NetOf(copper[i]), ctx.NetOf(copper[k]));
            if (a is null || b is null || a == b) continue;
            findings.Add(Findings.Error(RuleIds.PadShort,
                $"pads {copper[i].Id} (net {a}) and {copper[k].Id} (net {b}) {(gap < -CheckContext.Eps ? "overlap" : "touch")}.",
                $"Move them apart to at least {Text.Mm(ctx.Rules.PadGap)} edge to edge.",
                Midpoint(copper[i].Island, copper[k].Island), copper[i].Id, copper[k].Id, a, b));
            Shorted(i);
        }

        findings.AddRange(UnexplainedShorts(ctx, sets, leads, shorted));
        findings.AddRange(Opens(ctx, sets, leads));
        foreach (var c in copper.Where(c => ctx.LeadsOn(c).Count == 0))
            findings.Add(Findings.Warning(RuleIds.PadUnused,
                $"pad {c.Id}{(ctx.NetOf(c) is { } n ? $" (net {n})" : "")} has no lead landing on it.",
                "Remove the pad, or land the lead meant for it inside its copper.", c.Island.Center, c.Id));
        return findings;
    }

    // The three ways a single lead makes a wrong connection, and a landing that disagrees with the pad the file names.
    private static Finding? LeadFinding(CheckContext ctx, PlacedLead lead, IReadOnlyList<PadCopper> under)
    {
        var plan = ctx.Plan;
        var at = lead.Landing!.At;
        var declared = lead.Landing.Pad;
        var want = plan.Canonical(lead.Net);
        var ground = plan.IsGround(lead.Net);
        if (under.Count == 0)
        {
            if (want is not null && !ground)
            {
                var meant = declared is null ? "" : Near(ctx, declared, at);
                return Findings.Error(RuleIds.LeadOffPad,
                    $"lead {lead.Name} (net {want}) lands at {Text.At(at)}, on the ground plane, not in pad copper{meant}: that shorts {want} to ground.",
                    "Move the landing point inside the copper of a pad of its net.", at, lead.Name, want);
            }
            return declared is null ? null : Findings.Warning(RuleIds.LandingMismatch,
                $"lead {lead.Name} is listed on pad {declared} but its landing point {Text.At(at)} lies on the plane{Near(ctx, declared, at)}.",
                "Correct the pad named for the lead, or move its landing point.", at, lead.Name, declared);
        }
        foreach (var c in under)
        {
            var has = ctx.NetOf(c);
            if (ground && has != want)
                return Findings.Error(RuleIds.GroundOnPad,
                    $"ground lead {lead.Name} lands at {Text.At(at)}, inside pad {c.Id}{(has is null ? "" : $" (net {has})")}: that shorts the pad to ground.",
                    $"Move the ground landing onto bare plane, at least {Text.Mm(ctx.Rules.GroundGap)} from every pad.", at, lead.Name, c.Id);
            if (!ground && want is not null && has is not null && has != want)
                return Findings.Error(RuleIds.LeadWrongPad,
                    $"lead {lead.Name} (net {want}) lands in pad {c.Id} (net {has}): that shorts {want} to {has}.",
                    $"Move the lead onto a pad of net {want}.", at, lead.Name, c.Id, want, has);
        }
        var best = under[0];
        var sameStrip = declared is not null && best.Segment >= 0 && best.Pad.Id == declared;
        if (declared != best.Id && !sameStrip)
            return Findings.Warning(RuleIds.LandingMismatch,
                $"lead {lead.Name} is listed on {(declared is null ? "the plane" : $"pad {declared}")} but its landing point {Text.At(at)} lies in pad {best.Id}; the check goes by the point.",
                "Correct the pad named for the lead, or move its landing point.", at, lead.Name, best.Id);
        return null;
    }

    private static string Near(CheckContext ctx, string declared, Point at)
    {
        var c = ctx.Plan.CopperById(declared);
        return c is null ? "" : $" ({Text.Mm(CopperGeometry.SignedDistance(c.Island, at))} outside pad {declared})";
    }

    // A short that no single lead, jumper or touching pair explains, e.g. two nets bridged through a pad of no stated net.
    private static IEnumerable<Finding> UnexplainedShorts(CheckContext ctx, UnionFind sets, List<PlacedLead> leads, HashSet<int> shorted)
    {
        var plane = ctx.Plan.Copper.Count;
        var explained = shorted.Select(sets.Find).ToHashSet();
        var byPiece = new SortedDictionary<int, SortedSet<string>>();
        void Add(int node, string? net)
        {
            if (net is null) return;
            var root = sets.Find(node);
            if (!byPiece.TryGetValue(root, out var nets)) byPiece[root] = nets = new SortedSet<string>(StringComparer.Ordinal);
            nets.Add(net);
        }
        for (var j = 0; j < leads.Count; j++) Add(plane + 1 + j, ctx.Plan.Canonical(leads[j].Net));
        for (var i = 0; i < ctx.Plan.Copper.Count; i++) Add(i, ctx.Plan.Copper[i].Island.Net is null ? null : ctx.NetOf(ctx.Plan.Copper[i]));
        if (ctx.Plan.GroundName is not null) Add(plane, ctx.Plan.GroundName);
        foreach (var (root, nets) in byPiece)
        {
            if (nets.Count < 2 || explained.Contains(root)) continue;
            var members = Members(ctx, sets, leads, root);
            yield return Findings.Error(RuleIds.Short,
                $"nets {string.Join(", ", nets)} are joined through {string.Join(", ", members.Take(8))}{(members.Count > 8 ? ", ..." : "")}.",
                "Find the pad or jumper that bridges them and separate the nets.", null, nets.Concat(members));
        }
    }

    private static IEnumerable<Finding> Opens(CheckContext ctx, UnionFind sets, List<PlacedLead> leads)
    {
        var plane = ctx.Plan.Copper.Count;
        var byNet = new SortedDictionary<string, List<int>>(StringComparer.Ordinal);
        for (var j = 0; j < leads.Count; j++)
        {
            var net = ctx.Plan.Canonical(leads[j].Net);
            if (net is null) continue;
            if (!byNet.TryGetValue(net, out var list)) byNet[net] = list = [];
            list.Add(j);
        }
        foreach (var (net, members) in byNet)
        {
            var pieces = members.GroupBy(j => sets.Find(plane + 1 + j)).ToList();
            if (pieces.Count < 2) continue;
            var described = pieces.Select(p => "[" + string.Join(", ", Places(ctx, p.Select(j => leads[j]))) + "]").ToList();
            var lonely = leads[pieces[^1].First()];
            yield return Findings.Error(RuleIds.Open,
                $"net {net} is in {pieces.Count} separate pieces: {string.Join(" and ", described)}.",
                "Land those leads on one pad, or join the pads with a jumper.", lonely.Landing!.At,
                new[] { net }.Concat(pieces.SelectMany(p => p.Select(j => leads[j].Name))));
        }
    }

    // "P2: R1.2, C1.2" style description of where a group of leads lands.
    private static IEnumerable<string> Places(CheckContext ctx, IEnumerable<PlacedLead> group) =>
        group.GroupBy(l => ctx.Under(l) is { Count: > 0 } u ? u[0].Id : "plane")
            .Select(g => $"{g.Key}: {string.Join(", ", g.Select(l => l.Name))}");

    private static List<string> Members(CheckContext ctx, UnionFind sets, List<PlacedLead> leads, int root)
    {
        var names = ctx.Plan.Copper.Where((c, i) => sets.Find(i) == root).Select(c => c.Id).ToList();
        if (sets.Find(ctx.Plan.Copper.Count) == root) names.Add("the plane");
        names.AddRange(leads.Where((l, j) => sets.Find(ctx.Plan.Copper.Count + 1 + j) == root).Select(l => l.Name));
        return names;
    }

    private static Point Midpoint(Island a, Island b) => (a.Center + b.Center) * 0.5;
}
