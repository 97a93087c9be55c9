namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a 5 MB token was echoed whole in the error message; a 10,000-character part value ran sheets for 40 minutes.</summary>
public sealed class Regression_HugeTokenEcho
{
    [Fact]
    public void A_five_megabyte_footprint_name_is_refused_without_echoing_it()
    {
        var err = RefusedProject.AssertRefused(RefusedProject.Write(n => n["parts"]![0]!["footprint"] = new string('x', 5 * 1024 * 1024)),
            "$.parts[0].footprint", "at most 100 are allowed");
        Assert.True(err.Length < 1000, $"the message is {err.Length} characters long");
    }

    [Fact]
    public void A_five_megabyte_number_is_refused_and_shortened()
    {
        var node = System.Text.Json.Nodes.JsonNode.Parse(File.ReadAllText(TestPaths.TinyBuffer))!;
        node["board"]!["margin"] = 12345.678;
        var file = RefusedProject.WriteText(node.ToJsonString().Replace("12345.678", "1" + new string('0', 5 * 1024 * 1024), StringComparison.Ordinal));
        var err = RefusedProject.AssertRefused(file, "$.board.margin", "from 0 to 100 mm");
        Assert.True(err.Length < 1000, $"the message is {err.Length} characters long");
    }

    [Fact]
    public void A_ten_thousand_character_part_value_is_refused_before_any_work() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["parts"]![0]!["value"] = new string('9', 10_000)), "$.parts[0].value", "at most 200 are allowed");
}
