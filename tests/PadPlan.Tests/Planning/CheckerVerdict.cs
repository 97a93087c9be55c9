using PadPlan.Model;
using PadPlan.Rules;

namespace PadPlan.Tests.Planning;

/// <summary>What the placer must satisfy: the independent checker's errors (the placer shares no verdict code with it), plus a direct look at every landing.</summary>
public static class CheckerVerdict
{
    public static IReadOnlyList<string> Check(Project project)
    {
        var problems = Checker.Check(project).Findings
            .Where(f => f.Severity == Severity.Error)
            .Select(f => $"{f.RuleId}: {f.Message}")
            .ToList();
        problems.AddRange(LeadsOffTheirNet(project));
        return problems;
    }

    /// <summary>Every lead lands on an island of its own net, or on the plane when its net is ground.</summary>
    public static IEnumerable<string> LeadsOffTheirNet(Project project)
    {
        var islands = project.Layout!.Islands().ToDictionary(i => i.Id, StringComparer.Ordinal);
        foreach (var placement in project.Layout.Placements)
        {
            var part = project.FindPart(placement.Ref)!;
            foreach (var lead in placement.Leads)
            {
                var net = part.NetOf(lead.Pin);
                if (net is null) continue;
                var ground = project.FindNet(net)!.Ground;
                if (lead.OnPlane && !ground) yield return $"{part.Ref}.{lead.Pin} (net {net}) lands on the plane";
                if (!lead.OnPlane && islands[lead.Pad!].Net != net) yield return $"{part.Ref}.{lead.Pin} (net {net}) lands on {lead.Pad} of net {islands[lead.Pad!].Net}";
            }
        }
    }
}
