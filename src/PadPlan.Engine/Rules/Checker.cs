using PadPlan.Model;
using PadPlan.Rules.Checks;

namespace PadPlan.Rules;

/// <summary>Checks a plan against its circuit from geometry alone: connectivity, spacing, reach, board, high voltage, current; estimates parasitics. Independent of the placer.</summary>
public static class Checker
{
    public static CheckReport Check(Project project, CheckOptions? options = null)
    {
        options ??= CheckOptions.Default;
        if (project.Layout is null)
            return Report([Findings.Error(RuleIds.LayoutMissing, $"project {project.Name} has no layout yet, so there is nothing to check.",
                "Run 'padplan place' first, or add a layout by hand.", null, project.Name)], []);
        var ctx = new CheckContext(ResolvedPlan.Of(project), options);
        var findings = new List<Finding>();
        if (project.Board.IsAuto)
            findings.Add(Findings.Error(RuleIds.BoardSize, "the board size is still automatic although the plan has a layout, so the margin cannot be checked.",
                "Run 'padplan place' to fix the size, or give the board a width and height.", null, project.Name));
        findings.AddRange(CompletenessCheck.Run(ctx));
        findings.AddRange(ConnectivityCheck.Run(ctx));
        findings.AddRange(SpacingCheck.Run(ctx));
        findings.AddRange(LeadCheck.Run(ctx));
        findings.AddRange(PlacementCheck.Run(ctx));
        findings.AddRange(ElectricalCheck.Run(ctx));
        return Report(findings, ParasiticEstimates.Run(ctx));
    }

    // Worst first, then by rule and place, so that the same plan always gives the same report.
    private static CheckReport Report(IEnumerable<Finding> findings, IEnumerable<string> estimates) => new(
        findings
            .OrderByDescending(f => f.Severity)
            .ThenBy(f => RuleOrder(f.RuleId))
            .ThenBy(f => f.Location?.Y ?? double.NegativeInfinity)
            .ThenBy(f => f.Location?.X ?? double.NegativeInfinity)
            .ThenBy(f => string.Join(",", f.Items), StringComparer.Ordinal)
            .ToValueList(),
        estimates.ToValueList());

    private static int RuleOrder(string id)
    {
        for (var i = 0; i < RuleIds.All.Count; i++)
            if (RuleIds.All[i] == id) return i;
        return int.MaxValue;
    }
}
