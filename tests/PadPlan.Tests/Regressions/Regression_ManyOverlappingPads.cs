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
