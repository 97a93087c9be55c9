using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>The figures by which a builder compares two layouts of one circuit: lead length in total and at worst, wire links, board area.</summary>
public sealed record LayoutFigures(double TotalLead, double LongestLead, string LongestLeadName, int Links, double? BoardArea)
{
    /// <summary>Measures a project's layout, placed by the placer or by hand; leads whose pin the footprint does not know are left out.</summary>
    public static LayoutFigures Of(Project project)
    {
        var layout = project.Layout ?? Layout.Empty;
        var total = 0.0;
        var longest = 0.0;
        var longestName = "-";
        foreach (var placement in layout.Placements)
        {
            if (project.FindPart(placement.Ref) is not { } part || project.FindFootprint(part.Footprint) is not { } footprint) continue;
            foreach (var landing in placement.Leads)
            {
                if (footprint.LeadForPin(landing.Pin, part.Variant) is not { } lead) continue;
                var reach = placement.ToBoard(lead.Exit).DistanceTo(landing.At);
                total += reach;
                if (reach > longest + 1e-9) { longest = reach; longestName = $"{placement.Ref}.{landing.Pin}"; }
            }
        }
        var board = project.Board;
        return new LayoutFigures(total, longest, longestName, layout.Jumpers.Count, board.IsAuto ? null : board.Width!.Value * board.Height!.Value);
    }
}
