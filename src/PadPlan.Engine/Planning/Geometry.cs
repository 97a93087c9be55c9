namespace PadPlan.Planning;

/// <summary>Plane geometry for the engine on raw doubles, so the inner loop allocates nothing. Distances are signed: negative means overlap by that much.</summary>
internal static class Geometry
{
    /// <summary>Turns a point by quarter turns clockwise as seen (y down), the same convention as <see cref="Model.Point.Rotated"/>.</summary>
    public static (double X, double Y) Rotate(int quarterTurns, double x, double y) => (quarterTurns & 3) switch
    {
        0 => (x, y),
        1 => (-y, x),
        2 => (-x, -y),
        _ => (y, -x),
    };

    /// <summary>Signed distance from a point to an axis-aligned box given by centre and half sizes.</summary>
    public static double PointToBox(double px, double py, double cx, double cy, double hw, double hh)
    {
        var dx = Math.Abs(px - cx) - hw;
        var dy = Math.Abs(py - cy) - hh;
        if (dx > 0 && dy > 0) return Math.Sqrt(dx * dx + dy * dy);
        return Math.Max(dx, dy);
    }

    /// <summary>Signed edge-to-edge distance between two islands (round or rectangular).</summary>
    public static double IslandGap(bool roundA, double ax, double ay, double ahw, double ahh, bool roundB, double bx, double by, double bhw, double bhh)
    {
        if (roundA && roundB)
        {
            var dx = ax - bx;
            var dy = ay - by;
            return Math.Sqrt(dx * dx + dy * dy) - ahw - bhw;
        }
        if (roundA) return PointToBox(ax, ay, bx, by, bhw, bhh) - ahw;
        if (roundB) return PointToBox(bx, by, ax, ay, ahw, ahh) - bhw;
        var gx = Math.Abs(ax - bx) - ahw - bhw;
        var gy = Math.Abs(ay - by) - ahh - bhh;
        if (gx > 0 && gy > 0) return Math.Sqrt(gx * gx + gy * gy);
        return Math.Max(gx, gy);
    }

    /// <summary>Signed distance from a point to an island.</summary>
    public static double PointToIsland(double px, double py, bool round, double cx, double cy, double hw, double hh)
    {
        if (!round) return PointToBox(px, py, cx, cy, hw, hh);
        var dx = px - cx;
        var dy = py - cy;
        return Math.Sqrt(dx * dx + dy * dy) - hw;
    }

    /// <summary>How deep two boxes (min/max corners) reach into each other's clearance zone; 0 when they keep the gap.</summary>
    /// <summary>Length of the segment (x0,y0)-(x1,y1) inside the box (Liang-Barsky clipping); 0 when it misses.</summary>
    public static double ClippedLength(double x0, double y0, double x1, double y1, double minX, double minY, double maxX, double maxY)
    {
        double t0 = 0, t1 = 1;
        var (dx, dy) = (x1 - x0, y1 - y0);
        if (!Clip(-dx, x0 - minX, ref t0, ref t1) || !Clip(dx, maxX - x0, ref t0, ref t1)
            || !Clip(-dy, y0 - minY, ref t0, ref t1) || !Clip(dy, maxY - y0, ref t0, ref t1)) return 0;
        var len = Math.Sqrt(dx * dx + dy * dy);
        // A run that is only a point (the lead drops straight down) inside the box still counts: by how far it is inside.
        if (len < 1e-9) return Math.Max(0, Math.Min(Math.Min(x0 - minX, maxX - x0), Math.Min(y0 - minY, maxY - y0)));
        return (t1 - t0) * len;
    }

    private static bool Clip(double p, double q, ref double t0, ref double t1)
    {
        if (Math.Abs(p) < 1e-12) return q >= 0;
        var t = q / p;
        if (p < 0) { if (t > t1) return false; if (t > t0) t0 = t; }
        else { if (t < t0) return false; if (t < t1) t1 = t; }
        return true;
    }

    public static double BoxIntrusion(double aMinX, double aMinY, double aMaxX, double aMaxY, double bMinX, double bMinY, double bMaxX, double bMaxY, double gap)
    {
        var ox = Math.Min(aMaxX, bMaxX) - Math.Max(aMinX, bMinX) + gap;
        if (ox <= 0) return 0;
        var oy = Math.Min(aMaxY, bMaxY) - Math.Max(aMinY, bMinY) + gap;
        if (oy <= 0) return 0;
        return Math.Min(ox, oy);
    }

    /// <summary>How far a box sticks out of a region, summed over its sides.</summary>
    public static double OutsideRegion(double minX, double minY, double maxX, double maxY, in Region r) =>
        Math.Max(0, r.MinX - minX) + Math.Max(0, r.MinY - minY) + Math.Max(0, maxX - r.MaxX) + Math.Max(0, maxY - r.MaxY);
}
