using System.Text.Json;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Rules;

public class CheckCommandTests
{
    [Fact]
    public void Valid_plan_exits_0()
    {
        var r = CliRunner.Run("check", TestPaths.TinyBuffer);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("passed", r.Out);
    }

    [Fact]
    public void Errors_exit_1_and_json_names_rule_location_items_and_hint()
    {
        var dir = TestPaths.NewTempDir();
        var text = File.ReadAllText(TestPaths.TinyBuffer);
        // Push P5 (x 43) past the right margin of the 50 mm board.
        var faulty = Path.Combine(dir, "faulty.padplan.json");
        File.WriteAllText(faulty, text.Replace("\"x\": 43,", "\"x\": 47.5,"));
        var json = Path.Combine(dir, "report.json");
        var r = CliRunner.Run("check", faulty, "--json", json);
        Assert.Equal(1, r.ExitCode);
        Assert.Contains("Errors", r.Out);
        var root = JsonDocument.Parse(File.ReadAllBytes(json)).RootElement;
        Assert.Equal("padplan-check/1", root.GetProperty("format").GetString());
        Assert.False(root.GetProperty("passed").GetBoolean());
        var margin = root.GetProperty("findings").EnumerateArray().First(f => f.GetProperty("rule").GetString() == "board-margin");
        Assert.Equal("error", margin.GetProperty("severity").GetString());
        Assert.Equal(47.5, margin.GetProperty("location")[0].GetDouble());
        Assert.Contains("P5", margin.GetProperty("items").EnumerateArray().Select(i => i.GetString()));
        Assert.False(string.IsNullOrWhiteSpace(margin.GetProperty("hint").GetString()));
    }

    [Fact]
    public void Warnings_fail_only_when_strict()
    {
        var dir = TestPaths.NewTempDir();
        var text = File.ReadAllText(TestPaths.TinyBuffer);
        // An extra pad nobody lands on: a warning (pad-unused), not an error.
        var extra = text.Replace("\"pads\": [", "\"pads\": [\n      { \"id\": \"P9\", \"shape\": \"round\", \"x\": 40, \"y\": 30, \"d\": 3.18 },");
        var file = Path.Combine(dir, "extra.padplan.json");
        File.WriteAllText(file, extra);
        Assert.Equal(0, CliRunner.Run("check", file).ExitCode);
        var strict = CliRunner.Run("check", file, "--strict");
        Assert.Equal(1, strict.ExitCode);
        Assert.Contains("pad-unused", strict.Out);
    }

    [Fact]
    public void Export_writes_geometry_and_refuses_without_a_target()
    {
        var dir = TestPaths.NewTempDir();
        var target = Path.Combine(dir, "tiny.geometry.json");
        var r = CliRunner.Run("export", TestPaths.TinyBuffer, "--geometry", target);
        Assert.Equal(0, r.ExitCode);
        Assert.Equal("padplan-geometry/1", JsonDocument.Parse(File.ReadAllBytes(target)).RootElement.GetProperty("format").GetString());
        Assert.Equal(2, CliRunner.Run("export", TestPaths.TinyBuffer).ExitCode);
    }

    [Fact]
    public void Rf_parasitics_on_request()
    {
        var r = CliRunner.Run("check", TestPaths.TinyBuffer, "--parasitics");
        Assert.Contains("Parasitic estimates", r.Out);
        // P2 (BASE) is a 6.35 mm disc on 1.6 mm FR-4 (er 4.7): parallel plate 8.854e-3 * 4.7 * 31.67 / 1.6 = 0.82 pF.
        Assert.Contains("BASE (general): 1 pad, 0.82 pF", r.Out);
    }
}
