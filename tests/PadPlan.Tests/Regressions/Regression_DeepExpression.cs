using System.Text.Json.Nodes;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression: the SPICE expression reader recursed once per parenthesis and per unary sign, so 7,418 nested
/// parentheses in one {...} (a 15 KB line) or 47,732 unary minus signs overflowed the stack (SIGABRT, exit 134) and
/// left the .lock file behind. Now a line past the depth limits (docs/limits.md) is refused with exit 2 naming the line,
/// at import and in a project file's deck text (the line-length limits of docs/limits.md refuse lines over 2,000 characters first, so the depth checks are tested with lines under that). The 100,000-deep cases must finish (exit 2), not crash; no timing is asserted.
/// </summary>
public sealed class Regression_DeepExpression
{
    private static CliRunner.Result Import(string line)
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "deep.cir");
        File.WriteAllText(deck, $"deep expressions\nV1 a 0 1\n{line}\n.end\n");
        return CliRunner.Run("import", deck, "-o", Path.Combine(dir, "deep.padplan.json"));
    }

    [Fact]
    public void One_hundred_thousand_parentheses_in_a_value_exit_2_naming_the_line()
    {
        // the netlist line-length limit (docs/limits.md) refuses this one first; the point is exit 2, not a crash
        var result = Import($"R1 a 0 {{{new string('(', 100_000)}1{new string(')', 100_000)}}}");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("deep.cir:3:", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Parentheses_past_the_depth_limit_within_the_line_length_exit_2_naming_the_line()
    {
        var result = Import($"R1 a 0 {{{new string('(', 500)}1{new string(')', 500)}}}");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("deep.cir:3:", result.Err, StringComparison.Ordinal);
        Assert.Contains("64 deep", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void One_hundred_thousand_parentheses_in_a_param_line_exit_2()
    {
        var result = Import($".param big={{{new string('(', 100_000)}1{new string(')', 100_000)}}}");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("deep.cir:3:", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Fifty_thousand_unary_minus_signs_exit_2_naming_the_line()
    {
        var result = Import($"R1 a 0 {{{new string('-', 50_000)}1}}");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("deep.cir:3:", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Signs_past_the_limit_within_the_line_length_exit_2_naming_the_line()
    {
        var result = Import($"R1 a 0 {{{new string('-', 1_000)}1}}");
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains("deep.cir:3:", result.Err, StringComparison.Ordinal);
        Assert.Contains("signs", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Spaced_unary_signs_count_too()
    {
        var result = Import($"R1 a 0 {{{string.Concat(Enumerable.Repeat("- ", 1_000))}1}}");
        Assert.Equal(2, result.ExitCode);
    }

    [Fact]
    public void An_expression_within_the_limits_still_imports()
    {
        // 60 levels and 60 signs: inside the limits of 64; -(...) of 1 with an even count of minus signs is 1 ohm
        var result = Import($"R1 a 0 {{{new string('(', 60)}{new string('-', 60)}1{new string(')', 60)}}}");
        Assert.True(result.ExitCode == 0, result.Err);
    }

    [Fact]
    public void A_deep_expression_in_a_project_tail_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["elements"] = new JsonArray(new JsonObject { ["name"] = "R1", ["tail"] = $"{{{new string('(', 500)}1{new string(')', 500)}}}" }),
        }), "$.imported.elements[0].tail", "deep");

    [Fact]
    public void A_deep_expression_in_a_project_deck_line_is_refused_with_its_path() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["deckLines"] = new JsonArray($".param x={{{new string('-', 1_000)}1}}"),
        }), "$.imported.deckLines[0]", "signs");
}
