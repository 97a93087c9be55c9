using PadPlan.Model.Spice;

namespace PadPlan.Model;

/// <summary>
/// What the import read and decided, kept in the project: the summary a builder checks at a glance (report pages,
/// terminal), and the SPICE deck's elements and simulation lines, so that the export can write the circuit the layout
/// builds and the deck still simulates.
/// </summary>
public sealed record ImportRecord(ValueList<ImportSummaryLine> Summary, ValueList<SpiceElement> Elements, ValueList<CarriedLine> DeckLines)
{
    public static ImportRecord Empty { get; } = new(ValueList<ImportSummaryLine>.Empty, ValueList<SpiceElement>.Empty, ValueList<CarriedLine>.Empty);

    /// <summary>The carried-over lines, checked as a whole (blocks closed, elements only inside blocks, nesting limit).</summary>
    public ValueList<CarriedLine> DeckLines { get; } = CarriedLine.Problem(DeckLines) is { } p
        ? throw new ArgumentException($"deck line {p.Index + 1}: {p.Message}", nameof(DeckLines)) : DeckLines;
}

/// <summary>One line of the import summary: the topic (source, subcircuit, assumed, left off), the item and what it became.</summary>
public sealed record ImportSummaryLine(string Topic, string Item, string Became)
{
    public string Topic { get; } = Guard.Name(Topic, "summary topic");
    public string Item { get; } = Guard.Name(Item, "summary item");
    public string Became { get; } = Became ?? "";
}

/// <summary>One SPICE element line of the imported deck: its name, the part that builds it (null when the board leaves it off or it is only a wire), its nodes in order, and the text after the nodes.</summary>
public sealed record SpiceElement(string Name, string? Ref, ValueList<SpiceNode> Nodes, string Tail)
{
    public string Name { get; } = SpiceText.IsElementName(Name) ? Name : throw new ArgumentException(
        string.IsNullOrEmpty(Name) ? "element name must not be empty." : $"element name must be one word that starts with a letter; it {SpiceText.Problem(Name) ?? "does not."}", nameof(Name));

    /// <summary>The text after the nodes, as SPICE words re-joined by single spaces (no line break or control character can get in).</summary>
    public string Tail { get; } = SpiceText.Normalised(Tail, "the element's tail");
}

/// <summary>One node of an element: the lead (footprint pin) of the element's part that carries it, or only the imported net when no lead does (a bulk, substrate or thermal node).</summary>
public sealed record SpiceNode(string? Pin, string Net)
{
    public string Net { get; } = SpiceText.Word(Net, "element node net");
}
