using PadPlan.Model;

namespace PadPlan.Editor.Edits;

/// <summary>Applies one edit to a plan and returns the new plan; the old one is untouched (so undo is keeping the old value). Adds no rules: the checker judges the result.</summary>
public static class EditApplier
{
    public static Project Apply(Project project, EditRequest edit)
    {
        var layout = project.Layout ?? throw new EditRefused("the plan has no layout yet; use \"place the rest\" first.");
        var changed = edit.Kind switch
        {
            "move-part" => MovePart(project, layout, Need(edit.Ref, "ref"), At(edit)),
            "turn-part" => TurnPart(project, layout, Need(edit.Ref, "ref")),
            "move-pad" => MovePad(layout, Need(edit.Pad, "pad"), At(edit)),
            "hold" => null,
            "add-pad" => AddPad(project, layout, At(edit), edit.Net, edit.Size),
            "remove-pad" => RemovePad(layout, Need(edit.Pad, "pad")),
            "land-lead" => LandLead(project, layout, Need(edit.Ref, "ref"), Need(edit.Pin, "pin"), At(edit), edit.Net == "plane"),
            "add-link" => AddLink(layout, Need(edit.From, "from"), Need(edit.To, "to")),
            "remove-link" => RemoveLink(layout, Need(edit.Link, "link")),
            null => throw new EditRefused("the edit names no kind."),
            _ => throw new EditRefused($"\"{edit.Kind}\" is not an edit this page knows."),
        };
        if (edit.Kind == "hold") return Hold(project, layout, edit);
        return project with { Layout = changed };
    }

    private static Layout MovePart(Project project, Layout layout, string reference, Point to)
    {
        var placement = PlacementOf(project, layout, reference);
        var shift = to - placement.Position;
        var moved = Landed(layout, placement.Leads.Select(l => Shifted(l, shift)));
        return layout with { Placements = Replace(layout.Placements, placement, new Placement(reference, to, placement.Rotation, moved)) };
    }

    // A quarter turn clockwise about the part's origin; the leads turn with the body.
    private static Layout TurnPart(Project project, Layout layout, string reference)
    {
        var placement = PlacementOf(project, layout, reference);
        var turned = Landed(layout, placement.Leads.Select(l => new LeadLanding(l.Pin, l.Pad, placement.Position + (l.At - placement.Position).Rotated(Rotation.R90))));
        return layout with { Placements = Replace(layout.Placements, placement, new Placement(reference, placement.Position, placement.Rotation.Plus(Rotation.R90), turned)) };
    }

    // A pad carries the leads that land on it: moving a pad by hand keeps the joints, only the leads' reach changes.
    private static Layout MovePad(Layout layout, string id, Point to)
    {
        var pad = PadOf(layout, id);
        var (moved, shift) = pad switch
        {
            RoundPad r => ((Pad)new RoundPad(r.Id, r.Net, to, r.Diameter, r.StockThickness, r.Locked), to - r.Center),
            RectPad r => (new RectPad(r.Id, r.Net, to, r.Width, r.Height, r.StockThickness, r.Locked), to - r.Center),
            StripPad s => (s with { Start = to }, to - s.Start),
            _ => throw new EditRefused($"pad {id} is of a kind the page cannot move."),
        };
        var own = pad.Islands().Select(i => i.Id).ToHashSet(StringComparer.Ordinal);
        var pads = layout.Pads.Select(p => ReferenceEquals(p, pad) ? moved : p).ToValueList();
        var placements = layout.Placements.Select(p => p.Leads.Any(l => l.Pad is not null && own.Contains(l.Pad))
            ? new Placement(p.Ref, p.Position, p.Rotation, p.Leads.Select(l => l.Pad is not null && own.Contains(l.Pad) ? Shifted(l, shift) : l).ToValueList())
            : p).ToValueList();
        return layout with { Pads = pads, Placements = placements };
    }

    private static Project Hold(Project project, Layout layout, EditRequest edit)
    {
        var held = edit.Held ?? throw new EditRefused("hold: say whether to hold (\"held\": true) or let go (false).");
        if (edit.Ref is { } reference)
        {
            var part = project.FindPart(reference) ?? throw new EditRefused($"there is no part {reference}.");
            return project with { Parts = project.Parts.Select(p => ReferenceEquals(p, part) ? p with { Locked = held } : p).ToValueList() };
        }
        var pad = PadOf(layout, Need(edit.Pad, "ref or pad"));
        return project with { Layout = layout with { Pads = layout.Pads.Select(p => ReferenceEquals(p, pad) ? p with { Locked = held } : p).ToValueList() } };
    }

    private static Layout AddPad(Project project, Layout layout, Point at, string? net, double? size)
    {
        if (net is not null && project.FindNet(net) is null) throw new EditRefused($"there is no net {net}.");
        var diameter = size ?? project.Toolkit.PunchDiameters.Min();
        if (!(diameter > 0 && diameter < 100)) throw new EditRefused("the pad size must be between 0 and 100 mm.");
        var id = FreeId(layout, "P");
        var pad = new RoundPad(id, net, at, diameter, project.Toolkit.StockThickness);
        return layout with { Pads = layout.Pads.Append(pad).ToValueList() };
    }

