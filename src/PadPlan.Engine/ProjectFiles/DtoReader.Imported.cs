using PadPlan.Model;
using PadPlan.Model.Spice;

namespace PadPlan.ProjectFiles;

internal sealed partial class DtoReader
{
    public ImportRecord Imported(ImportRecordDto dto, string path)
    {
        var summary = (dto.Summary ?? []).Select((l, i) =>
        {
            var at = $"{path}.summary[{i}]";
            if (l is null) throw Fail(at, "a summary line is null; give {\"topic\", \"item\", \"became\"} or remove it.");
            return Build(at, () => new ImportSummaryLine(Need(l.Topic, $"{at}.topic", "summary topic"), Need(l.Item, $"{at}.item", "summary item"), l.Became ?? ""));
        }).ToValueList();
        var elements = (dto.Elements ?? []).Select((e, i) => Element(e, $"{path}.elements[{i}]")).ToValueList();
        // each carried line parsed on its own, then the lines as a whole: a refused line never reaches a deck
        var deck = (dto.DeckLines ?? []).Select((line, i) =>
        {
            var at = $"{path}.deckLines[{i}]";
            if (line is null) throw Fail(at, "a deck line is null; remove it.");
            return Build(at, () => CarriedLine.Parse(line));
        }).ToValueList();
        if (CarriedLine.Problem(deck) is { } problem) throw Fail($"{path}.deckLines[{problem.Index}]", problem.Message);
        return Build(path, () => new ImportRecord(summary, elements, deck));
    }

    private SpiceElement Element(SpiceElementDto? dto, string path)
    {
        if (dto is null) throw Fail(path, "an element is null; remove it.");
        var nodes = (dto.Nodes ?? []).Select((n, i) =>
        {
            var at = $"{path}.nodes[{i}]";
            if (n is null) throw Fail(at, "a node is null; give {\"pin\", \"net\"} or remove it.");
            return Build($"{at}.net", () => new SpiceNode(n.Pin, Need(n.Net, $"{at}.net", "node net")));
        }).ToValueList();
        var name = Need(dto.Name, $"{path}.name", "element name");
        if (!SpiceText.IsElementName(name)) Build($"{path}.name", () => new SpiceElement(name, null, ValueList<SpiceNode>.Empty, ""));
        var tail = Build($"{path}.tail", () => SpiceText.Normalised(dto.Tail, "the element's tail"));
        return Build(path, () => new SpiceElement(name, dto.Part, nodes, tail));
    }
}
