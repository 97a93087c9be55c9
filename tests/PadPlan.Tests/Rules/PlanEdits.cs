using PadPlan.Model;

namespace PadPlan.Tests.Rules;

/// <summary>Small edits to a valid plan, each one a single fault for the checker to find.</summary>
public static class PlanEdits
{
    public static Layout LayoutOf(Project p) => p.Layout ?? throw new InvalidOperationException("fixture has no layout");

    public static Project WithLayout(this Project p, Func<Layout, Layout> edit) => p with { Layout = edit(LayoutOf(p)) };

    public static Project ReplacePad(this Project p, string id, Func<Pad, Pad> edit) =>
        p.WithLayout(l => l with { Pads = l.Pads.Select(x => x.Id == id ? edit(x) : x).ToValueList() });

    public static Project ReplacePlacement(this Project p, string reference, Func<Placement, Placement> edit) =>
        p.WithLayout(l => l with { Placements = l.Placements.Select(x => x.Ref == reference ? edit(x) : x).ToValueList() });

    /// <summary>Moves one lead's landing point (and the pad the file names for it).</summary>
    public static Project MoveLanding(this Project p, string reference, string pin, string? pad, double x, double y) =>
        p.ReplacePlacement(reference, pl => pl with
        {
            Leads = pl.Leads.Select(l => l.Pin == pin ? new LeadLanding(pin, pad, new Point(x, y)) : l).ToValueList(),
        });

    /// <summary>Moves a part's origin without touching its landings.</summary>
    public static Project MovePart(this Project p, string reference, double x, double y) =>
        p.ReplacePlacement(reference, pl => new Placement(pl.Ref, new Point(x, y), pl.Rotation, pl.Leads));

    /// <summary>Moves a round pad and every landing the file puts on it by the same offset.</summary>
    public static Project MoveRoundPad(this Project p, string id, double dx, double dy)
    {
        var moved = p.ReplacePad(id, x => x is RoundPad r
            ? new RoundPad(r.Id, r.Net, r.Center + new Point(dx, dy), r.Diameter, r.StockThickness, r.Locked)
            : throw new ArgumentException($"{id} is not a round pad"));
        return moved.WithLayout(l => l with
        {
            Placements = l.Placements.Select(pl => pl with
            {
                Leads = pl.Leads.Select(ld => ld.Pad == id ? new LeadLanding(ld.Pin, ld.Pad, ld.At + new Point(dx, dy)) : ld).ToValueList(),
            }).ToValueList(),
        });
    }

    public static Project ResizeRoundPad(this Project p, string id, double diameter, double? stock = null) =>
        p.ReplacePad(id, x => x is RoundPad r
            ? new RoundPad(r.Id, r.Net, r.Center, diameter, stock ?? r.StockThickness, r.Locked)
            : throw new ArgumentException($"{id} is not a round pad"));

    public static Project RemoveJumper(this Project p, string id) =>
        p.WithLayout(l => l with { Jumpers = l.Jumpers.Where(j => j.Id != id).ToValueList() });

    public static Project ReplaceNet(this Project p, string name, Func<Net, Net> edit) =>
        p with { Nets = p.Nets.Select(n => n.Name == name ? edit(n) : n).ToValueList() };
}
