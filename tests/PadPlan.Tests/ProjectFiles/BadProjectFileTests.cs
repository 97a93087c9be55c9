using System.Text.Json.Nodes;
using PadPlan.IO;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.ProjectFiles;

/// <summary>Each bad file is refused with a message that names the place (JSON path and line) and what was expected.</summary>
public sealed class BadProjectFileTests
{
    private static readonly string Good = File.ReadAllText(TestPaths.TinyBuffer);

    private static InputException Refused(string json) =>
        Assert.Throws<InputException>(() => ProjectFile.Parse(System.Text.Encoding.UTF8.GetBytes(json), "bad.padplan.json"));

    private static string Edit(Action<JsonNode> change)
    {
        var node = JsonNode.Parse(Good)!;
        change(node);
        return node.ToJsonString(new System.Text.Json.JsonSerializerOptions { WriteIndented = true });
    }

    [Fact]
    public void Truncated_json_names_the_line()
    {
        var e = Refused(Good[..(Good.Length / 2)]);
        Assert.NotNull(e.Line);
        Assert.True(e.Line > 1);
        Assert.Contains("bad.padplan.json:", e.Describe());
    }

    [Fact]
    public void A_wrong_type_names_the_json_path_and_line()
    {
        var e = Refused(Edit(n => n["board"]!["width"] = "fifty"));
        Assert.Equal("$.board.width", e.JsonPath);
        Assert.NotNull(e.Line);
        Assert.Contains("expected a number", e.Message);
    }

    [Fact]
    public void An_unknown_version_is_refused_clearly()
    {
        var e = Refused(Edit(n => n["format"] = "padplan-project/9"));
        Assert.Equal("$.format", e.JsonPath);
        Assert.Contains("padplan-project/9", e.Message);
        Assert.Contains("padplan-project/1", e.Message);
        Assert.Equal(2, e.Line);
    }

    [Fact]
    public void A_missing_format_is_refused()
    {
        var e = Refused(Edit(n => n.AsObject().Remove("format")));
        Assert.Contains("format", e.Message);
    }

    [Fact]
    public void Duplicate_part_references_name_the_second_part()
    {
        var e = Refused(Edit(n => n["parts"]![4]!["ref"] = "C1"));
        Assert.Equal("$.parts[4].ref", e.JsonPath);
        Assert.Contains("C1", e.Message);
        Assert.NotNull(e.Line);
    }

    [Fact]
    public void A_lead_mapped_to_a_missing_net_is_refused()
    {
        var e = Refused(Edit(n => n["parts"]![3]!["pins"]!["2"] = "NOWHERE"));
        Assert.Equal("$.parts[3].pins.2", e.JsonPath);
        Assert.Contains("NOWHERE", e.Message);
    }

    [Fact]
    public void A_pad_of_zero_size_is_refused()
    {
        var e = Refused(Edit(n => n["layout"]!["pads"]![1]!["d"] = 0));
        Assert.Equal("$.layout.pads[1].d", e.JsonPath);
        Assert.Contains("more than 0", e.Message);
        Assert.NotNull(e.Line);
    }

    [Fact]
    public void A_landing_on_a_missing_pad_is_refused()
    {
        var e = Refused(Edit(n => n["layout"]!["placements"]![0]!["leads"]![0]!["pad"] = "P99"));
        Assert.Equal("$.layout.placements[0].leads[0].pad", e.JsonPath);
    }

    [Fact]
    public void An_unknown_property_is_refused_with_its_path()
    {
        var e = Refused(Edit(n => n["board"]!["widht"] = 10));
        Assert.Contains("widht", e.Message);
    }

    [Fact]
    public void A_bad_rotation_is_refused()
    {
        var e = Refused(Edit(n => n["layout"]!["placements"]![1]!["rotation"] = 45));
        Assert.Equal("$.layout.placements[1].rotation", e.JsonPath);
    }

    [Fact]
    public void Binary_garbage_is_refused_with_a_line()
    {
        var e = Assert.Throws<InputException>(() => ProjectFile.Parse([0x00, 0xff, 0x13, 0x37], "junk.bin"));
        Assert.Equal(1, e.Line);
    }
}
