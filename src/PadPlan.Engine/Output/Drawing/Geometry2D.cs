using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>Plane geometry for boxes, segments and polygons in page mm, used by the zones.</summary>
public static class Geometry2D
{
    public static Point NearestOnSegment(Point p, Point a, Point b)
    {
        var ab = b - a;
        var len2 = ab.X * ab.X + ab.Y * ab.Y;
        if (len2 == 0) return a;
        var t = Math.Clamp(((p.X - a.X) * ab.X + (p.Y - a.Y) * ab.Y) / len2, 0, 1);
        return a + ab * t;
    }

    /// <summary>Shortest distance between a box and a segment: 0 when the segment touches the box.</summary>
    public static double SegmentDistance(Box box, Point a, Point b)
    {
        if (ClipsBox(box, a, b)) return 0;
        var best = Math.Min(box.DistanceTo(a), box.DistanceTo(b));
        foreach (var corner in Corners(box)) best = Math.Min(best, corner.DistanceTo(NearestOnSegment(corner, a, b)));
        return best;
    }

    /// <summary>True when the segment passes through the open inside of the box (not merely along an edge).</summary>
    public static bool CrossesInterior(Box box, Point a, Point b) => ClipsBox(box.Inflate(-1e-7), a, b);

    /// <summary>Point in polygon by the even-odd crossing rule.</summary>
    public static bool Inside(Point p, IReadOnlyList<Point> polygon)
    {
        var inside = false;
        for (int i = 0, j = polygon.Count - 1; i < polygon.Count; j = i++)
        {
            var (pi, pj) = (polygon[i], polygon[j]);
            if ((pi.Y > p.Y) != (pj.Y > p.Y) && p.X < (pj.X - pi.X) * (p.Y - pi.Y) / (pj.Y - pi.Y) + pi.X) inside = !inside;
        }
        return inside;
    }

    public static IEnumerable<Point> Corners(Box box) =>
        [new Point(box.Left, box.Top), new Point(box.Right, box.Top), new Point(box.Right, box.Bottom), new Point(box.Left, box.Bottom)];

    /// <summary>Liang-Barsky clipping: does any part of segment a-b lie in the closed box?</summary>
    private static bool ClipsBox(Box box, Point a, Point b)
    {
        if (box.Width < 0 || box.Height < 0) return false;
        double t0 = 0, t1 = 1;
        var (dx, dy) = (b.X - a.X, b.Y - a.Y);
        bool Edge(double p, double q)
        {
            if (p == 0) return q >= 0;
            var r = q / p;
            if (p < 0) { if (r > t1) return false; if (r > t0) t0 = r; }
            else { if (r < t0) return false; if (r < t1) t1 = r; }
            return true;
        }
        return Edge(-dx, a.X - box.Left) && Edge(dx, box.Right - a.X) && Edge(-dy, a.Y - box.Top) && Edge(dy, box.Bottom - a.Y);
    }
}
