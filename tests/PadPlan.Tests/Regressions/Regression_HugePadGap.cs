namespace PadPlan.Tests.Regressions;

/// <summary>Regression: "rules.padGap: 1e308" ran place forever at "cost Infinity".</summary>
public sealed class Regression_HugePadGap
{
    [Theory]
    [InlineData("padGap", 1e308)]
    [InlineData("padGap", 50)]
    [InlineData("groundGap", 1e308)]
    public void A_gap_of_50_mm_or_more_is_refused(string rule, double gap) =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["rules"]![rule] = gap), $"$.rules.{rule}", "at least 0 and less than 50 mm");
}
