using PadPlan.Model;

namespace PadPlan.Rules.Checks;

/// <summary>Nets that join nothing, footprints the import only guessed, parts the layout does not place, and leads of placed parts that carry a net but land nowhere.</summary>
internal static class CompletenessCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        foreach (var part in ctx.Plan.Unplaced)
            yield return Findings.Error(RuleIds.PartUnplaced,
                $"part {part.Ref} ({part.Value}) is in the netlist but not on the board.",
                "Run 'padplan place' again, or add a placement for it to the layout.", null, part.Ref);
        foreach (var f in SingleConnections(ctx.Plan.Project)) yield return f;
        foreach (var part in ctx.Plan.Project.Parts.Where(p => p.FootprintAssumed).OrderBy(p => p.Ref, NaturalOrder.Comparer))
            yield return Findings.Warning(RuleIds.FootprintAssumed,
                $"{part.Ref} ({part.Value}) is on {part.Footprint} because the import could not tell its package from the netlist: its body, lead spacing and rating may not be those of the part you have.",
                $"Check the part in hand. 'padplan swap PROJECT {part.Ref} --footprint NAME' puts it on the right footprint, or confirms {part.Footprint} when you name that; a parts map does the same at import.",
                null, part.Ref);
        foreach (var lead in ctx.Plan.Leads.Where(l => l.Net is not null && l.Landing is null))
            yield return Findings.Error(RuleIds.LeadUnplaced,
                $"lead {lead.Name} should join net {lead.Net} but has no landing point.",
                "Give the lead a landing on a pad of its net (or on the plane for ground).", lead.Exit, lead.Name, lead.Net!);
    }

    /// <summary>A net with one connection joins nothing: usually a misspelt net name. A net marked open-ended (a test point, an antenna lead) is only noted.</summary>
    private static IEnumerable<Finding> SingleConnections(Project project)
    {
        var uses = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (var part in project.Parts)
            foreach (var pin in part.Pins)
            {
                if (!uses.TryGetValue(pin.Net, out var list)) uses[pin.Net] = list = [];
                list.Add($"{part.Ref}.{pin.Pin}");
            }
        foreach (var net in project.Nets.Where(n => !n.Ground).OrderBy(n => n.Name, StringComparer.Ordinal))
        {
            if (uses.GetValueOrDefault(net.Name) is not [var only]) continue;
            yield return net.OpenEnded
                ? Findings.Info(RuleIds.SingleConnection,
                    $"net {net.Name} has one connection ({only}) and is marked open-ended.",
                    "Nothing to do if it is meant to end there (a test point, an antenna lead).", null, net.Name, only)
                : Findings.Error(RuleIds.SingleConnection,
                    $"net {net.Name} has only one connection ({only}), so it joins nothing.",
                    "Check the netlist for a misspelt net name; if the net is meant to end there (a test point, an antenna lead), mark it open-ended in the netlist (docs/netlist-format.md).",
                    null, net.Name, only);
        }
    }
}
