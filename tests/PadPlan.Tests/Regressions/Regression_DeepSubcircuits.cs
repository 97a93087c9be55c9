using System.Text;
using System.Text.Json.Nodes;
using PadPlan.Model.Spice;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: .subckt definitions could nest without bound. Past the nesting limit (docs/limits.md), import and the project reader exit 2 naming the line or JSON path.</summary>
public sealed class Regression_DeepSubcircuits
{
    private static string Nested(int depth)
    {
        var text = new StringBuilder();
        for (var i = 0; i < depth; i++) text.Append($".subckt S{i} a b\n");
        text.Append("R1 a b 1k\n");
        for (var i = depth - 1; i >= 0; i--) text.Append($".ends S{i}\n");
        return text.ToString();
    }

    [Fact]
    public void Nesting_past_the_limit_exits_2_naming_the_line()
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "nested.cir");
        File.WriteAllText(deck, "nested subcircuits\n" + Nested(10_000) + "V1 a 0 1\nR1 a 0 1k\n.end\n");
        var result = CliRunner.Run("import", deck, "-o", Path.Combine(dir, "n.padplan.json"));
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        // the 17th .subckt line is line 18 (the title is line 1)
        Assert.Contains($"nested.cir:{SpiceText.MaxSubcircuitNesting + 2}:", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Nesting_at_the_limit_imports()
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "nested.cir");
        File.WriteAllText(deck, "nested subcircuits\n" + Nested(SpiceText.MaxSubcircuitNesting) + "V1 a 0 1\nR1 a 0 1k\n.end\n");
        var result = CliRunner.Run("import", deck, "-o", Path.Combine(dir, "n.padplan.json"));
        Assert.True(result.ExitCode == 0, result.Err);
    }

    [Fact]
    public void Nesting_past_the_limit_in_a_project_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["deckLines"] = new JsonArray([.. Nested(100).Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => (JsonNode)JsonValue.Create(l)!)]),
        }), $"$.imported.deckLines[{SpiceText.MaxSubcircuitNesting}]", "nest");
}
