using System.Globalization;
using System.Text;
using PadPlan.Model.Values;
using PadPlan.Model;
using PadPlan.Rules.Extraction;

namespace PadPlan.Output.Spice;

/// <summary>
/// Writes the circuit a placed layout builds as a SPICE deck: each element of the imported deck with its nodes taken
/// from the geometry (the pad its lead lands in, "0" for the plane), its value and options as written, sources put
/// back at their landings, and the deck's .model, .subckt, .param and .include lines carried over, so it simulates.
/// </summary>
public static class ExtractedDeck
{
    /// <summary>Prefix of nodes that exist only in the simulation (thermal nodes, a left-off thermal network).</summary>
    public const string SimulationOnly = "sim_";

    public static string Write(Project project)
    {
        var nets = LayoutNets.Of(project);
        var record = project.Imported ?? ImportRecord.Empty;
        var text = new StringBuilder();
        var title = string.IsNullOrWhiteSpace(project.Description) ? project.Name : project.Description;
        text.Append(Line(title)).Append('\n');
        text.Append("* extracted by padplan export --spice from the layout of ").Append(Line(project.Name)).Append('\n');
        text.Append("* nodes are named after the first pad of each connected piece of copper; 0 is the ground plane\n");
        foreach (var line in record.DeckLines) text.Append(line).Append('\n');
        var written = new HashSet<string>(StringComparer.Ordinal);
        foreach (var element in record.Elements)
        {
            if (element.Ref is not null) written.Add(element.Ref);
            text.Append(ElementLine(element, nets)).Append('\n');
        }
        foreach (var part in project.Parts.Where(p => !written.Contains(p.Ref)))
            text.Append(FromPart(project, part, nets)).Append('\n');
        text.Append(".end\n");
        return text.ToString();
    }

    private static string ElementLine(SpiceElement e, LayoutNets nets)
    {
        var tail = e.Tail.Length == 0 ? "" : " " + e.Tail;
        // a K line couples windings the board builds as one transformer: it stays as written
        if (e.Ref is null && e.Nodes.Count == 0) return char.ToUpperInvariant(e.Name[0]) == 'K' ? $"{e.Name}{tail}" : $"* left off the board: {e.Name}{Line(tail)}";
        // a 0 V probe's two nodes were joined into one net; a source left off with its network keeps two
        if (e.Ref is null && char.ToUpperInvariant(e.Name[0]) is 'V' or 'I' && e.Nodes.Select(n => n.Net).Distinct(StringComparer.Ordinal).Count() == 1)
            return $"* a wire on the board (nodes joined): {e.Name} {string.Join(" ", e.Nodes.Select(n => n.Net))}{Line(tail)}";
        var nodes = e.Nodes.Select(n => e.Ref is not null && n.Pin is not null ? nets.NodeOf(e.Ref, n.Pin) : OffBoard(n.Net));
        var comment = e.Ref is null ? $"* simulation only, not on the board:\n" : "";
        return $"{comment}{e.Name} {string.Join(" ", nodes)}{tail}";
    }

    private static string OffBoard(string net) => PadPlan.Import.NetNames.IsGround(net) ? LayoutNets.Plane : SimulationOnly + net;

    // A part with no element line (an own-format netlist): R, C and L by their values; others as a comment naming their leads.
    private static string FromPart(Project project, Part part, LayoutNets nets)
    {
        var nodes = string.Join(" ", part.Pins.Select(p => nets.NodeOf(part.Ref, p.Pin)));
        var letter = char.ToUpperInvariant(part.Ref[0]);
        // SPICE would read the IEC code 4k7 as 4k: write the plain number
        return letter is 'R' or 'C' or 'L' && part.Pins.Count == 2 && ComponentValue.TryParse(part.Value, ValueSyntax.SI, out var value, out _) && value.Number > 0
            ? $"{part.Ref} {nodes} {value.Number.ToString("R", CultureInfo.InvariantCulture)}"
            : $"* no SPICE line known for {part.Ref} ({Line(part.Value)}, {project.FootprintOf(part).Name}), leads {string.Join(" ", part.Pins.Select(p => $"{p.Pin}={nets.NodeOf(part.Ref, p.Pin)}"))}";
    }

    private static string Line(string text) => text.ReplaceLineEndings(" ");
}
