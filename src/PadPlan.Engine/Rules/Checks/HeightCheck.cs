using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Bare leads against other parts' bodies in 3D: a lead may not pass through a body, nor under one closer than the lead gap.</summary>
internal static class HeightCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        var solids = ctx.Solids;
        var boxes = solids.Select(s => Bounds.Of(s.Part.Body)).ToArray();
        var gap = ctx.Rules.LeadGap;
        foreach (var solid in solids)
            foreach (var lead in solid.Leads)
                for (var k = 0; k < solids.Count; k++)
                {
                    var body = solids[k];
                    // An off-board wire landing has no body a lead could pass through: its wires are leads themselves.
                    if (ReferenceEquals(body, solid) || body.Footprint.Shape == BodyShape.Wires) continue;
                    var worst = Closest(lead, body, boxes[k], gap);
                    if (worst is not { } found) continue;
                    var (at, under) = found;
                    yield return under is { } room
                        ? Findings.Error(RuleIds.LeadMeetsBody,
                            $"lead {lead.Lead.Name} passes {Text.Mm(Math.Max(0, room))} under the body of {body.Ref}; bare leads need {Text.Mm(gap)} of room.",
                            "Move one of the parts so the lead runs clear of the body, or stand the other part higher.", at.Plan, lead.Lead.Name, body.Ref)
                        : Findings.Error(RuleIds.LeadMeetsBody,
                            $"lead {lead.Lead.Name} passes through the body of {body.Ref} at {Text.Mm(at.Z)} above the plane.",
                            "Move one of the parts so the lead runs clear of the body.", at.Plan, lead.Lead.Name, body.Ref);
                }
    }

    // The first stretch of the wire that meets the body's solid, or runs under it with less than the gap: where, and
    // the room left under the body (null when the wire passes through it).
    private static (Point3 At, double? Under)? Closest(LeadPath lead, PartSolid body, Bounds box, double gap)
    {
        var r = lead.Radius;
        for (var i = 1; i < lead.Points.Count; i++)
        {
            var (a, b) = (lead.Points[i - 1], lead.Points[i]);
            var (low, high) = (Math.Min(a.Z, b.Z) - r, Math.Max(a.Z, b.Z) + r);
            if (high <= body.Bottom - gap + CheckContext.Eps || low >= body.Top - CheckContext.Eps) continue;
            if (Math.Max(a.X, b.X) + r < box.Left || Math.Min(a.X, b.X) - r > box.Right || Math.Max(a.Y, b.Y) + r < box.Top || Math.Min(a.Y, b.Y) - r > box.Bottom) continue;
            if (!Polygons.WireMeets(body.Part.Body, a.Plan, b.Plan, r)) continue;
            var at = new Point3((a.X + b.X) / 2, (a.Y + b.Y) / 2, Math.Min(body.Bottom, high));
            return high > body.Bottom + CheckContext.Eps ? (at, null) : (at, body.Bottom - high);
        }
        return null;
    }
}
