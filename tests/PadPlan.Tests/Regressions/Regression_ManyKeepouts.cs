using System.Text.Json.Nodes;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: 100,000 keep-outs kept place running for more than 3 minutes.</summary>
public sealed class Regression_ManyKeepouts
{
    [Fact]
    public void A_hundred_thousand_keepouts_are_refused_with_the_limit() =>
        RefusedProject.AssertRefused(
            RefusedProject.Write(n => n["board"]!["keepouts"] = RefusedProject.Many(100_000, i => new JsonObject { ["shape"] = "circle", ["x"] = i % 50, ["y"] = 5, ["d"] = 1 })),
            "$.board.keepouts", $"at most {PadPlan.ProjectFiles.Limits.InputLimits.MaxKeepouts} are allowed");
}
