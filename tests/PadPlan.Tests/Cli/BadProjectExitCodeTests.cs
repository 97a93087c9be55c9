using System.Text.Json.Nodes;

namespace PadPlan.Tests.Cli;

/// <summary>Every kind of bad project file named in the foundation issue exits 2 from the command line, names the place, and leaves the file as it was.</summary>
public sealed class BadProjectExitCodeTests
{
    private static readonly string Good = File.ReadAllText(TestPaths.TinyBuffer);

    private static string Edited(Action<JsonNode> change)
    {
        var node = JsonNode.Parse(Good)!;
        change(node);
        return node.ToJsonString(new System.Text.Json.JsonSerializerOptions { WriteIndented = true });
    }

    public static TheoryData<string, string, string> BadFiles => new()
    {
        { "truncated JSON", Good[..(Good.Length / 3)], ".padplan.json:" },
        { "wrong type", Edited(n => n["board"]!["height"] = true), "$.board.height" },
        { "unknown version", Edited(n => n["format"] = "padplan-project/2"), "$.format" },
        { "duplicate part reference", Edited(n => n["parts"]![5]!["ref"] = "R1"), "$.parts[5].ref" },
        { "lead mapped to a missing net", Edited(n => n["parts"]![0]!["pins"]!["1"] = "NOWHERE"), "$.parts[0].pins.1" },
        { "pad of zero size", Edited(n => n["layout"]!["pads"]![0]!["d"] = 0), "$.layout.pads[0]" },
    };

    [Theory]
    [MemberData(nameof(BadFiles))]
    public void A_bad_project_exits_2_names_the_place_and_is_left_unchanged(string what, string text, string place)
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "bad.padplan.json");
        File.WriteAllText(file, text);
        var before = File.ReadAllBytes(file);
        foreach (var command in new[] { "check", "place", "bom" })
        {
            var result = CliRunner.Run(command, file);
            Assert.True(result.ExitCode == 2, $"{what}: {command} exited {result.ExitCode}: {result.Err}");
            Assert.Contains(place, result.Err);
            Assert.Equal(before, File.ReadAllBytes(file));
        }
    }
}
