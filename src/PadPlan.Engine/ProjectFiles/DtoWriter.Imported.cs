using PadPlan.Model;

namespace PadPlan.ProjectFiles;

internal static partial class DtoWriter
{
    private static ImportRecordDto Imported(ImportRecord r) => new()
    {
        Summary = [.. r.Summary.Select(l => new ImportSummaryLineDto { Topic = l.Topic, Item = l.Item, Became = l.Became })],
        Elements = r.Elements.Count == 0 ? null : [.. r.Elements.Select(e => new SpiceElementDto
        {
            Name = e.Name,
            Part = e.Ref,
            Nodes = e.Nodes.Count == 0 ? null : [.. e.Nodes.Select(n => new SpiceNodeDto { Pin = n.Pin, Net = n.Net })],
            Tail = e.Tail,
        })],
        DeckLines = r.DeckLines.Count == 0 ? null : [.. r.DeckLines.Select(l => l.Text)],
    };
}
