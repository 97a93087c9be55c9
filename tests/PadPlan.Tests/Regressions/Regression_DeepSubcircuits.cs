using System.Text;
using System.Text.Json.Nodes;
using PadPlan.Model.Spice;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: .subckt definitions, and the calls between them, could nest without bound (a simulator expanding them does exponential work, or never ends on a subcircuit that calls itself). Past the nesting limit (docs/limits.md), import and the project reader exit 2 naming the line or JSON path.</summary>
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

    private static CliRunner.Result Import(string body)
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "calls.cir");
        File.WriteAllText(deck, "subcircuit calls\n" + body + "V1 a 0 1\nR1 a 0 1k\n.end\n");
        return CliRunner.Run("import", deck, "-o", Path.Combine(dir, "c.padplan.json"));
    }

    [Fact]
    public void A_subcircuit_that_calls_itself_exits_2_naming_its_line()
    {
        var result = Import(".subckt LOOP a b\nR1 a b 1k\nX1 a b LOOP\n.ends\n");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("calls.cir:2:", result.Err, StringComparison.Ordinal);
        Assert.Contains("calls itself", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_chain_of_calls_past_the_limit_exits_2()
    {
        var body = new StringBuilder();
        for (var i = 0; i < 40; i++) body.Append($".subckt C{i} a b\nR1 a b 1k\n{(i < 39 ? $"X1 a b C{i + 1}\n" : "")}.ends\n");
        var result = Import(body.ToString());
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("nest more than", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Calls_that_multiply_past_the_element_limit_exit_2()
    {
        // seven levels, six of them calling the next ten times: 10^6 resistors once expanded
        var body = new StringBuilder();
        for (var i = 0; i < 7; i++)
        {
            body.Append($".subckt F{i} a b\n");
            body.Append(i < 6 ? string.Concat(Enumerable.Range(0, 10).Select(k => $"X{k} a b F{i + 1}\n")) : "R1 a b 1k\n");
            body.Append(".ends\n");
        }
        var result = Import(body.ToString());
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("100,000 elements", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_self_call_in_a_project_file_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["deckLines"] = new JsonArray(".model D1 D", ".subckt LOOP a b", "X1 a b LOOP", ".ends"),
        }), "$.imported.deckLines[1]", "calls itself");
}
