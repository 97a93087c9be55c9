using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>What a label belongs to, for the rule that a label stays nearer its own object than any other of the same kind.</summary>
public enum LabelTarget
{
    Pad,
    Part,
    Lead,
    Other,
}

/// <summary>
/// Greedy label placement over candidate positions (after the point-feature labelling of Christensen, Marks and
/// Shieber 1995, greedy variant): each label tries rings of candidate boxes around its object, 12 per ring, nearest
/// ring first, and takes the cheapest. A candidate that covers something it does not own (another label, a pad, a
/// landing dot, a mark, a part outline), leaves the area, or sits nearer another object of its own kind than its own
/// costs so much that it is taken only when nothing else is left; the caller counts those as unresolved and enlarges
/// the view. Far rings get a leader line back to the object. Lives for one view.
/// </summary>
internal sealed class LabelPlacer(Box bounds)
{
    private const double Hard = 10_000;
    /// <summary>What a leader over another pad costs when the request allows it at all (a last resort, taken only when every clear leader is blocked).</summary>
    private const double CrossingCost = 500;
    private const double Cell = 6;
    /// <summary>Gaps (page mm) between object and label for each ring; rings from the third on carry a leader (later for labels that should rather stay close without one, such as pin names).</summary>
    private static readonly double[] Rings = [0.25, 0.9, 2.2, 3.8, 6.0, 9.0, 13.0, 18.0, 24.0];
    public const int FirstLeaderRing = 2;
    /// <summary>Further rings tried only by a last-resort request (one whose leader may cross other pads).</summary>
    private static readonly double[] LastResortRings = [32.0, 42.0, 55.0];
    /// <summary>Air kept round a placed label so that neighbouring labels do not read as one.</summary>
    private const double Air = 0.3;

    private readonly List<(Zone Zone, string? Owner, bool Hard, bool StopsLeaders)> _obstacles = [];
    private readonly Dictionary<(int, int), List<int>> _obstacleGrid = [];
    private readonly Dictionary<(LabelTarget, int, int), List<(string Id, Zone Zone)>> _targets = [];
    /// <summary>Obstacles and targets too large to file under cells (a huge body drawn enlarged): every search reads these lists whole, so the grid stays sized by the labels, not by the numbers in the file.</summary>
    private readonly List<int> _wideObstacles = [];
    private readonly List<(LabelTarget Kind, string Id, Zone Zone)> _wideTargets = [];
    /// <summary>Most grid cells one zone is filed under.</summary>
    private const int MaxCellsPerZone = 256;

    public int Unresolved { get; private set; }

    /// <summary>Grid entries held for obstacles and targets: bounded by what is drawn, not by the sizes in the file.</summary>
    internal int FiledCells => _obstacleGrid.Values.Sum(l => l.Count) + _targets.Values.Sum(l => l.Count);

    /// <summary>
    /// Something labels must not cover; an owner's own labels may (a part's name on its own body). Soft obstacles are
    /// only avoided where possible (lead lines). An obstacle that stops leaders (a pad, a landing dot) may not be crossed
    /// by another object's leader either.
    /// </summary>
    public void Obstacle(Zone zone, string? owner = null, bool hard = true, bool stopsLeaders = false)
    {
        var index = _obstacles.Count;
        _obstacles.Add((zone, owner, hard, stopsLeaders));
        if (CellCount(zone.Bounds) > MaxCellsPerZone)
        {
            _wideObstacles.Add(index);
            return;
        }
        foreach (var key in Cells(zone.Bounds))
        {
            if (!_obstacleGrid.TryGetValue(key, out var list)) _obstacleGrid[key] = list = [];
            list.Add(index);
        }
    }

    public void Block(Box box) => Obstacle(new BoxZone(box));

    /// <summary>An object labels of its kind must stay nearer to than to any other.</summary>
    public void Target(LabelTarget kind, string id, Zone zone)
    {
        if (CellCount(zone.Bounds) > MaxCellsPerZone)
        {
            _wideTargets.Add((kind, id, zone));
            return;
        }
        foreach (var (x, y) in Cells(zone.Bounds))
        {
            if (!_targets.TryGetValue((kind, x, y), out var list)) _targets[(kind, x, y)] = list = [];
            list.Add((id, zone));
        }
    }

