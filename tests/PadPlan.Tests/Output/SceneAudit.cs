using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;

namespace PadPlan.Tests.Output;

/// <summary>
/// Counts what is wrong with the labels of an assembly scene, from the drawn geometry alone: a label covering another
/// label, a landing dot, a plane symbol, a polarity mark, a pad or a part outline it does not belong to; and a label
/// (without a leader line) that lies nearer another object of its own kind than its own. A label with a leader must
/// have the leader end on its own object. A pin name may sit on the pad its own lead lands on, a pad's labels inside the outline of a part standing over that pad, and that part's name over the pad. Rules from the issue; the measure (shortest box-to-shape distance) is ours.
/// </summary>
public static class SceneAudit
{
    public static IReadOnlyList<string> Problems(BoardScene scene)
    {
        var problems = new List<string>();
        // a label without a clear place is left off the view (the detail pages show it)
        var labels = scene.Labels.Where(l => l.Clear).ToList();
        for (var i = 0; i < labels.Count; i++)
            for (var j = i + 1; j < labels.Count; j++)
                if (labels[i].Box.Overlaps(labels[j].Box)) problems.Add($"label {Name(labels[i])} overlaps label {Name(labels[j])}");
        foreach (var label in labels)
        {
            var ownRef = OwnPart(scene, label);
            foreach (var lead in scene.Leads)
            {
                var zone = lead.OnPlane ? scene.PlaneSymbolOf(lead) : scene.DotOf(lead);
                if (zone.Overlaps(label.Box)) problems.Add($"label {Name(label)} covers the {(lead.OnPlane ? "plane symbol" : "landing dot")} of {lead.Name}");
            }
            foreach (var mark in scene.Marks)
                if (mark.Bounds.Overlaps(label.Box)) problems.Add($"label {Name(label)} covers the {mark.Kind} mark of {mark.Ref}");
            var ownPad = label.Target == LabelTarget.Pad ? label.TargetId : label.Target == LabelTarget.Lead ? scene.Leads.First(l => l.Name == label.TargetId).Pad : null;
            foreach (var pad in scene.Pads)
                if (pad.Id != ownPad && pad.Zone.Overlaps(label.Box) && !(label.Role == LabelRole.PartName && PadUnder(scene, pad.Id, scene.Parts.First(p => p.Ref == ownRef))))
                    problems.Add($"label {Name(label)} covers pad {pad.Id}");
            foreach (var part in scene.Parts)
                if (part.Ref != ownRef && part.Zone.Overlaps(label.Box) && !(label.Target == LabelTarget.Pad && PadUnder(scene, label.TargetId, part))) problems.Add($"label {Name(label)} covers the outline of {part.Ref}");
            if (!scene.Board.Inflate(10).Contains(label.Box)) problems.Add($"label {Name(label)} lies off the view");

            var own = OwnZone(scene, label);
            if (label.HasLeader)
            {
                if (own.DistanceTo(Box.Around(label.LeaderTo!.Value, 0, 0)) > 0.01) problems.Add($"label {Name(label)}: its leader does not end on its object");
                continue;
            }
            var d = own.DistanceTo(label.Box);
            foreach (var (id, zone) in SameKind(scene, label.Target))
                if (id != label.TargetId && zone.DistanceTo(label.Box) < d - 1e-6)
                    problems.Add($"label {Name(label)} is nearer {id} ({zone.DistanceTo(label.Box):0.00} mm) than its own object ({d:0.00} mm)");
        }
        return problems;
    }

    /// <summary>A pad whose centre lies under a part's body: its labels may stand inside that outline.</summary>
    private static bool PadUnder(BoardScene scene, string padId, ScenePart part) =>
        PadPlan.Output.Drawing.Geometry2D.Inside(scene.Pads.First(p => p.Id == padId).Box.Center, part.Outline);

    private static string Name(SceneLabel l) => $"'{l.Text}' ({l.Role} of {l.TargetId})";

    private static string? OwnPart(BoardScene scene, SceneLabel label) => label.Target switch
    {
        LabelTarget.Part => label.TargetId,
        LabelTarget.Lead => scene.Leads.First(l => l.Name == label.TargetId).Ref,
        _ => null,
    };

    private static Zone OwnZone(BoardScene scene, SceneLabel label) => SameKind(scene, label.Target).First(t => t.Id == label.TargetId).Zone;

    private static IEnumerable<(string Id, Zone Zone)> SameKind(BoardScene scene, LabelTarget kind) => kind switch
    {
        LabelTarget.Pad => scene.Pads.Select(p => (p.Id, p.Zone)),
        LabelTarget.Part => scene.Parts.Select(p => (p.Ref, (Zone)p.Zone)),
        LabelTarget.Lead => scene.Leads.Select(l => (l.Name, (Zone)new DiscZone(l.Exit, 0.01))),
        _ => [],
    };
}
