namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a body coordinate of 1e308 or 99999999999999999999 crashed the placer (IndexOutOfRange, exit 3); 2147483648 made it grow to 14 GB.</summary>
public sealed class Regression_HugeCoordinates
{
    [Theory]
    [InlineData("1e308")]
    [InlineData("99999999999999999999")]
    [InlineData("2147483648")]
    [InlineData("-2147483649")]
    [InlineData("500.001")]
    public void A_body_coordinate_outside_half_a_metre_is_refused(string number)
    {
        var text = File.ReadAllText(TestPaths.TinyBuffer);
        var node = System.Text.Json.Nodes.JsonNode.Parse(text)!;
        node["footprints"]![0]!["body"]![0]![0] = 12345.678;
        var file = RefusedProject.WriteText(node.ToJsonString().Replace("12345.678", number, StringComparison.Ordinal));
        RefusedProject.AssertRefused(file, "$.footprints[0].body[0][0]", "from -500 to 500 mm");
    }

    [Fact]
    public void A_pad_far_off_the_board_is_refused() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["layout"]!["pads"]![0]!["x"] = 2000.5), "$.layout.pads[0].x", "from -2000 to 2000 mm");
}
