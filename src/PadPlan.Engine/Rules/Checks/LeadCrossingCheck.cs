using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Bare leads of different nets whose paths (body exit to landing, in plan view) cross or pass nearer than the lead gap: a short on the bench.</summary>
internal static class LeadCrossingCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        // The wires of a wire landing come from off the board in their insulation: only bare leads count.
        var leads = ctx.Plan.Parts.Where(p => p.Footprint.Mount != MountStyle.Landing).SelectMany(p => p.Leads).Where(l => l.Landing is not null).ToList();
        var gap = ctx.Rules.LeadGap;
        var widest = leads.Count == 0 ? 0 : leads.Max(l => l.Lead.Diameter);
        var reach = gap + widest + CheckContext.Eps;
        var order = Enumerable.Range(0, leads.Count).OrderBy(i => MinX(leads[i])).ToArray();
        // Sweep along x: once a path starts farther right than this one ends plus the reach, no later one can be near.
        for (var p = 0; p < order.Length; p++)
        {
            var a = leads[order[p]];
            var (ax0, ax1) = (MinX(a), MaxX(a));
            for (var q = p + 1; q < order.Length; q++)
            {
                var b = leads[order[q]];
                if (MinX(b) > ax1 + reach) break;
                if (Math.Min(b.Exit.Y, b.Landing!.At.Y) > Math.Max(a.Exit.Y, a.Landing!.At.Y) + reach
                    || Math.Min(a.Exit.Y, a.Landing.At.Y) > Math.Max(b.Exit.Y, b.Landing.At.Y) + reach) continue;
                if (ctx.Plan.Canonical(a.Net) is { } net && net == ctx.Plan.Canonical(b.Net)) continue;
                var (first, second) = string.CompareOrdinal(a.Name, b.Name) <= 0 ? (a, b) : (b, a);
                if (Finding(ctx, first, second, gap) is { } finding) yield return finding;
            }
        }
    }

    private static Finding? Finding(CheckContext ctx, PlacedLead a, PlacedLead b, double gap)
    {
        var centres = Segments.Distance(a.Exit, a.Landing!.At, b.Exit, b.Landing!.At);
        var radii = (a.Lead.Diameter + b.Lead.Diameter) / 2;
        // Two leads of one part leave the body as close as the package puts them (a TO-92's 1.27 mm pitch leaves 0.82 mm
        // between 0.45 mm leads): a lead bent past its neighbour's root may come to half that gap (common practice, no source).
        var need = radii + (a.Ref == b.Ref ? Math.Min(gap, (a.Exit.DistanceTo(b.Exit) - radii) / 2) : gap);
        if (centres >= need - CheckContext.Eps) return null;
        var apart = Math.Max(0, centres - radii);
        var at = (a.Exit + a.Landing.At + b.Exit + b.Landing.At) * 0.25;
        var what = centres <= CheckContext.Eps ? "cross" : apart <= CheckContext.Eps ? "touch" : $"pass {Text.Mm(apart)} apart";
        return Findings.Error(RuleIds.LeadCrossing,
            $"leads {a.Name} (net {ctx.Plan.Canonical(a.Net) ?? "none"}) and {b.Name} (net {ctx.Plan.Canonical(b.Net) ?? "none"}) {what} on their way to their landings; bare leads of two nets need {Text.Mm(need - radii)} between them here.",
            a.Ref == b.Ref ? $"Turn {a.Ref} so its leads fan out to their pads in order, or move the pads." : "Move one of the parts or its pad so the two leads run apart.",
            at, a.Name, b.Name);
    }

    private static double MinX(PlacedLead l) => Math.Min(l.Exit.X, l.Landing!.At.X);
    private static double MaxX(PlacedLead l) => Math.Max(l.Exit.X, l.Landing!.At.X);
}
