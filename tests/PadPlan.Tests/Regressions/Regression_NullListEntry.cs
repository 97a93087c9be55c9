using System.Text.Json.Nodes;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a null entry in a list ("$.parts[11]: null", a null lead landing) crashed the reader with a NullReferenceException (exit 3).</summary>
public sealed class Regression_NullListEntry
{
    [Fact]
    public void A_null_part_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["parts"]![8] = null), "$.parts[8]", "null");

    [Fact]
    public void A_null_lead_landing_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["layout"]!["placements"]![2]!["leads"]![1] = null), "$.layout.placements[2].leads[1]", "null");

    [Fact]
    public void A_null_body_point_is_refused() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["footprints"]![0]!["body"]![1] = null), "$.footprints[0].body[1]", "null");
}
