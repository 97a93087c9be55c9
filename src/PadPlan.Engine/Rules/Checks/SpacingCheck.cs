using PadPlan.Model.Standards;
using PadPlan.Rules.Physics;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Pad edge to pad edge, including the high-voltage spacing of IPC-2221 Table 6-1 (B2), and ground landings to pad edges.</summary>
internal static class SpacingCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        var copper = ctx.Plan.Copper;
        foreach (var (i, k, gap) in ctx.Pairs)
        {
            var (a, b) = (copper[i], copper[k]);
            var (netA, netB) = (ctx.NetOf(a), ctx.NetOf(b));
            var differ = netA is not null && netB is not null && netA != netB;
            // Copper that touches two different nets is a short, reported by the connectivity check.
            if (gap <= CheckContext.Eps && differ) continue;
            var at = (a.Island.Center + b.Island.Center) * 0.5;
            var volts = differ ? ctx.VoltageBetween(netA, netB) : 0;
            var hv = ConductorSpacing.B2(volts);
            if (differ && hv > ctx.Rules.PadGap && gap < hv)
            {
                yield return Findings.Error(RuleIds.HvSpacing,
                    $"pads {a.Id} (net {netA}) and {b.Id} (net {netB}) are {Text.Mm(gap)} apart{(a.IsNeighbourSegment(b) ? " across the score" : "")}; up to {Text.Num(volts)} V between them needs {Text.Mm(hv)} ({ConductorSpacing.Revision}, B2).",
                    $"Move the pads at least {Text.Mm(hv)} apart edge to edge; safety standards for mains equipment come first.",
                    at, a.Id, b.Id, netA!, netB!);
                continue;
            }
            if (a.IsNeighbourSegment(b) || gap >= ctx.Rules.PadGap) continue;
            yield return Findings.Error(RuleIds.PadGap,
                gap <= CheckContext.Eps
                    ? $"pads {a.Id} and {b.Id} overlap or touch{(netA is not null && netA == netB ? $" (both net {netA})" : "")}."
                    : $"pads {a.Id} and {b.Id} are {Text.Mm(gap)} apart edge to edge; the rule asks for {Text.Mm(ctx.Rules.PadGap)}.",
                $"Move them at least {Text.Mm(ctx.Rules.PadGap)} apart, or use one larger pad for a shared net.",
                at, a.Id, b.Id);
        }

        foreach (var lead in ctx.LandedLeads.Where(l => ctx.Plan.IsGround(l.Net) && ctx.Under(l).Count == 0))
        {
            var at = lead.Landing!.At;
            foreach (var c in copper)
            {
                var d = CopperGeometry.SignedDistance(c.Island, at);
                if (d > CheckContext.Eps && d < ctx.Rules.GroundGap - CheckContext.Eps)
                    yield return Findings.Error(RuleIds.GroundGap,
                        $"ground landing of {lead.Name} is {Text.Mm(d)} from the edge of pad {c.Id}; the rule asks for {Text.Mm(ctx.Rules.GroundGap)}.",
                        "Move the ground landing away from the pad, or shorten the lead to land on the other side of the part.",
                        at, lead.Name, c.Id);
            }
        }
    }
}
