using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>Raises a resolved plan into three dimensions from the footprints' heights: shared by the height rules and the 3D model, so both see the same board.</summary>
/// <remarks>A part stands on the highest surface its leads land on (a pad's top is its stock thickness above the plane).
/// Every lead leaves the body at the lead bend height, runs level to above its landing point and drops straight onto it;
/// an outside lead first comes over the top of the body and down its side. Off-board wires rise from their landing.</remarks>
public static class Solids
{
    /// <summary>The solid of every placed part, in plan order. <paramref name="under"/> names the copper a landing point lies on (null: the plane).</summary>
    public static IReadOnlyList<PartSolid> Of(ResolvedPlan plan, Func<PlacedLead, PadCopper?> under) =>
        plan.Parts.Select(p => Of(p, under)).ToList();

    /// <summary>The solid of every placed part, each lead standing on the copper its landing point lies in.</summary>
    public static IReadOnlyList<PartSolid> Of(ResolvedPlan plan) =>
        Of(plan, lead => plan.CopperAt(lead.Landing!.At, Polygons.Tolerance) is { Count: > 0 } u ? u[0] : null);

    public static PartSolid Of(PlacedPart part, Func<PlacedLead, PadCopper?> under)
    {
        var f = part.Footprint;
        var landed = part.Leads.Where(l => l.Landing is not null).Select(l => (Lead: l, Surface: under(l)?.StockThickness ?? 0)).ToList();
        var seat = landed.Count == 0 ? 0 : landed.Max(x => x.Surface);
        var bend = seat + (f.Shape == BodyShape.Wires ? f.Height : f.LeadBend);
        var top = seat + f.Height;
        var centre = Polygons.Centre(part.Body);
        var leads = landed.Select(x =>
        {
            var at = x.Lead.Landing!.At;
            // Even a lead that leaves the body at pad level bends over its joint: the last stretch always drops onto the landing.
            var level = Math.Max(bend, x.Surface + x.Lead.Lead.Diameter);
            var points = new List<Point3>();
            if (f.OutsideLead is not null && string.Equals(x.Lead.Lead.Name, f.OutsideLead, StringComparison.Ordinal))
            {
                points.Add(new Point3(centre, top));
                points.Add(new Point3(x.Lead.Exit, top));
            }
            points.Add(new Point3(x.Lead.Exit, level));
            if (x.Lead.Exit.DistanceTo(at) > Polygons.Tolerance) points.Add(new Point3(at, level));
            points.Add(new Point3(at, x.Surface));
            return new LeadPath(x.Lead, points.ToValueList(), under(x.Lead) is null);
        }).ToValueList();
        return new PartSolid(part, seat, seat + f.BodyBottom, top, leads);
    }
}
