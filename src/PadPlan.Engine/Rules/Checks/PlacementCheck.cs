using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Rules.Checks;

/// <summary>Bodies against bodies and against other nets' pads; everything inside the board margin and outside the keep-outs.</summary>
internal static class PlacementCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        var parts = ctx.Plan.Parts;
        var boxes = parts.Select(p => Bounds.Of(p.Body)).ToArray();
        // Sweep along x: parts sorted by their left edge; stop once a part starts right of this one's right edge.
        var order = Enumerable.Range(0, parts.Count).OrderBy(i => boxes[i].Left).ToArray();
        var overlaps = new List<(int, int)>();
        for (var p = 0; p < order.Length; p++)
            for (var q = p + 1; q < order.Length && boxes[order[q]].Left < boxes[order[p]].Right; q++)
            {
                var (i, k) = (Math.Min(order[p], order[q]), Math.Max(order[p], order[q]));
                if (boxes[i].Overlaps(boxes[k]) && ctx.Solids[i].SharesHeight(ctx.Solids[k])
                    && Polygons.Overlap(parts[i].Body, parts[k].Body)) overlaps.Add((i, k));
            }
        overlaps.Sort();
        foreach (var (i, k) in overlaps)
            yield return Findings.Error(RuleIds.BodyOverlap,
                $"the bodies of {parts[i].Ref} and {parts[k].Ref} meet: they overlap seen from above and both reach {Text.Mm(Math.Max(ctx.Solids[i].Bottom, ctx.Solids[k].Bottom))} to {Text.Mm(Math.Min(ctx.Solids[i].Top, ctx.Solids[k].Top))} above the plane.",
                "Move or turn one of the parts.", Polygons.Centre(parts[i].Body), parts[i].Ref, parts[k].Ref);

        var copperBoxes = ctx.Plan.Copper.Select(c => Bounds.Of(c.Island)).ToArray();
        for (var i = 0; i < parts.Count; i++)
        {
            var part = parts[i];
            var own = part.Nets.Select(ctx.Plan.Canonical).ToHashSet(StringComparer.Ordinal);
            for (var k = 0; k < copperBoxes.Length; k++)
            {
                var c = ctx.Plan.Copper[k];
                var net = ctx.NetOf(c);
                if (net is null || own.Contains(net) || !boxes[i].Overlaps(copperBoxes[k]) || !Polygons.Overlap(part.Body, c.Island)) continue;
                // A body held well clear of the pad's joints (a standing part on its leads) hides nothing and presses on nothing.
                var clear = ctx.Solids[i].Bottom - c.StockThickness;
                if (clear >= JointHeight - CheckContext.Eps) continue;
                yield return Findings.Warning(RuleIds.BodyOverPad,
                    $"the body of {part.Ref} lies over pad {c.Id} of net {net}, which it does not connect to, {Text.Mm(Math.Max(0, clear))} above its top.",
                    "Fine where no joint is soldered under it and the body is insulated; otherwise move the part, or stand it higher on its leads, so nothing presses on a joint.",
                    c.Island.Center, part.Ref, c.Id);
            }
        }

        foreach (var f in Board(ctx)) yield return f;
    }

    /// <summary>How far a soldered joint stands above its pad (mm): a body whose underside is at least this high above a pad clears the joints on it (common practice, no source).</summary>
    public const double JointHeight = 1.0;

    private static IEnumerable<Finding> Board(CheckContext ctx)
    {
        var area = ctx.Area;
        if (area is null) yield break;
        var keepouts = ctx.Plan.Board.Keepouts.Select(CopperGeometry.Shape).ToList();
        var margin = Text.Mm(area.Margin);
        const string marginHint = "Move it inward, or make the board larger.";

        foreach (var c in ctx.Plan.Copper)
        {
            var over = area.Overhang(c.Island);
            if (over > CheckContext.Eps)
                yield return Findings.Error(RuleIds.BoardMargin,
                    $"pad {c.Id} reaches {Text.Mm(over)} past the {margin} margin inside the board edge.", marginHint, c.Island.Center, c.Id);
            foreach (var k in keepouts.Where(k => CopperGeometry.Gap(k, c.Island) < -CheckContext.Eps))
                yield return InKeepout($"pad {c.Id}", k, c.Island.Center, c.Id);
        }
        foreach (var part in ctx.Plan.Parts)
        {
            var over = area.Overhang(part.Body);
            if (over > CheckContext.Eps)
                yield return Findings.Error(RuleIds.BoardMargin,
                    $"the body of {part.Ref} reaches {Text.Mm(over)} past the {margin} margin inside the board edge.", marginHint, Polygons.Centre(part.Body), part.Ref);
            foreach (var k in keepouts.Where(k => Polygons.Overlap(part.Body, k)))
                yield return InKeepout($"the body of {part.Ref}", k, Polygons.Centre(part.Body), part.Ref);
        }
        foreach (var lead in ctx.LandedLeads.Where(l => ctx.Under(l).Count == 0))
        {
            var at = lead.Landing!.At;
            var over = area.Overhang(at);
            if (over > CheckContext.Eps)
                yield return Findings.Error(RuleIds.BoardMargin,
                    $"the plane landing of {lead.Name} is {Text.Mm(over)} past the {margin} margin inside the board edge.", marginHint, at, lead.Name);
            foreach (var k in keepouts.Where(k => CopperGeometry.SignedDistance(k, at) < -CheckContext.Eps))
                yield return InKeepout($"the plane landing of {lead.Name}", k, at, lead.Name);
        }
        foreach (var jumper in ctx.Plan.Layout.Jumpers)
            foreach (var p in jumper.Path)
            {
                var over = area.Overhang(p);
                if (over > CheckContext.Eps)
                    yield return Findings.Error(RuleIds.BoardMargin,
                        $"jumper {jumper.Id} bends at {Text.At(p)}, {Text.Mm(over)} past the {margin} margin.", marginHint, p, jumper.Id);
            }
    }

    private static Finding InKeepout(string what, Island keepout, Point at, string item) =>
        Findings.Error(RuleIds.Keepout, $"{what} lies in keep-out {keepout.Id}.",
            "Move it clear of the keep-out (mounting hole, standoff or heat sink).", at, item, keepout.Id);
}
