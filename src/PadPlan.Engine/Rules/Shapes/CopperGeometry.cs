using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>Distances between copper islands (round or axis-aligned rectangles) and points, in mm.</summary>
public static class CopperGeometry
{
    /// <summary>Distance from a point to the island's edge: positive outside, negative inside (minus the depth inside the copper).</summary>
    public static double SignedDistance(Island island, Point p)
    {
        if (island.Shape == IslandShape.Round) return p.DistanceTo(island.Center) - island.Width / 2;
        var dx = Math.Abs(p.X - island.Center.X) - island.Width / 2;
        var dy = Math.Abs(p.Y - island.Center.Y) - island.Height / 2;
        return dx > 0 || dy > 0 ? new Point(Math.Max(dx, 0), Math.Max(dy, 0)).Length : Math.Max(dx, dy);
    }

    /// <summary>Edge-to-edge gap between two islands: positive when apart, zero when touching, negative when they overlap.</summary>
    public static double Gap(Island a, Island b)
    {
        if (a.Shape == IslandShape.Round && b.Shape == IslandShape.Round)
            return a.Center.DistanceTo(b.Center) - a.Width / 2 - b.Width / 2;
        if (a.Shape == IslandShape.Round) return SignedDistance(b, a.Center) - a.Width / 2;
        if (b.Shape == IslandShape.Round) return SignedDistance(a, b.Center) - b.Width / 2;
        var dx = Math.Abs(a.Center.X - b.Center.X) - (a.Width + b.Width) / 2;
        var dy = Math.Abs(a.Center.Y - b.Center.Y) - (a.Height + b.Height) / 2;
        return dx > 0 && dy > 0 ? new Point(dx, dy).Length : Math.Max(dx, dy);
    }

    /// <summary>The corners of a rectangular island, or of the square around a round one.</summary>
    public static IReadOnlyList<Point> Corners(Island island) =>
    [
        new(island.Left, island.Top), new(island.Right, island.Top),
        new(island.Right, island.Bottom), new(island.Left, island.Bottom),
    ];

    /// <summary>The point of the island nearest to another point (its centre when the point lies inside).</summary>
    public static Point Nearest(Island island, Point p)
    {
        if (island.Shape == IslandShape.Round)
        {
            var d = p - island.Center;
            var len = d.Length;
            return len <= island.Width / 2 ? p : island.Center + d * (island.Width / 2 / len);
        }
        return new Point(Math.Clamp(p.X, island.Left, island.Right), Math.Clamp(p.Y, island.Top, island.Bottom));
    }

    /// <summary>A shape for a keep-out, so that keep-outs and islands share the distance functions.</summary>
    public static Island Shape(Keepout keepout) => keepout switch
    {
        CircleKeepout c => new Island(c.Id, null, c.Center, c.Diameter, c.Diameter, IslandShape.Round),
        RectKeepout r => new Island(r.Id, null, r.Center, r.Width, r.Height, IslandShape.Rect),
        _ => throw new ArgumentOutOfRangeException(nameof(keepout), keepout, "unknown keep-out shape"),
    };
}
