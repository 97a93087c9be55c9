using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>The figures by which a builder compares two layouts of one circuit: lead length in total and at worst (of all leads, and of leads on RF nets), wire links, board area.</summary>
public sealed record LayoutFigures(double TotalLead, double LongestLead, string LongestLeadName, int Links, double? BoardArea)
{
    /// <summary>The longest lead on a net of class RF (0 when there is none): each millimetre there adds about 1 nH.</summary>
    public double LongestRfLead { get; init; }
    public string LongestRfLeadName { get; init; } = "-";

    /// <summary>Measures a project's layout, placed by the placer or by hand; leads whose pin the footprint does not know are left out.</summary>
    public static LayoutFigures Of(Project project)
    {
        var layout = project.Layout ?? Layout.Empty;
        var total = 0.0;
        var longest = 0.0;
        var longestName = "-";
        var (longestRf, longestRfName) = (0.0, "-");
        foreach (var placement in layout.Placements)
        {
            if (project.FindPart(placement.Ref) is not { } part || project.FindFootprint(part.Footprint) is not { } footprint) continue;
            foreach (var landing in placement.Leads)
            {
                if (footprint.LeadForPin(landing.Pin, part.Variant) is not { } lead) continue;
                var reach = placement.ToBoard(lead.Exit).DistanceTo(landing.At);
                total += reach;
                if (reach > longest + 1e-9) { longest = reach; longestName = $"{placement.Ref}.{landing.Pin}"; }
                if (reach > longestRf + 1e-9 && part.NetOf(landing.Pin) is { } net && project.FindNet(net)?.Class == NetClass.Rf)
                    (longestRf, longestRfName) = (reach, $"{placement.Ref}.{landing.Pin}");
            }
        }
        var board = project.Board;
        return new LayoutFigures(total, longest, longestName, layout.Jumpers.Count, board.IsAuto ? null : board.Width!.Value * board.Height!.Value)
        {
            LongestRfLead = longestRf,
            LongestRfLeadName = longestRfName,
        };
    }
}
