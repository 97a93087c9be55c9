using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>Overlap tests for part bodies (plan-view polygons) against each other and against copper islands. Touching edges do not count as overlap.</summary>
public static class Polygons
{
    // Shapes that only graze each other by less than this (mm) are taken as touching, not overlapping,
    // so that rounding in rotated coordinates does not raise false alarms.
    public const double Tolerance = 1e-6;

    /// <summary>Whether the point lies inside the polygon (even-odd rule); points on the boundary may go either way.</summary>
    public static bool Contains(IReadOnlyList<Point> polygon, Point p)
    {
        var inside = false;
        for (int i = 0, j = polygon.Count - 1; i < polygon.Count; j = i++)
        {
            var a = polygon[i];
            var b = polygon[j];
            if ((a.Y > p.Y) != (b.Y > p.Y) && p.X < (b.X - a.X) * (p.Y - a.Y) / (b.Y - a.Y) + a.X) inside = !inside;
        }
        return inside;
    }

    /// <summary>Distance from a point to the polygon's boundary.</summary>
    public static double DistanceToBoundary(IReadOnlyList<Point> polygon, Point p)
    {
        var best = double.PositiveInfinity;
        for (int i = 0, j = polygon.Count - 1; i < polygon.Count; j = i++)
            best = Math.Min(best, Segments.ToPoint(polygon[j], polygon[i], p));
        return best;
    }

    /// <summary>Whether the interiors of two polygons overlap.</summary>
    public static bool Overlap(IReadOnlyList<Point> a, IReadOnlyList<Point> b)
    {
        if (!BoxesOverlap(a, b)) return false;
        if (IsConvex(a) && IsConvex(b)) return !HasSeparatingAxis(a, b) && !HasSeparatingAxis(b, a);
        for (int i = 0, j = a.Count - 1; i < a.Count; j = i++)
            for (int k = 0, m = b.Count - 1; k < b.Count; m = k++)
                if (ProperlyCross(a[j], a[i], b[m], b[k])) return true;
        return StrictlyInside(a, b) || StrictlyInside(b, a);
    }

    /// <summary>Whether a polygon overlaps a copper island (or a keep-out shape).</summary>
    public static bool Overlap(IReadOnlyList<Point> polygon, Island island)
    {
        if (island.Shape == IslandShape.Rect) return Overlap(polygon, CopperGeometry.Corners(island));
        var r = island.Width / 2;
        return Contains(polygon, island.Center) || DistanceToBoundary(polygon, island.Center) < r - Tolerance;
    }

    /// <summary>Whether a wire of the given radius, running straight from a to b in plan, reaches into the polygon's interior.</summary>
    public static bool WireMeets(IReadOnlyList<Point> polygon, Point a, Point b, double radius)
    {
        if (Contains(polygon, a) && DistanceToBoundary(polygon, a) > Tolerance) return true;
        if (Contains(polygon, b) && DistanceToBoundary(polygon, b) > Tolerance) return true;
        for (int i = 0, j = polygon.Count - 1; i < polygon.Count; j = i++)
        {
            if (ProperlyCross(polygon[j], polygon[i], a, b)) return true;
            if (Segments.Distance(polygon[j], polygon[i], a, b) < radius - Tolerance) return true;
        }
        return false;
    }

    /// <summary>The mean of the vertices: a point to report a polygon's position by.</summary>
    public static Point Centre(IReadOnlyList<Point> polygon) =>
        new(polygon.Average(p => p.X), polygon.Average(p => p.Y));

    private static bool BoxesOverlap(IReadOnlyList<Point> a, IReadOnlyList<Point> b) =>
        a.Max(p => p.X) > b.Min(p => p.X) + Tolerance && b.Max(p => p.X) > a.Min(p => p.X) + Tolerance &&
        a.Max(p => p.Y) > b.Min(p => p.Y) + Tolerance && b.Max(p => p.Y) > a.Min(p => p.Y) + Tolerance;

    private static bool IsConvex(IReadOnlyList<Point> polygon)
    {
        var sign = 0;
        for (var i = 0; i < polygon.Count; i++)
        {
            var cross = Cross(polygon[(i + 1) % polygon.Count] - polygon[i], polygon[(i + 2) % polygon.Count] - polygon[(i + 1) % polygon.Count]);
            if (Math.Abs(cross) < 1e-12) continue;
            var s = Math.Sign(cross);
            if (sign != 0 && s != sign) return false;
            sign = s;
        }
        return true;
    }

    // Separating-axis test: an edge normal of `a` on which the projections of the two polygons do not overlap.
    private static bool HasSeparatingAxis(IReadOnlyList<Point> a, IReadOnlyList<Point> b)
    {
        for (int i = 0, j = a.Count - 1; i < a.Count; j = i++)
        {
            var edge = a[i] - a[j];
            var len = edge.Length;
            if (len < 1e-12) continue;
            var normal = new Point(-edge.Y / len, edge.X / len);
            var (minA, maxA) = Project(a, normal);
            var (minB, maxB) = Project(b, normal);
            if (Math.Min(maxA, maxB) - Math.Max(minA, minB) <= Tolerance) return true;
        }
        return false;
    }

    private static (double Min, double Max) Project(IReadOnlyList<Point> polygon, Point axis)
    {
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (var p in polygon)
        {
            var d = p.X * axis.X + p.Y * axis.Y;
            min = Math.Min(min, d);
            max = Math.Max(max, d);
        }
        return (min, max);
    }

    private static bool ProperlyCross(Point a, Point b, Point c, Point d)
    {
        double d1 = Cross(b - a, c - a), d2 = Cross(b - a, d - a), d3 = Cross(d - c, a - c), d4 = Cross(d - c, b - c);
        var eps = Tolerance * Math.Max(1, Math.Max((b - a).Length, (d - c).Length));
        return ((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps));
    }

    // Some vertex, edge midpoint or the centre of `inner` lies inside `outer`, clear of its boundary.
    private static bool StrictlyInside(IReadOnlyList<Point> inner, IReadOnlyList<Point> outer)
    {
        var probes = new List<Point>(inner) { Centre(inner) };
        for (int i = 0, j = inner.Count - 1; i < inner.Count; j = i++) probes.Add((inner[i] + inner[j]) * 0.5);
        return probes.Any(p => Contains(outer, p) && DistanceToBoundary(outer, p) > Tolerance);
    }

    private static double Cross(Point u, Point v) => u.X * v.Y - u.Y * v.X;
}
