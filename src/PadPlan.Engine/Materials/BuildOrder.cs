using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>
/// The order to build in, following the signal path from input to output (DOMAIN §1: glue a few pads, solder,
/// continue): each stage glues the pads its parts need, fits wire links whose pads are both down, then solders its
/// parts low before tall, so a tall part never blocks the iron from a low one.
/// </summary>
public static class BuildOrder
{
    /// <summary>Width of the board columns used for the order when no net is marked as input (mm).</summary>
    public const double ColumnWidth = 10;

    public static IReadOnlyList<BuildStep> Steps(Project project)
    {
        var layout = project.Layout ?? throw new ArgumentException("the project has no layout; place it first.", nameof(project));
        var padOfIsland = layout.Pads.SelectMany(p => p.Islands().Select(i => (Island: i.Id, Pad: p))).ToDictionary(x => x.Island, x => x.Pad, StringComparer.Ordinal);
        var placements = layout.Placements.ToDictionary(p => p.Ref, StringComparer.Ordinal);
        var placed = project.Parts.Where(p => placements.ContainsKey(p.Ref)).ToList();
        var stage = Stages(project, placed, placements, padOfIsland);

        var steps = new List<BuildStep>();
        var glued = new HashSet<string>(StringComparer.Ordinal);
        var linked = new HashSet<string>(StringComparer.Ordinal);
        void Add(string action, string what, string where, string note) => steps.Add(new BuildStep(steps.Count + 1, action, what, where, note));

        void GlueAndLink(IEnumerable<Pad> pads)
        {
            var fresh = pads.Where(p => glued.Add(p.Id)).DistinctBy(p => p.Id).OrderBy(p => p.Id, NaturalOrder.Comparer).ToList();
            if (fresh.Count > 0)
                Add("Glue pads", string.Join(", ", fresh.Select(p => p.Id).Order(NaturalOrder.Comparer)), "nets " + string.Join(", ", fresh.SelectMany(NetsOf).Distinct()), "copper up, each centred on its mark on the pad template");
            foreach (var j in layout.Jumpers.Where(j => !linked.Contains(j.Id) && IsDown(j.From) && IsDown(j.To)).OrderBy(j => j.Id, NaturalOrder.Comparer))
            {
                linked.Add(j.Id);
                Add("Fit jumper", j.Id, $"{j.From} to {j.To}", "insulated if it crosses other copper");
            }
        }
        bool IsDown(string islandId) => padOfIsland.TryGetValue(islandId, out var pad) && glued.Contains(pad.Id);

        foreach (var group in placed.GroupBy(p => stage[p.Ref]).OrderBy(g => g.Key))
        {
            GlueAndLink(group.SelectMany(p => placements[p.Ref].Leads).Where(l => l.Pad is not null && padOfIsland.ContainsKey(l.Pad)).Select(l => padOfIsland[l.Pad!]));
            foreach (var part in group.OrderBy(p => project.FindFootprint(p.Footprint)?.Height ?? 0).ThenBy(p => p.Ref, NaturalOrder.Comparer))
                Add("Solder", Describe(project, part), string.Join(", ", placements[part.Ref].Leads.Select(l => $"{l.Pin} to {l.Pad ?? "plane"}")), GroundNote(project, part, placements[part.Ref]));
        }
        GlueAndLink(layout.Pads);
        Add("Test", "the finished board", "all pads", "run the continuity test plan (padplan testplan) before applying power");
        return steps;
    }

    /// <summary>Whether a net is a hub that the signal path does not run through: ground and supply rails.</summary>
    public static bool IsRail(Net? net) => net is not null && (net.Ground || net.Class == NetClass.Power);

    // Stage of each part: its signal nets' distance from the input along the netlist; parts on rails only join the
    // stage of the first part that shares a pad with them; without an input net, 10 mm columns left to right.
    private static Dictionary<string, int> Stages(Project project, List<Part> parts, Dictionary<string, Placement> placements, Dictionary<string, Pad> padOfIsland)
    {
        var stage = new Dictionary<string, int>(StringComparer.Ordinal);
        var inputs = project.Nets.Where(n => n.Role == SignalRole.Input).Select(n => n.Name).ToList();
        if (inputs.Count == 0)
        {
            foreach (var p in parts)
                stage[p.Ref] = (int)Math.Floor(placements[p.Ref].Leads.Select(l => l.At.X).DefaultIfEmpty(placements[p.Ref].Position.X).Min() / ColumnWidth);
            return stage;
        }
        var depth = NetDepths(project, parts, inputs);
        foreach (var p in parts)
        {
            var d = p.Pins.Select(x => depth.TryGetValue(x.Net, out var v) ? v : int.MaxValue).DefaultIfEmpty(int.MaxValue).Min();
            if (d != int.MaxValue) stage[p.Ref] = d;
        }
        var padStage = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var p in parts.Where(p => stage.ContainsKey(p.Ref)))
            foreach (var pad in PadsOf(placements[p.Ref], padOfIsland))
                padStage[pad] = Math.Min(padStage.GetValueOrDefault(pad, int.MaxValue), stage[p.Ref]);
        var last = stage.Values.DefaultIfEmpty(-1).Max() + 1;
        foreach (var p in parts.Where(p => !stage.ContainsKey(p.Ref)))
            stage[p.Ref] = PadsOf(placements[p.Ref], padOfIsland).Select(pad => padStage.GetValueOrDefault(pad, last)).DefaultIfEmpty(last).Min();
        return stage;
    }

    // Breadth-first from the input nets across parts; rails get no depth, so the path does not jump through a supply.
    private static Dictionary<string, int> NetDepths(Project project, List<Part> parts, List<string> inputs)
    {
        var depth = inputs.ToDictionary(n => n, _ => 0, StringComparer.Ordinal);
        var queue = new Queue<string>(inputs);
        while (queue.Count > 0)
        {
            var net = queue.Dequeue();
            foreach (var part in parts.Where(p => p.Pins.Any(x => x.Net == net)))
                foreach (var next in part.Pins.Select(x => x.Net).Distinct())
                {
                    if (depth.ContainsKey(next) || IsRail(project.FindNet(next))) continue;
                    depth[next] = depth[net] + 1;
                    queue.Enqueue(next);
                }
        }
        return depth;
    }

    private static IEnumerable<string> PadsOf(Placement placement, Dictionary<string, Pad> padOfIsland) =>
        placement.Leads.Where(l => l.Pad is not null && padOfIsland.ContainsKey(l.Pad)).Select(l => padOfIsland[l.Pad!].Id);

    private static IEnumerable<string> NetsOf(Pad pad) => pad.Islands().Select(i => i.Net ?? "(none)");

    private static string Describe(Project project, Part part)
    {
        var footprint = project.FindFootprint(part.Footprint);
        var kind = PartKinds.Of(part, footprint);
        var height = footprint is null ? "" : $", {footprint.Height.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture)} mm tall";
        return $"{part.Ref} {PartValue.Display(part, kind)} ({part.Footprint}{height})";
    }

    private static string GroundNote(Project project, Part part, Placement placement)
    {
        var notes = new List<string>();
        var toPlane = placement.Leads.Where(l => l.OnPlane).Select(l => l.Pin).ToList();
        if (toPlane.Count > 0) notes.Add($"ground: {string.Join(", ", toPlane)} to the plane, short");
        if (project.FindFootprint(part.Footprint)?.Mount == MountStyle.Landing) notes.Add("off-board wire");
        return string.Join("; ", notes);
    }
}
