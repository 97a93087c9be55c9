namespace PadPlan.Tests.Regressions;

/// <summary>Regression: "board.width: 1e308" overflowed in place and sheets while check passed it (exit 0); "board.width: 100000" ran place for minutes.</summary>
public sealed class Regression_HugeBoard
{
    [Theory]
    [InlineData(1e308)]
    [InlineData(100000)]
    [InlineData(1000)]
    public void A_board_a_metre_or_wider_is_refused_by_every_command_including_check(double width) =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["board"]!["width"] = width), "$.board.width", "more than 0 and less than 1000 mm");
}
