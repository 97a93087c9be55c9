using System.Text.Json.Nodes;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Lvs;

/// <summary>
/// No command reaches ngspice through a deck that PadPlan writes (issue: command injection through export --spice).
/// Each vector puts a .control block with `shell touch MARKER` into one string field of a placed project that reaches
/// the exported deck. The outside oracle is ngspice itself (Debian package ngspice, `ngspice -b`): either the project
/// is refused on read (exit 2, naming the JSON path), or the deck is written and ngspice, run on it in its own folder,
/// creates no marker file. The positive control shows that the same payload in a raw deck does create the marker.
/// </summary>
public class DeckSafetyTests
{
    // A deck of our own with every kind of carried line: .param, .model, a .subckt block, an .include.
    private const string FixtureDeck = """
        deck safety fixture
        .param rval=2k
        .model DSMALL D(IS=1e-14)
        .include models.lib
        .subckt CELL p n
        R1 p n {rval}
        .ends CELL
        V1 a 0 3
        R1 a b 1k
        X1 b 0 CELL
        D1 b 0 DSMALL
        .op
        .end
        """;

    private static readonly Lazy<string> PlacedJson = new(() =>
    {
        var imported = ImportFixture.Import(FixtureDeck).Project;
        var placed = Placer.Place(imported, new PlacerSettings(Effort: Effort.Quick));
        Assert.True(placed.Succeeded, placed.Failure?.Message);
        return System.Text.Encoding.UTF8.GetString(ProjectFile.ToBytes(placed.Project!));
    });

    private static string Payload(string marker, string lineBreak = "\n") =>
        $"{lineBreak}.control{lineBreak}shell touch {marker}{lineBreak}.endc{lineBreak}";

    private static JsonNode Imported(JsonNode root) => root["imported"]!;

    private static JsonArray Deck(JsonNode root) => Imported(root)["deckLines"]!.AsArray();

    private static JsonNode Element(JsonNode root, string name) =>
        Imported(root)["elements"]!.AsArray().First(e => (string?)e!["name"] == name)!;

    private static JsonNode Part(JsonNode root, string reference) => root["parts"]!.AsArray().First(p => (string?)p!["ref"] == reference)!;

