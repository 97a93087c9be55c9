namespace PadPlan.Rules.Checks;

/// <summary>Parts the layout does not place, and leads of placed parts that carry a net but land nowhere.</summary>
internal static class CompletenessCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        foreach (var part in ctx.Plan.Unplaced)
            yield return Findings.Error(RuleIds.PartUnplaced,
                $"part {part.Ref} ({part.Value}) is in the netlist but not on the board.",
                "Run 'padplan place' again, or add a placement for it to the layout.", null, part.Ref);
        foreach (var lead in ctx.Plan.Leads.Where(l => l.Net is not null && l.Landing is null))
            yield return Findings.Error(RuleIds.LeadUnplaced,
                $"lead {lead.Name} should join net {lead.Net} but has no landing point.",
                "Give the lead a landing on a pad of its net (or on the plane for ground).", lead.Exit, lead.Name, lead.Net!);
    }
}
