using PadPlan.Model;
using PadPlan.Output.Tables;

namespace PadPlan.Output.Sheets;

/// <summary>Where every lead of every part goes: part, pin name (as printed beside the lead on the assembly view), net, and the pad it lands on or the plane.</summary>
public static class LeadTable
{
    public const string Title = "Leads: where each one goes";

    public static ReportTable For(Project project)
    {
        var rows = new List<string[]>();
        foreach (var (part, footprint, placement) in TemplateSheet.PlacedParts(project).OrderBy(p => p.Part.Ref, NaturalOrder.Comparer))
            foreach (var pin in footprint.PinNames(part.Variant))
            {
                var landing = placement.Leads.FirstOrDefault(l => string.Equals(l.Pin, pin, StringComparison.OrdinalIgnoreCase));
                var where = landing is null ? "not landed" : landing.Pad ?? "plane (ground)";
                rows.Add([part.Ref, PinMarks.Display(pin), part.NetOf(pin) ?? "(none)", where]);
            }
        return ReportTable.Create(Title, ["Part", "Pin", "Net", "Lands on"], rows,
            ["Pin names are the ones printed beside each lead on the assembly view; pads are the ids on the template."]);
    }
}
