using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>A package in the netlist: one part, or the sections (U2A, U2B...) of one package under its base reference.</summary>
public sealed record PartSections(string Ref, ValueList<(char Letter, NetlistPart Part)> Sections)
{
    public NetlistPart First => Sections[0].Part;
    public bool IsSectioned => Sections.Count > 1 || Sections[0].Letter != '\0';
}
