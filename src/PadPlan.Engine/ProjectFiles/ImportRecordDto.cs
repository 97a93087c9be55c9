namespace PadPlan.ProjectFiles;

/// <summary>What the import read and decided: the summary, and for SPICE decks the element lines and simulation lines the export needs.</summary>
public sealed class ImportRecordDto
{
    public List<ImportSummaryLineDto>? Summary { get; set; }
    public List<SpiceElementDto>? Elements { get; set; }
    public List<string>? DeckLines { get; set; }
}

public sealed class ImportSummaryLineDto
{
    public string? Topic { get; set; }
    public string? Item { get; set; }
    public string? Became { get; set; }
}

public sealed class SpiceElementDto
{
    public string? Name { get; set; }
    /// <summary>The part that builds the element; left out when the board leaves it off.</summary>
    public string? Part { get; set; }
    public List<SpiceNodeDto>? Nodes { get; set; }
    public string? Tail { get; set; }
}

public sealed class SpiceNodeDto
{
    /// <summary>The lead of the element's part that carries the node; left out for a node with no lead.</summary>
    public string? Pin { get; set; }
    public string? Net { get; set; }
}