    /// <summary>One label to place: size, what it belongs to, and preferred boxes tried before the rings (e.g. inside a body).</summary>
    /// <remarks>AlsoOwns names more owners whose obstacles the label may cover: a pin name may sit on the pad its own lead lands on, a pad's labels inside the outline of a part standing over that pad, and that part's name over the pad.</remarks>
    public sealed record Request(string Owner, LabelTarget Kind, string TargetId, Zone Object, double Width, double Height, IReadOnlyList<Box>? Preferred = null, int LeaderFrom = FirstLeaderRing, IReadOnlyCollection<string>? AlsoOwns = null, bool LeaderMayCross = false);

    /// <summary>A placed label: its box, and the leader from the box to its object when it sits in a far ring.</summary>
    public sealed record Placed(Box Box, Point? LeaderFrom, Point? LeaderTo, bool Resolved);

    public Placed Place(Request request) => Commit(request, Best(request));

    /// <summary>Places the label only if it finds a clear place (nothing hard covered); otherwise leaves everything as it was and returns null.</summary>
    public Placed? TryPlace(Request request)
    {
        var best = Best(request);
        return best.Resolved ? Commit(request, best) : null;
    }

    private Placed Best(Request request)
    {
        Placed? best = null;
        var bestCost = double.MaxValue;
        foreach (var (box, ring) in Candidates(request))
        {
            var leader = ring >= request.LeaderFrom;
            var cost = Cost(request, box, leader) + (ring < 0 ? 0 : ring * 3 + 1);
            if (cost >= bestCost) continue;
            Point? to = leader ? request.Object.Nearest(box.Center) : null;
            Point? from = leader ? box.Nearest(to!.Value) : null;
            if (leader) cost += LeaderCost(request, from!.Value, to!.Value);
            if (cost >= bestCost) continue;
            bestCost = cost;
            best = new Placed(box, from, to, cost < Hard);
            if (cost < 1) break;
        }
        return best!;
    }

    private Placed Commit(Request request, Placed placed)
    {
        if (!placed.Resolved) Unresolved++;
        Obstacle(new BoxZone(placed.Box.Inflate(Air)));
        if (placed.LeaderFrom is { } a && placed.LeaderTo is { } b) Obstacle(new LineZone(a, b, 0.2), request.Owner, hard: false);
        return placed;
    }

    /// <summary>Old-style use: the first clear box among fixed candidates (template strip ids), else the one that covers least.</summary>
    public Box Place(IReadOnlyList<Box> candidates)
    {
        var best = candidates[0];
        var bestCost = double.MaxValue;
        foreach (var candidate in candidates)
        {
            var cost = Cost(null, candidate, leader: false);
            if (cost < bestCost - 1e-9) (best, bestCost) = (candidate, cost);
            if (cost == 0) break;
        }
        Obstacle(new BoxZone(best.Inflate(Air)));
        return best;
    }

    private IEnumerable<(Box Box, int Ring)> Candidates(Request r)
    {
        foreach (var box in r.Preferred ?? []) yield return (box, -1);
        var rings = r.LeaderMayCross ? [.. Rings, .. LastResortRings] : Rings;
        for (var ring = 0; ring < rings.Length; ring++)
            foreach (var box in Around(r.Object.Bounds, r.Width, r.Height, rings[ring], twelve: true)) yield return (box, ring);
    }

    private double Cost(Request? r, Box box, bool leader)
    {
        var cost = bounds.Contains(box) ? 0.0 : Hard * 10;
        var seen = new HashSet<int>();
        var near = CellCount(box) > MaxCellsPerZone
            ? Enumerable.Range(0, _obstacles.Count)
            : Cells(box).SelectMany(key => _obstacleGrid.TryGetValue(key, out var list) ? list : []).Concat(_wideObstacles);
        foreach (var i in near)
        {
            if (!seen.Add(i)) continue;
            var (zone, owner, hard, _) = _obstacles[i];
            if (r is not null && owner is not null && (owner == r.Owner || (r.AlsoOwns?.Contains(owner) ?? false))) continue;
            if (!zone.Bounds.Overlaps(box) || !zone.Overlaps(box)) continue;
            cost += hard ? Hard : 2 + zone.Bounds.OverlapArea(box);
        }
        if (r is not null && !leader && NearerToAnother(r, box)) cost += Hard;
        return cost;
    }

