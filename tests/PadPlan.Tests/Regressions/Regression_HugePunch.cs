namespace PadPlan.Tests.Regressions;

/// <summary>Regression: "toolkit.punches: [1e308]" crashed the placer with IndexOutOfRange (exit 3).</summary>
public sealed class Regression_HugePunch
{
    [Theory]
    [InlineData(1e308)]
    [InlineData(50.01)]
    [InlineData(0.49)]
    public void A_punch_outside_half_a_millimetre_to_50_mm_is_refused(double size) =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["toolkit"]!["punches"] = new System.Text.Json.Nodes.JsonArray(3.18, size)),
            "$.toolkit.punches[1]", "from 0.5 to 50 mm");
}
