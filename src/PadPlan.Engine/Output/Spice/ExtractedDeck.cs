using PadPlan.Model;
using PadPlan.Model.Spice;
using PadPlan.Model.Values;
using PadPlan.Rules.Extraction;

namespace PadPlan.Output.Spice;

/// <summary>
/// The circuit a placed layout builds, as a SPICE deck (padplan export --spice, and the deck a simulation runs): each
/// element of the imported deck with its nodes taken from the geometry (the pad its lead lands in, "0" for the plane),
/// the project's current value for resistors, capacitors and inductors (a plain SPICE number), its other words as
/// parsed, sources put back at their landings, and the deck's carried lines (.model, .subckt blocks, .param; .include
/// and .lib as comments). Built from the parsed model only: see <see cref="SpiceDeck"/>.
/// </summary>
public static class ExtractedDeck
{
    /// <summary>Prefix of nodes that exist only in the simulation (thermal nodes, a left-off thermal network).</summary>
    public const string SimulationOnly = "sim_";

    /// <summary>The deck as text (what export --spice writes).</summary>
    public static string Write(Project project) => Build(project).Text;

    /// <summary>The first bytes of a file are a deck PadPlan wrote: its title line.</summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) => head.StartsWith(System.Text.Encoding.UTF8.GetBytes(PadPlan.Model.Spice.SpiceDeck.TitlePrefix));

    /// <summary>The deck as a model: every line parsed and checked, in the order it is written.</summary>
    public static SpiceDeck Build(Project project)
    {
        var nets = LayoutNets.Of(project);
        var record = project.Imported ?? ImportRecord.Empty;
        var parts = project.Parts.ToDictionary(p => p.Ref, StringComparer.Ordinal);
        var entries = new List<DeckEntry>
        {
            new DeckComment($"extracted by padplan export --spice from the layout of {project.Name}"),
            new DeckComment("nodes are named after the first pad of each connected piece of copper; 0 is the ground plane"),
        };
        entries.AddRange(record.DeckLines.Select(l => new DeckCarried(l)));
        var written = new HashSet<string>(StringComparer.Ordinal);
        foreach (var element in record.Elements)
        {
            if (element.Ref is not null) written.Add(element.Ref);
            entries.AddRange(ElementEntries(element, nets, element.Ref is null ? null : parts.GetValueOrDefault(element.Ref)));
        }
        foreach (var part in project.Parts.Where(p => !written.Contains(p.Ref)))
            entries.Add(FromPart(project, part, nets));
        var title = string.IsNullOrWhiteSpace(project.Description) ? project.Name : project.Description;
        return new SpiceDeck(title, entries.ToValueList());
    }

    private static IEnumerable<DeckEntry> ElementEntries(SpiceElement e, LayoutNets nets, Part? part)
    {
        var words = ElementWords.Words(e.Tail);
        var letter = char.ToUpperInvariant(e.Name[0]);
        if (e.Ref is null && e.Nodes.Count == 0)
        {
            // a K line couples windings the board builds as one transformer: it stays, from its words
            if (letter == 'K') yield return new DeckElement(e.Name, [], words);
            else yield return new DeckComment($"left off the board: {e.Name} {e.Tail}");
            yield break;
        }
        // a 0 V probe's two nodes were joined into one net; a source left off with its network keeps two
        if (e.Ref is null && letter is 'V' or 'I' && e.Nodes.Select(n => n.Net).Distinct(StringComparer.Ordinal).Count() == 1)
        {
            yield return new DeckComment($"a wire on the board (nodes joined): {e.Name} {string.Join(" ", e.Nodes.Select(n => n.Net))} {e.Tail}");
            yield break;
        }
        var nodes = e.Nodes.Select(n => e.Ref is not null && n.Pin is not null ? nets.NodeOf(e.Ref, n.Pin) : OffBoard(n.Net));
        if (e.Ref is null) yield return new DeckComment("simulation only, not on the board:");
        yield return new DeckElement(e.Name, nodes, ElementWords.Of(e, part));
    }

    private static string Plain(double number) => SpiceText.Number(number);

    private static string OffBoard(string net) => PadPlan.Import.NetNames.IsGround(net) ? LayoutNets.Plane : SimulationOnly + net;

    // A part with no element line (an own-format netlist): R, C and L by their values; others as a comment naming their leads.
    private static DeckEntry FromPart(Project project, Part part, LayoutNets nets)
    {
        var letter = char.ToUpperInvariant(part.Ref[0]);
        return letter is 'R' or 'C' or 'L' && part.Pins.Count == 2 && SpiceText.IsElementName(part.Ref) && ComponentValue.TryParse(part.Value, ValueSyntax.SI, out var value, out _) && value.Number > 0
            ? new DeckElement(part.Ref, part.Pins.Select(p => nets.NodeOf(part.Ref, p.Pin)), [Plain(value.Number)])
            : new DeckComment($"no SPICE line known for {part.Ref} ({part.Value}, {project.FootprintOf(part).Name}), leads {string.Join(" ", part.Pins.Select(p => $"{p.Pin}={nets.NodeOf(part.Ref, p.Pin)}"))}");
    }
}
