using System.Text.Json.Nodes;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): every footprint body at ±500 mm (inside the limits) made `sheets` take 9 GB and 234 s and
/// `place --effort quick` 6.4 GB and 544 s, because the label grid and the annealer's neighbour grid were sized by the
/// numbers in the file. Grids are now sized by what is drawn: a zone or item too large for a few cells goes on a list
/// that every search reads. The fuzz harness bounds the time and memory of these runs (tests/PadPlan.Fuzz, EdgeCases).
/// </summary>
public sealed class Regression_HugeBodies
{
    [Fact]
    public void A_metre_wide_obstacle_is_not_filed_under_thousands_of_label_cells()
    {
        var placer = new LabelPlacer(new Box(-2000, -2000, 2000, 2000));
        placer.Block(new Box(-500, -500, 500, 500));
        placer.Block(new Box(10, 10, 12, 12));
        Assert.True(placer.FiledCells <= 4, $"{placer.FiledCells} cells"); // 1000 mm / 6 mm cells would be 28,000
        // the wide obstacle still counts: a label over it is not free
        var placed = placer.Place(new LabelPlacer.Request("X", LabelTarget.Other, "X", new BoxZone(new Box(100, 100, 101, 101)), 3, 2));
        Assert.False(placed.Resolved);
    }

    [Theory]
    [InlineData("sheets")]
    [InlineData("place")]
    [InlineData("check")]
    public void Every_body_at_the_limit_finishes_without_an_internal_error(string command)
    {
        var file = RefusedProject.Write(project =>
        {
            foreach (var footprint in project["footprints"]!.AsArray())
                footprint!["body"] = JsonNode.Parse("[[-500,-500],[500,-500],[500,500],[-500,500]]");
        });
        var args = command switch
        {
            "sheets" => new[] { "sheets", file, "-o", TestPaths.NewTempDir(), "--formats", "svg", "--date", "2025-01-01" },
            "place" => ["place", file, "--force", "--effort", "quick", "-q"],
            _ => ["check", file],
        };
        var result = CliRunner.Run(args);
        Assert.True(result.ExitCode is 0 or 1 or 2, $"{command} exited {result.ExitCode}: {result.Err}");
    }
}