    // Leads that landed on the removed pad keep their points (now on the plane, which the check reports); links to it go.
    private static Layout RemovePad(Layout layout, string id)
    {
        var pad = PadOf(layout, id);
        var gone = pad.Islands().Select(i => i.Id).Append(pad.Id).ToHashSet(StringComparer.Ordinal);
        var rest = layout with
        {
            Pads = layout.Pads.Where(p => !ReferenceEquals(p, pad)).ToValueList(),
            Jumpers = layout.Jumpers.Where(j => !gone.Contains(j.From) && !gone.Contains(j.To)).ToValueList(),
        };
        return rest with { Placements = rest.Placements.Select(p => new Placement(p.Ref, p.Position, p.Rotation, Landed(rest, p.Leads))).ToValueList() };
    }

    private static Layout LandLead(Project project, Layout layout, string reference, string pin, Point at, bool onPlane)
    {
        var placement = PlacementOf(project, layout, reference);
        var part = project.FindPart(reference)!;
        var footprint = project.FootprintOf(part);
        var pins = footprint.PinNames(part.Variant);
        var name = pins.FirstOrDefault(p => string.Equals(p, pin, StringComparison.OrdinalIgnoreCase))
            ?? throw new EditRefused($"part {reference} has no lead {pin}.");
        var landing = new LeadLanding(name, onPlane ? null : IslandAt(layout, at), at);
        var leads = placement.Leads.Any(l => string.Equals(l.Pin, name, StringComparison.OrdinalIgnoreCase))
            ? placement.Leads.Select(l => string.Equals(l.Pin, name, StringComparison.OrdinalIgnoreCase) ? landing : l)
            : placement.Leads.Append(landing);
        return layout with { Placements = Replace(layout.Placements, placement, placement with { Leads = leads.ToValueList() }) };
    }

    private static Layout AddLink(Layout layout, string from, string to)
    {
        var islands = layout.Islands().Select(i => i.Id).ToHashSet(StringComparer.Ordinal);
        foreach (var end in new[] { from, to })
            if (!islands.Contains(end)) throw new EditRefused($"{end} is not a pad or strip segment; a jumper joins two of them.");
        if (from == to) throw new EditRefused("a jumper needs two different pads.");
        var link = new Jumper(FreeId(layout, "W"), from, to);
        return layout with { Jumpers = layout.Jumpers.Append(link).ToValueList() };
    }

    private static Layout RemoveLink(Layout layout, string id)
    {
        var link = layout.Jumpers.FirstOrDefault(j => j.Id == id) ?? throw new EditRefused($"there is no jumper {id}.");
        return layout with { Jumpers = layout.Jumpers.Where(j => !ReferenceEquals(j, link)).ToValueList() };
    }

    /// <summary>The island whose copper holds the point, by id; null for bare plane. The check goes by the point, so the name only keeps the file honest.</summary>
    internal static string? IslandAt(Layout layout, Point at) => layout.Islands().FirstOrDefault(i => i.Shape == IslandShape.Round
        ? i.Center.DistanceTo(at) <= i.Width / 2
        : at.X >= i.Left && at.X <= i.Right && at.Y >= i.Top && at.Y <= i.Bottom)?.Id;

    private static ValueList<LeadLanding> Landed(Layout layout, IEnumerable<LeadLanding> leads) =>
        leads.Select(l => new LeadLanding(l.Pin, IslandAt(layout, l.At), l.At)).ToValueList();

    private static LeadLanding Shifted(LeadLanding l, Point shift) => new(l.Pin, l.Pad, l.At + shift);

    private static Placement PlacementOf(Project project, Layout layout, string reference)
    {
        if (project.FindPart(reference) is null) throw new EditRefused($"there is no part {reference}.");
        return layout.Placements.FirstOrDefault(p => p.Ref == reference)
            ?? throw new EditRefused($"part {reference} is not on the board yet; use \"place the rest\".");
    }

    private static Pad PadOf(Layout layout, string id) =>
        layout.Pads.FirstOrDefault(p => p.Id == id) ?? throw new EditRefused($"there is no pad or strip {id}.");

    private static ValueList<Placement> Replace(ValueList<Placement> all, Placement old, Placement updated) =>
        all.Select(p => ReferenceEquals(p, old) ? updated : p).ToValueList();

    private static string FreeId(Layout layout, string prefix)
    {
        var used = layout.Pads.Select(p => p.Id).Concat(layout.Islands().Select(i => i.Id)).Concat(layout.Jumpers.Select(j => j.Id)).ToHashSet(StringComparer.Ordinal);
        for (var n = 1; ; n++)
            if (!used.Contains($"{prefix}{n}")) return $"{prefix}{n}";
    }

    private static string Need(string? value, string field) =>
        string.IsNullOrWhiteSpace(value) ? throw new EditRefused($"the edit needs \"{field}\".") : value;

    private static Point At(EditRequest edit)
    {
        if (edit.X is not { } x || edit.Y is not { } y || !double.IsFinite(x) || !double.IsFinite(y))
            throw new EditRefused("the edit needs a board position \"x\" and \"y\" in millimetres.");
        if (Math.Abs(x) > 10000 || Math.Abs(y) > 10000) throw new EditRefused("that position is far off the board.");
        return new Point(x, y);
    }
}
