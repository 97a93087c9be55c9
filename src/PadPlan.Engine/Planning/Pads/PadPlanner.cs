using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>Chooses the free pads of a net from the toolkit: the smallest punch that holds its leads, else the smallest rectangle, else several pads joined by jumpers.</summary>
public static class PadPlanner
{
    /// <summary>Pads for a net that still needs room for this many leads (after strip segments and kept pads have taken theirs).</summary>
    /// <param name="atLeast">Pads to plan at the least (at most one per lead), joined by jumpers when they are allowed: an earlier try found the net's leads in that many groups too far apart for one pad.</param>
    public static IReadOnlyList<PlannedPad> PlanNet(Net net, int leads, Toolkit toolkit, RuleSettings rules, int atLeast = 1)
    {
        if (leads <= 0) return [];
        var wanted = rules.AllowJumpers ? Math.Clamp(atLeast, 1, leads) : 1;
        var single = SinglePad(net.Name, leads, toolkit);
        if (single is not null && wanted == 1) return [single];
        var largest = LargestPad(net.Name, toolkit);
        if (!rules.AllowJumpers)
            throw new PlacementImpossibleException(new PlacementFailure(
                $"net {net.Name} has {leads} leads to land on pads; the largest pad this toolkit allows holds {largest.Capacity} ({Describe(largest)}) and jumpers are switched off.",
                "Set rules.allowJumpers to true so the net can spread over several jumpered pads, add a wider strip width to the toolkit, or split the net in the circuit."));
        var pieces = Math.Max(wanted, (leads + largest.Capacity - 1) / largest.Capacity);
        var pads = new List<PlannedPad>();
        var left = leads;
        for (var i = 0; i < pieces; i++)
        {
            var share = (left + (pieces - i) - 1) / (pieces - i);
            pads.Add(SinglePad(net.Name, share, toolkit)!);
            left -= share;
        }
        return pads;
    }

    /// <summary>Text a builder reads in a cut list: "round 4.76 mm" or "rect 5 x 12.7 mm".</summary>
    public static string Describe(PlannedPad pad) => pad.Shape == PlannedShape.Round
        ? FormattableString.Invariant($"round {pad.Width:0.##} mm")
        : FormattableString.Invariant($"rect {pad.Width:0.##} x {pad.Height:0.##} mm");

    private static PlannedPad? SinglePad(string net, int leads, Toolkit toolkit)
    {
        foreach (var d in toolkit.PunchDiameters)
            if (toolkit.RoundCapacity(d) >= leads)
                return new PlannedPad(net, PlannedShape.Round, d, d, toolkit.RoundCapacity(d));
        PlannedPad? best = null;
        foreach (var (w, h) in RectSizes(toolkit))
        {
            var capacity = toolkit.RectCapacity(w, h);
            if (capacity < leads) continue;
            if (best is null || w * h < best.Width * best.Height - 1e-9)
                best = new PlannedPad(net, PlannedShape.Rect, w, h, capacity);
        }
        return best;
    }

    private static PlannedPad LargestPad(string net, Toolkit toolkit)
    {
        var best = new PlannedPad(net, PlannedShape.Round, toolkit.PunchDiameters[^1], toolkit.PunchDiameters[^1], toolkit.RoundCapacity(toolkit.PunchDiameters[^1]));
        foreach (var (w, h) in RectSizes(toolkit))
        {
            var capacity = toolkit.RectCapacity(w, h);
            if (capacity > best.Capacity) best = new PlannedPad(net, PlannedShape.Rect, w, h, capacity);
        }
        return best;
    }

    /// <summary>Rectangles cut from the toolkit's strip widths in whole lead spacings, up to the longest rectangle the planner allows.</summary>
    private static IEnumerable<(double Width, double Length)> RectSizes(Toolkit toolkit)
    {
        foreach (var w in toolkit.StripWidths)
            for (var k = 1; k * toolkit.LeadSpacing <= PlacerLimits.MaxRectLength + 1e-9; k++)
                yield return (w, Math.Round(k * toolkit.LeadSpacing, 2));
    }
}
