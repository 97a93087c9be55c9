using PadPlan.Model;

namespace PadPlan.ProjectFiles;

internal sealed partial class DtoReader
{
    public ImportRecord Imported(ImportRecordDto dto, string path) => new(
        (dto.Summary ?? []).Select((l, i) =>
        {
            var at = $"{path}.summary[{i}]";
            if (l is null) throw Fail(at, "a summary line is null; give {\"topic\", \"item\", \"became\"} or remove it.");
            return Build(at, () => new ImportSummaryLine(Need(l.Topic, $"{at}.topic", "summary topic"), Need(l.Item, $"{at}.item", "summary item"), l.Became ?? ""));
        }).ToValueList(),
        (dto.Elements ?? []).Select((e, i) => Element(e, $"{path}.elements[{i}]")).ToValueList(),
        (dto.DeckLines ?? []).Select((line, i) => line ?? throw Fail($"{path}.deckLines[{i}]", "a deck line is null; remove it.")).ToValueList());

    private SpiceElement Element(SpiceElementDto? dto, string path)
    {
        if (dto is null) throw Fail(path, "an element is null; remove it.");
        var nodes = (dto.Nodes ?? []).Select((n, i) =>
        {
            var at = $"{path}.nodes[{i}]";
            if (n is null) throw Fail(at, "a node is null; give {\"pin\", \"net\"} or remove it.");
            return Build(at, () => new SpiceNode(n.Pin, Need(n.Net, $"{at}.net", "node net")));
        }).ToValueList();
        return Build(path, () => new SpiceElement(Need(dto.Name, $"{path}.name", "element name"), dto.Part, nodes, dto.Tail ?? ""));
    }
}
