namespace PadPlan.Tests.Regressions;

/// <summary>Regression: 200,000 unused nets failed with "Array dimensions exceeded supported range" (exit 3).</summary>
public sealed class Regression_ManyNets
{
    [Fact]
    public void Two_hundred_thousand_nets_are_refused_with_the_limit()
    {
        var file = RefusedProject.Write(n =>
        {
            var nets = n["nets"]!.AsArray();
            for (var i = 0; i < 200_000; i++) nets.Add(new System.Text.Json.Nodes.JsonObject { ["name"] = $"unused{i}" });
        });
        RefusedProject.AssertRefused(file, "$.nets", $"at most {PadPlan.ProjectFiles.Limits.InputLimits.MaxNets} are allowed");
    }
}