    /// <summary>Each vector: how it changes the project (given the marker path), and the JSON path it is refused at, or null when the deck is written.</summary>
    private static readonly Dictionary<string, (Action<JsonNode, string> Change, string? RefusedAt)> Vectors = new()
    {
        ["deckLines: a .control block"] = ((n, m) => { Deck(n).Add(".control"); Deck(n).Add($"shell touch {m}"); Deck(n).Add(".endc"); }, "$.imported.deckLines[6]"),
        ["deckLines: upper-case .CONTROL"] = ((n, m) => { Deck(n).Insert(0, ".CONTROL"); Deck(n).Insert(1, $"SHELL touch {m}"); Deck(n).Insert(2, ".ENDC"); }, "$.imported.deckLines[0]"),
        ["deckLines: a lone .endc"] = ((n, m) => Deck(n).Add(".endc"), "$.imported.deckLines[6]"),
        ["deckLines: line breaks in a .param line"] = ((n, m) => Deck(n)[0] = ".param rval=2k" + Payload(m), "$.imported.deckLines[0]"),
        ["deckLines: carriage returns in a .model line"] = ((n, m) => Deck(n)[1] = ".model DSMALL D(IS=1e-14)" + Payload(m, "\r"), "$.imported.deckLines[1]"),
        ["deckLines: line breaks in a subcircuit's inner line"] = ((n, m) => Deck(n)[4] = "R1 p n {rval}" + Payload(m), "$.imported.deckLines[4]"),
        ["deckLines: a .control block inside a subcircuit"] = ((n, m) => { Deck(n).Insert(4, ".control"); Deck(n).Insert(5, $"shell touch {m}"); Deck(n).Insert(6, ".endc"); }, "$.imported.deckLines[4]"),
        ["deckLines: shell as a top-level line"] = ((n, m) => Deck(n).Add($"shell touch {m}"), "$.imported.deckLines[6]"),
        ["deckLines: shell inside a subcircuit (an S element to SPICE)"] = ((n, m) => Deck(n).Insert(4, $"shell touch {m}"), null),
        ["deckLines: *ng_script"] = ((n, m) => Deck(n).Insert(0, "*ng_script"), "$.imported.deckLines[0]"),
        ["deckLines: another dot-command (.options)"] = ((n, m) => Deck(n).Add(".options noacct"), "$.imported.deckLines[6]"),
        ["deckLines: .include of an absolute path"] = ((n, m) => Deck(n)[2] = ".include /etc/hostname", "$.imported.deckLines[2]"),
        ["deckLines: .include out of the folder"] = ((n, m) => Deck(n)[2] = ".include ../models.lib", "$.imported.deckLines[2]"),
        ["deckLines: a form feed and a vertical tab"] = ((n, m) => Deck(n)[0] = $".param rval=2k\f.control\vshell touch {m}\f.endc", "$.imported.deckLines[0]"),
        ["element name"] = ((n, m) => Element(n, "R1")["name"] = "R1" + Payload(m) + "R9", "$.imported.elements[1].name"),
        ["element tail"] = ((n, m) => Element(n, "R1")["tail"] = "1k" + Payload(m), "$.imported.elements[1].tail"),
        ["element tail, carriage returns"] = ((n, m) => Element(n, "R1")["tail"] = "1k" + Payload(m, "\r"), "$.imported.elements[1].tail"),
        ["element tail, Unicode line separators"] = ((n, m) => Element(n, "R1")["tail"] = "1k" + Payload(m, "\u2028"), "$.imported.elements[1].tail"),
        ["element tail, next-line character"] = ((n, m) => Element(n, "R1")["tail"] = "1k" + Payload(m, "\u0085"), "$.imported.elements[1].tail"),
        ["element tail of a diode"] = ((n, m) => Element(n, "D1")["tail"] = "DSMALL" + Payload(m), "$.imported.elements[3].tail"),
        ["element node net (a node with no lead)"] = ((n, m) => Element(n, "D1")["nodes"]![1] = new JsonObject { ["net"] = "x" + Payload(m) }, "$.imported.elements[3].nodes[1].net"),
        ["element node pin"] = ((n, m) => Element(n, "D1")["nodes"]![1]!["pin"] = "K" + Payload(m), null),
        ["element part"] = ((n, m) => Element(n, "R1")["part"] = "R1" + Payload(m), null),
        ["project name"] = ((n, m) => n["name"] = "x" + Payload(m), null),
        ["project description"] = ((n, m) => n["description"] = "x" + Payload(m), null),
        ["project description *ng_script"] = ((n, m) => n["description"] = $"*ng_script{Payload(m)}", null),
        ["part value"] = ((n, m) => Part(n, "R1")["value"] = "1k" + Payload(m), null),
        ["summary line"] = ((n, m) => Imported(n)["summary"]!.AsArray().Add(new JsonObject { ["topic"] = "x", ["item"] = "y" + Payload(m), ["became"] = Payload(m) }), null),
    };

    public static TheoryData<string> VectorNames => new(Vectors.Keys.Order(StringComparer.Ordinal));

    [NgspiceTheory]
    [MemberData(nameof(VectorNames))]
    public void A_hostile_project_is_refused_or_exports_a_deck_that_runs_no_command(string vector)
    {
        var (change, refusedAt) = Vectors[vector];
        var dir = TestPaths.NewTempDir();
        var marker = Path.Combine(dir, "marker");
        var root = JsonNode.Parse(PlacedJson.Value)!;
        change(root, marker);
        var project = Path.Combine(dir, "p.padplan.json");
        File.WriteAllText(project, root.ToJsonString());
        // a hostile file beside the deck that the fixture's .include names: the deck must not run it either
        File.WriteAllText(Path.Combine(dir, "models.lib"), $"* models{Payload(marker)}");
        var deck = Path.Combine(dir, "out.cir");
        var result = CliRunner.Run("export", project, "--spice", deck);
        if (refusedAt is not null)
        {
            Assert.True(result.ExitCode == 2, $"exit {result.ExitCode}: {result.Err}");
            Assert.Contains(refusedAt, result.Err, StringComparison.Ordinal);
            Assert.False(File.Exists(deck), "a refused project must write no deck");
            return;
        }
        Assert.True(result.ExitCode == 0, $"exit {result.ExitCode}: {result.Err}");
        var lines = File.ReadAllLines(deck);
        Assert.DoesNotContain(lines, l => l.TrimStart().StartsWith(".control", StringComparison.OrdinalIgnoreCase) || l.TrimStart().StartsWith(".endc", StringComparison.OrdinalIgnoreCase));
        Ngspice.RunBatch(deck);
        Assert.False(File.Exists(marker), $"ngspice ran a command from the exported deck:\n{File.ReadAllText(deck)}");
    }

