namespace PadPlan.Tests.Regressions;

/// <summary>Regression: "board.margin: 1000" failed inside the placer with "'1000' cannot be greater than -936" (exit 3).</summary>
public sealed class Regression_MarginLeavesNoRoom
{
    [Fact]
    public void A_margin_above_its_limit_is_refused_with_the_allowed_range() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["board"]!["margin"] = 1000), "$.board.margin", "from 0 to 100 mm");

    [Fact]
    public void A_margin_that_leaves_no_room_on_the_board_is_refused()
    {
        // the fixture's board is 50 x 36 mm: a margin of 18 mm on each side leaves nothing
        var err = RefusedProject.AssertRefused(RefusedProject.Write(n => n["board"]!["margin"] = 18), "$.board.margin", "leaves no room");
        Assert.Contains("less than 18 mm", err, StringComparison.Ordinal);
    }
}