    /// <summary>Hard for a leader that crosses a pad or landing dot it does not belong to (its last stretch, on its own object, is not counted).</summary>
    private double LeaderCost(Request r, Point from, Point to)
    {
        var length = from.DistanceTo(to);
        for (var t = 0.0; t < length - 0.3; t += 0.35)
        {
            var p = from + (to - from) * (t / Math.Max(length, 1e-9));
            var probe = Box.Around(p, 0.2, 0.2);
            foreach (var i in Cells(probe).SelectMany(key => _obstacleGrid.TryGetValue(key, out var list) ? list : []).Concat(_wideObstacles))
            {
                var (zone, owner, _, stops) = _obstacles[i];
                if (!stops) continue;
                if (owner is not null && (owner == r.Owner || owner == r.TargetId || (r.AlsoOwns?.Contains(owner) ?? false))) continue;
                if (zone.Overlaps(probe)) return r.LeaderMayCross ? CrossingCost : Hard;
            }
        }
        return 0;
    }

    /// <summary>True when the box is nearer some other object of the request's kind than its own.</summary>
    private bool NearerToAnother(Request r, Box box)
    {
        var own = r.Object.DistanceTo(box);
        var search = box.Inflate(own);
        var near = CellCount(search) > MaxCellsPerZone
            ? _targets.Where(t => t.Key.Item1 == r.Kind).SelectMany(t => t.Value)
            : Cells(search).SelectMany(c => _targets.TryGetValue((r.Kind, c.Item1, c.Item2), out var list) ? list : []);
        foreach (var (id, zone) in near.Concat(_wideTargets.Where(t => t.Kind == r.Kind).Select(t => (t.Id, t.Zone))))
            if (id != r.TargetId && zone.Bounds.DistanceTo(box) < own && zone.DistanceTo(box) < own - 1e-6) return true;
        return false;
    }

    private static double CellCount(Box box) =>
        (Math.Floor(box.Right / Cell) - Math.Floor(box.Left / Cell) + 1) * (Math.Floor(box.Bottom / Cell) - Math.Floor(box.Top / Cell) + 1);

    private static IEnumerable<(int, int)> Cells(Box box)
    {
        for (var x = (int)Math.Floor(box.Left / Cell); x <= (int)Math.Floor(box.Right / Cell); x++)
            for (var y = (int)Math.Floor(box.Top / Cell); y <= (int)Math.Floor(box.Bottom / Cell); y++)
                yield return (x, y);
    }

    /// <summary>
    /// Boxes of a label's size around an item's box, each a gap away: right, above, below, left, the four corners, and
    /// (with twelve) the four sides again shifted half a label along, so long labels can slide past a neighbour.
    /// </summary>
    public static IReadOnlyList<Box> Around(Box item, double width, double height, double gap, bool twelve = false)
    {
        var c = item.Center;
        var right = item.Right + gap;
        var left = item.Left - gap - width;
        var above = item.Top - gap - height;
        var below = item.Bottom + gap;
        var list = new List<Box>
        {
            Box.Of(right, c.Y - height / 2, width, height),
            Box.Of(c.X - width / 2, above, width, height),
            Box.Of(c.X - width / 2, below, width, height),
            Box.Of(left, c.Y - height / 2, width, height),
            Box.Of(right, above, width, height),
            Box.Of(right, below, width, height),
            Box.Of(left, above, width, height),
            Box.Of(left, below, width, height),
        };
        if (twelve)
        {
            list.Add(Box.Of(c.X, above, width, height));
            list.Add(Box.Of(c.X - width, below, width, height));
            list.Add(Box.Of(c.X - width, above, width, height));
            list.Add(Box.Of(c.X, below, width, height));
        }
        return list;
    }
}
