using PadPlan.Model;

namespace PadPlan.Rules;

/// <summary>A part as placed: its body outline and leads in board coordinates.</summary>
public sealed record PlacedPart(Part Part, Footprint Footprint, Placement Placement, ValueList<Point> Body, ValueList<PlacedLead> Leads)
{
    public string Ref => Part.Ref;

    /// <summary>The nets this part's leads carry.</summary>
    public IEnumerable<string> Nets => Leads.Select(l => l.Net).OfType<string>().Distinct(StringComparer.Ordinal);
}
