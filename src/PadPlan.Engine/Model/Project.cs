namespace PadPlan.Model;

/// <summary>A builder's whole plan: the circuit, the footprints it uses, the board, the toolkit, the rules and (once placed) the layout.</summary>
public sealed record Project(
    string Name,
    Board Board,
    Toolkit Toolkit,
    RuleSettings Rules,
    ValueList<Net> Nets,
    ValueList<Part> Parts,
    ValueList<Footprint> Footprints,
    Layout? Layout = null,
    string Description = "",
    ValueList<string>? FootprintDirs = null,
    ImportRecord? Imported = null)
{
    public string Name { get; } = Guard.Name(Name, "project name");
    public ValueList<string> FootprintDirs { get; } = FootprintDirs ?? ValueList<string>.Empty;

    public Net? FindNet(string name) => Nets.FirstOrDefault(n => string.Equals(n.Name, name, StringComparison.Ordinal));
    public Part? FindPart(string reference) => Parts.FirstOrDefault(p => string.Equals(p.Ref, reference, StringComparison.Ordinal));
    public Footprint? FindFootprint(string name) => Footprints.FirstOrDefault(f => string.Equals(f.Name, name, StringComparison.OrdinalIgnoreCase));

    /// <summary>The footprint of a part; the project file reader guarantees it exists.</summary>
    public Footprint FootprintOf(Part part) => FindFootprint(part.Footprint)
        ?? throw new InvalidOperationException($"Part {part.Ref} uses footprint '{part.Footprint}', which the project does not hold.");
}
