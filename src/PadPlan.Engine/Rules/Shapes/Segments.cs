using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>Straight segments in plan view: the path of a bare lead from where it leaves the body to where it lands.</summary>
public static class Segments
{
    /// <summary>The shortest distance between segments ab and cd: zero when they cross or touch.</summary>
    public static double Distance(Point a, Point b, Point c, Point d)
    {
        if (Cross(a, b, c, d)) return 0;
        return Math.Min(Math.Min(ToPoint(a, b, c), ToPoint(a, b, d)), Math.Min(ToPoint(c, d, a), ToPoint(c, d, b)));
    }

    /// <summary>Distance from p to segment ab.</summary>
    public static double ToPoint(Point a, Point b, Point p)
    {
        var ab = b - a;
        var len2 = ab.X * ab.X + ab.Y * ab.Y;
        var t = len2 < 1e-18 ? 0 : Math.Clamp(((p.X - a.X) * ab.X + (p.Y - a.Y) * ab.Y) / len2, 0, 1);
        return p.DistanceTo(a + ab * t);
    }

    // Proper crossing: each segment's ends lie strictly on opposite sides of the other's line (touching is caught by the distances).
    private static bool Cross(Point a, Point b, Point c, Point d)
    {
        var d1 = Side(c, d, a);
        var d2 = Side(c, d, b);
        var d3 = Side(a, b, c);
        var d4 = Side(a, b, d);
        return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
    }

    private static double Side(Point a, Point b, Point p) => (b.X - a.X) * (p.Y - a.Y) - (b.Y - a.Y) * (p.X - a.X);
}
