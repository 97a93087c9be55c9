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
        findings.AddRange(Capped(CompletenessCheck.Run(ctx)
            .Concat(ConnectivityCheck.Run(ctx))
            .Concat(SpacingCheck.Run(ctx))
            .Concat(LeadCheck.Run(ctx))
            .Concat(LeadCrossingCheck.Run(ctx))
            .Concat(PlacementCheck.Run(ctx))
            .Concat(HeightCheck.Run(ctx))
            .Concat(ElectricalCheck.Run(ctx))
            .Concat(OperatingCheck.Run(project, options.Simulation))));
        return Report(findings, ParasiticEstimates.Run(ctx));
    }

    /// <summary>Findings of one rule and severity listed at most; the rest are counted in one closing finding.</summary>
    public const int MaxListedPerRule = 100;

    // A plan with thousands of pads piled on one spot has millions of pair findings; listing them all filled gigabytes
    // (issue 15). The first ones show what is wrong; a count stands for the rest.
    private static IEnumerable<Finding> Capped(IEnumerable<Finding> findings)
    {
        var counts = new Dictionary<(string Rule, Severity Severity), int>();
        foreach (var finding in findings)
        {
            var key = (finding.RuleId, finding.Severity);
            var n = counts.GetValueOrDefault(key) + 1;
            counts[key] = n;
            if (n <= MaxListedPerRule) yield return finding;
        }
        foreach (var ((rule, severity), n) in counts.Where(kv => kv.Value > MaxListedPerRule))
            yield return new Finding(rule, severity, $"{n - MaxListedPerRule} more findings of this rule are not listed (of {n}).",
                "Fix the ones listed first, then check again.", null, ValueList<string>.Empty);
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
