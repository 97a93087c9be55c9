using System.Text.Json.Nodes;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression: imported.deckLines entries, and line breaks inside an element's name or tail, were written raw into the
/// exported deck, so a project file could carry .control / shell / .endc and `ngspice -b` ran it (3 of 9 vectors made a
/// marker file). Every vector is run through ngspice in Lvs/DeckSafetyTests; these checks need no simulator: the
/// project is refused on read, naming the JSON path, by every command, and the file is left as it was.
/// </summary>
public sealed class Regression_DeckInjection
{
    [Fact]
    public void A_control_block_in_deck_lines_is_refused_on_read() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["deckLines"] = new JsonArray(".model D1 D", ".control", "shell touch /tmp/padplan-marker", ".endc"),
        }), "$.imported.deckLines[1]", ".control");

    [Fact]
    public void A_line_break_in_an_element_tail_is_refused_on_read() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["elements"] = new JsonArray(new JsonObject { ["name"] = "R1", ["tail"] = "1k\n.control\nshell touch /tmp/padplan-marker\n.endc" }),
        }), "$.imported.elements[0].tail", "line break");

    [Fact]
    public void A_line_break_in_an_element_name_is_refused_on_read() =>
        RefusedProject.AssertRefused(RefusedProject.Write(n => n["imported"] = new JsonObject
        {
            ["elements"] = new JsonArray(new JsonObject { ["name"] = "R1\n.endc", ["tail"] = "1k" }),
        }), "$.imported.elements[0].name");

    [Theory]
    [InlineData("R1 a 0 1k\f.control", "ctl.cir:4:")] // a form feed ends the line, and the .control block is never closed
    [InlineData("R1 a 0 1k\u2028.control", "ctl.cir:4:")] // so does a Unicode line separator
    [InlineData("R1 a \u00b5x 1k", "U+00B5")] // a character no SPICE word holds (write u for micro)
    public void A_line_break_or_foreign_character_in_an_imported_element_line_exits_2_naming_the_line(string line, string says)
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "ctl.cir");
        File.WriteAllText(deck, $"control characters\nV1 a 0 1\n{line}\nR2 a 0 1k\n.end\n");
        var result = CliRunner.Run("import", deck, "-o", Path.Combine(dir, "c.padplan.json"));
        Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
        Assert.Contains(says, result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void An_imported_control_block_is_not_carried()
    {
        var dir = TestPaths.NewTempDir();
        var deck = Path.Combine(dir, "ctl.cir");
        var project = Path.Combine(dir, "c.padplan.json");
        File.WriteAllText(deck, "a deck with its own control block\nV1 a 0 1\nR1 a 0 1k\n.control\nshell touch /tmp/padplan-marker\n.endc\n.options noacct\n.end\n");
        var result = CliRunner.Run("import", deck, "-o", project);
        Assert.True(result.ExitCode == 0, result.Err);
        var saved = File.ReadAllText(project);
        Assert.DoesNotContain("shell", saved, StringComparison.Ordinal);
        Assert.DoesNotContain(".control", saved, StringComparison.Ordinal);
        Assert.DoesNotContain(".options", saved, StringComparison.Ordinal);
    }
}
