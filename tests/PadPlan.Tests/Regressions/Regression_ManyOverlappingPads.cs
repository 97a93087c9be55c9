using System.Text.Json.Nodes;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: 50,000 overlapping pads drove check and sheets to 10 GB of memory.</summary>
public sealed class Regression_ManyOverlappingPads
{
    [Fact]
    public void Fifty_thousand_pads_are_refused_with_the_limit() =>
        RefusedProject.AssertRefused(
            RefusedProject.Write(n => n["layout"]!["pads"] = RefusedProject.Many(50_000, i => new JsonObject { ["id"] = $"X{i}", ["shape"] = "round", ["x"] = 10, ["y"] = 10, ["d"] = 4 })),
            "$.layout.pads", $"at most {PadPlan.ProjectFiles.Limits.InputLimits.MaxPads} are allowed");
}

/// <summary>Regression, the same bug within the limits: every pair of piled-up pads was a finding of its own, millions of them; now at most 100 per rule are listed and the rest counted.</summary>
public sealed class Regression_ManyOverlappingPadsWithinLimits
{
    [Fact]
    public void Pads_piled_on_one_spot_give_a_short_report_with_a_count_of_the_rest()
    {
        var project = PadPlan.ProjectFiles.ProjectFile.Parse(System.Text.Encoding.UTF8.GetBytes(RefusedProject.Edited(n =>
        {
            var pads = n["layout"]!["pads"]!.AsArray();
            for (var i = 0; i < 200; i++) pads.Add(new JsonObject { ["id"] = $"X{i}", ["shape"] = "round", ["x"] = 10, ["y"] = 10, ["d"] = 4 });
        })), "piled.padplan.json");
        var report = PadPlan.Rules.Checker.Check(project);
        var byRule = report.Findings.GroupBy(f => (f.RuleId, f.Severity)).ToList();
        Assert.All(byRule, g => Assert.True(g.Count() <= PadPlan.Rules.Checker.MaxListedPerRule + 1, $"{g.Key}: {g.Count()} findings"));
        // 200 piled pads overlap pairwise, 200 * 199 / 2 = 19,900 pairs: far more than the 100 listed are counted
        var counted = report.Findings.Where(f => f.Message.Contains("more findings of this rule are not listed", StringComparison.Ordinal))
            .Select(f => int.Parse(f.Message.Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture)).ToList();
        Assert.NotEmpty(counted);
        Assert.True(counted.Max() > 10_000, string.Join(", ", counted));
        Assert.True(report.Errors > 0);
    }
}
