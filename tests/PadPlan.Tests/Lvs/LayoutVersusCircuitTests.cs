using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Lvs;

// The outside oracle is ngspice (Debian package ngspice, batch mode): the operating point of the user's deck against
// that of the deck `padplan export --spice` extracts from the placed layout, 1e-6 relative or 1 µV absolute.
public class LayoutVersusCircuitTests
{
    private static readonly PlacerSettings Quick = new(Effort: Effort.Quick);

    public static TheoryData<string> CorpusDecks => new(SpiceCorpus.Buildable);

    public static TheoryData<string> ExampleDecks => new(Directory.GetDirectories(TestPaths.Examples)
        .SelectMany(d => Directory.GetFiles(d, "*.cir")).Select(f => Path.GetRelativePath(TestPaths.Examples, f)).Order(StringComparer.Ordinal));

    private static Project Placed(string netlist, PartsMap? map = null)
    {
        var imported = NetlistImporter.ImportFile(netlist, new ImportOptions(ImportFixture.Library, map)).Project;
        var result = Placer.Place(imported, Quick);
        Assert.True(result.Succeeded, result.Failure?.Message);
        return result.Project!;
    }

    [NgspiceTheory]
    [MemberData(nameof(CorpusDecks))]
    public void Every_corpus_deck_simulates_the_same_from_its_layout(string deck)
    {
        var problems = LayoutVersusCircuit.Compare(File.ReadAllText(SpiceCorpus.PathOf(deck)), Placed(SpiceCorpus.PathOf(deck)));
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    [NgspiceTheory]
    [MemberData(nameof(ExampleDecks))]
    public void Every_example_deck_simulates_the_same_from_its_layout(string example)
    {
        var path = Path.Combine(TestPaths.Examples, example);
        var partsFile = Path.Combine(Path.GetDirectoryName(path)!, "parts.json");
        var map = File.Exists(partsFile) ? PartsMap.Read(partsFile, ImportFixture.Library) : null;
        var problems = LayoutVersusCircuit.Compare(File.ReadAllText(path), Placed(path, map));
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    [NgspiceFact]
    public void A_lead_moved_to_a_wrong_pad_makes_the_comparison_fail()
    {
        // V1 vcc 0 12, R1 vcc mid 3.3k, R2 mid 0 6.8k: R2's lead on mid moved to the pad of vcc
        var path = SpiceCorpus.PathOf("src-dc-bare");
        var placed = Placed(path);
        var faulty = MoveLead(placed, "R2", "R1");
        Assert.Empty(LayoutVersusCircuit.Compare(File.ReadAllText(path), placed));
        var problems = LayoutVersusCircuit.Compare(File.ReadAllText(path), faulty);
        Assert.Contains(problems, p => p.StartsWith("R2 lead", StringComparison.Ordinal) || p.StartsWith("R1 lead", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("V1 current", StringComparison.Ordinal));
    }

    [NgspiceFact]
    public void A_lead_moved_in_a_transistor_stage_makes_the_comparison_fail()
    {
        var path = SpiceCorpus.PathOf("dev-bjt-substrate");
        var placed = Placed(path);
        Assert.NotEmpty(LayoutVersusCircuit.Compare(File.ReadAllText(path), MoveLead(placed, "R4", "R3")));
    }

    [NgspiceFact]
    public void A_thermal_network_on_a_driven_ambient_stays_off_the_board_and_joined_in_the_export()
    {
        // MQ1's case node tc feeds a case-to-air network (R and C only) held at 40 (degrees C, as volts) by VTamb:
        // neither the network nor the ambient source is built, and the extracted deck joins the network to MQ1's
        // thermal nodes again, so ngspice finds the same junction temperature in both decks.
        var path = SpiceCorpus.PathOf("dev-mos-thermal-ambient");
        var placed = Placed(path);
        Assert.DoesNotContain(placed.Parts, p => p.Ref.Contains("ca", StringComparison.OrdinalIgnoreCase) || p.Value.Contains("VTamb", StringComparison.Ordinal));
        Assert.DoesNotContain(placed.Nets, n => n.Name is "tamb" or "tc" or "tj");
        var original = Ngspice.OperatingPoint(File.ReadAllText(path));
        var extracted = Ngspice.OperatingPoint(PadPlan.Output.Spice.ExtractedDeck.Write(placed));
        var (deck, layout) = (original["tj"], extracted[PadPlan.Output.Spice.ExtractedDeck.SimulationOnly + "tj"]);
        // the part heats well above the ambient, or the comparison would prove nothing
        Assert.True(deck > 45, $"junction at {deck} C");
        Assert.Equal(deck, layout, 6);
        Assert.Equal(40, extracted[PadPlan.Output.Spice.ExtractedDeck.SimulationOnly + "tamb"], 9);
        Assert.Empty(LayoutVersusCircuit.Compare(File.ReadAllText(path), placed));
    }

    [NgspiceFact]
    public void A_value_changed_in_the_placed_project_moves_the_extracted_operating_point()
    {
        // V1 vcc 0 12, R1 vcc mid 3.3k, R2 mid 0 6.8k; then R2 is changed to 1k in the placed project (as a builder
        // would after import). Voltage divider (Ohm's law): Vmid = 12 x R2 / (R1 + R2) = 12 x 6.8 / 10.1 = 8.0792 V
        // before, 12 x 1 / 4.3 = 2.7907 V after. ngspice is the oracle for both decks.
        var path = SpiceCorpus.PathOf("src-dc-bare");
        var placed = Placed(path);
        var changed = placed with { Parts = placed.Parts.Select(p => p.Ref != "R2" ? p : new Part(p.Ref, "1k", p.Footprint, p.Pins, p.Variant, p.Locked, p.FootprintAssumed)).ToValueList() };
        var nets = PadPlan.Rules.Extraction.LayoutNets.Of(changed);
        var mid = nets.NodeOf("R2", placed.Imported!.Elements.Single(e => e.Name == "R2").Nodes.First(n => n.Net == "mid").Pin!).ToLowerInvariant();
        var original = Ngspice.OperatingPoint(File.ReadAllText(path));
        var extracted = Ngspice.OperatingPoint(PadPlan.Output.Spice.ExtractedDeck.Write(changed));
        Assert.Equal(12 * 6.8 / 10.1, original["mid"], 4);
        Assert.Equal(12 * 1.0 / 4.3, extracted[mid], 4); // follows the project's value
        Assert.True(Math.Abs(extracted[mid] - original["mid"]) > 1, "the extracted operating point must differ from the original deck's");
        // and the comparison that proves the layout reports the changed value as a difference
        Assert.Contains(LayoutVersusCircuit.Compare(File.ReadAllText(path), changed), p => p.StartsWith("R2 lead", StringComparison.Ordinal));
        Assert.Empty(LayoutVersusCircuit.Compare(File.ReadAllText(path), placed));
    }

    [NgspiceFact]
    public void A_value_changed_in_the_project_file_reaches_the_exported_deck()
    {
        // The same change made in the project file and exported through the command line: the deck says 1000, not 6.8k.
        var placed = Placed(SpiceCorpus.PathOf("src-dc-bare"));
        var dir = TestPaths.NewTempDir();
        var file = Path.Combine(dir, "p.padplan.json");
        var json = System.Text.Json.Nodes.JsonNode.Parse(PadPlan.ProjectFiles.ProjectFile.ToBytes(placed))!;
        json["parts"]!.AsArray().First(p => (string?)p!["ref"] == "R2")!["value"] = "1k";
        File.WriteAllText(file, json.ToJsonString());
        var deck = Path.Combine(dir, "out.cir");
        Assert.Equal(0, Cli.CliRunner.Run("export", file, "--spice", deck).ExitCode);
        var r2 = File.ReadAllLines(deck).Single(l => l.StartsWith("R2 ", StringComparison.Ordinal));
        Assert.EndsWith(" 1000", r2, StringComparison.Ordinal);
        var op = Ngspice.OperatingPoint(File.ReadAllText(deck));
        Assert.Contains(op.Values, v => Math.Abs(v - 12 * 1.0 / 4.3) < 1e-4); // divider formula, as above
    }

    // Moves the first pad-landed lead of one part onto the pad that the first pad-landed lead of another part uses.
    private static Project MoveLead(Project placed, string reference, string onto)
    {
        var layout = placed.Layout!;
        var target = layout.Placements.Single(p => p.Ref == onto).Leads.First(l => l.Pad is not null);
        var island = layout.Islands().Single(i => i.Id == target.Pad);
        var placements = layout.Placements.Select(p => p.Ref != reference ? p : p with
        {
            Leads = p.Leads.Select((l, i) => i == p.Leads.ToList().FindIndex(x => x.Pad is not null) ? new LeadLanding(l.Pin, island.Id, island.Center) : l).ToValueList(),
        }).ToValueList();
        return placed with { Layout = layout with { Placements = placements } };
    }
}
