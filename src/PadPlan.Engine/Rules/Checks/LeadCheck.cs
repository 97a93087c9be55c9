using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Lead reach against the footprint and the net's limit, landing points near a pad edge, and how many leads each pad holds.</summary>
internal static class LeadCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        foreach (var lead in ctx.LandedLeads)
        {
            var reach = lead.Reach;
            var at = lead.Landing!.At;
            var fl = lead.Lead;
            if (reach < fl.MinReach - CheckContext.Eps || reach > fl.MaxReach + CheckContext.Eps)
                yield return Findings.Error(RuleIds.LeadReach,
                    $"lead {lead.Name} spans {Text.Mm(reach)} from the body to its landing; the footprint allows {Text.Mm(fl.MinReach)} to {Text.Mm(fl.MaxReach)}.",
                    reach > fl.MaxReach ? "Move the part or its pad closer together." : "Move the landing farther from the body: the lead needs room to bend.",
                    at, lead.Name);
            var net = ctx.Plan.Net(lead.Net);
            if (net is not null && reach > ctx.Rules.MaxLeadFor(net) + CheckContext.Eps && reach <= fl.MaxReach + CheckContext.Eps)
                yield return Findings.Error(RuleIds.LeadLength,
                    $"lead {lead.Name} on net {net.Name} ({net.Class.ToString().ToLowerInvariant()}) is {Text.Mm(reach)} long; the net allows {Text.Mm(ctx.Rules.MaxLeadFor(net))}.",
                    "Move the part nearer its pad; short leads matter most on rf nets.", at, lead.Name, net.Name);
            var under = ctx.Under(lead);
            if (under.Count == 0) continue;
            var depth = -CopperGeometry.SignedDistance(under[0].Island, at);
            if (depth < fl.Diameter / 2 - CheckContext.Eps)
                yield return Findings.Warning(RuleIds.LeadEdge,
                    $"lead {lead.Name} lands {Text.Mm(Math.Max(depth, 0))} in from the edge of {under[0].Id}; a {Text.Mm(fl.Diameter)} lead needs {Text.Mm(fl.Diameter / 2)} to sit fully on the copper.",
                    "Move the landing point further onto the pad.", at, lead.Name, under[0].Id);
        }

        foreach (var c in ctx.Plan.Copper)
        {
            var count = ctx.LeadsOn(c).Count;
            var capacity = ctx.Plan.Project.Toolkit.CapacityOf(c.Island);
            if (count > capacity)
                yield return Findings.Error(RuleIds.PadCapacity,
                    $"pad {c.Id} holds {count} leads ({string.Join(", ", ctx.LeadsOn(c).Select(l => l.Name))}); a pad of its size takes {capacity}.",
                    "Use a larger pad, or split the net over two pads joined by a jumper.", c.Island.Center,
                    new[] { c.Id }.Concat(ctx.LeadsOn(c).Select(l => l.Name)));
        }
    }
}