    [NgspiceFact]
    public void The_fixture_exports_a_deck_that_simulates_and_runs_no_command()
    {
        var dir = TestPaths.NewTempDir();
        var project = Path.Combine(dir, "p.padplan.json");
        File.WriteAllText(project, PlacedJson.Value);
        var marker = Path.Combine(dir, "marker");
        File.WriteAllText(Path.Combine(dir, "models.lib"), $"* models{Payload(marker)}");
        var deck = Path.Combine(dir, "out.cir");
        Assert.Equal(0, CliRunner.Run("export", project, "--spice", deck).ExitCode);
        var text = File.ReadAllText(deck);
        Assert.Contains("* not followed", text, StringComparison.Ordinal); // the .include is a comment
        Assert.Contains(".subckt CELL p n", text, StringComparison.Ordinal);
        var output = Ngspice.RunBatch(deck);
        Assert.False(File.Exists(marker), output);
        // and the deck still simulates: ngspice finds an operating point (node b: 3 V over 1k into 2k || diode)
        Assert.NotEmpty(Ngspice.OperatingPoint(text));
    }

    [NgspiceFact]
    public void Positive_control_the_payload_in_a_raw_deck_does_create_the_marker()
    {
        // Without this, a test that never sees a marker could pass because ngspice ignored the payload.
        var dir = TestPaths.NewTempDir();
        var marker = Path.Combine(dir, "marker");
        var deck = Path.Combine(dir, "raw.cir");
        File.WriteAllText(deck, $"raw deck\nR1 a 0 1k{Payload(marker)}.end\n");
        Ngspice.RunBatch(deck);
        Assert.True(File.Exists(marker), "ngspice did not run the shell command of a raw .control block; the marker test would prove nothing.");
    }
}

/// <summary>The deck model's own guards, for a program that adds to a deck before it runs it.</summary>
public class SpiceDeckModelTests
{
    [Fact]
    public void An_element_word_with_a_line_break_is_refused_by_the_model()
    {
        // the model is the last line of defence: whatever builds it, no word can carry a line of its own
        Assert.Throws<ArgumentException>(() => new PadPlan.Output.Spice.DeckElement("R1", ["a", "0"], ["1k\n.control"]));
        Assert.Throws<ArgumentException>(() => new PadPlan.Output.Spice.DeckElement(".control", ["a", "0"], ["1k"]));
        Assert.Throws<ArgumentException>(() => new PadPlan.Output.Spice.DeckElement("R1", ["a\rb", "0"], ["1k"]));
    }

    [Fact]
    public void Commands_are_the_operating_point_and_listed_options_only()
    {
        var deck = new PadPlan.Output.Spice.SpiceDeck("t", PadPlan.Model.ValueList<PadPlan.Output.Spice.DeckEntry>.Empty)
            .With(PadPlan.Output.Spice.DeckCommand.Option("rshunt", 1e12), PadPlan.Output.Spice.DeckCommand.OperatingPoint);
        Assert.Equal("padplan deck: t\n.options rshunt=1000000000000\n.op\n.end\n", deck.Text);
        Assert.Throws<ArgumentException>(() => PadPlan.Output.Spice.DeckCommand.Option("noacct\n.control", 1));
        Assert.Throws<ArgumentException>(() => PadPlan.Output.Spice.DeckCommand.Option("rshunt", double.NaN));
    }

    [Fact]
    public void A_comment_stays_one_line()
    {
        var deck = new PadPlan.Output.Spice.SpiceDeck("a\nb\u2028c", PadPlan.Model.ValueList.Of<PadPlan.Output.Spice.DeckEntry>(new PadPlan.Output.Spice.DeckComment("x\r\n.endc\u0085y")));
        Assert.Equal("padplan deck: a b c\n* x  .endc y\n.end\n", deck.Text);
    }
}
