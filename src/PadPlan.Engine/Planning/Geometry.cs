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

    /// <summary>Length of the segment (x0,y0)-(x1,y1) inside the box (Liang-Barsky clipping); 0 when it misses.</summary>
    public static double ClippedLength(double x0, double y0, double x1, double y1, double minX, double minY, double maxX, double maxY)
    {
        // A segment whose own box misses the box is not clipped; saying so at once spares the divisions below (which give 0 for it too).
        if (Math.Max(x0, x1) < minX || Math.Min(x0, x1) > maxX || Math.Max(y0, y1) < minY || Math.Min(y0, y1) > maxY) return 0;
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

    /// <summary>How deep two boxes (min/max corners) reach into each other's clearance zone; 0 when they keep the gap.</summary>
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

    /// <summary>Shortest distance between segments a0-a1 and b0-b1 (zero when they cross); any value at or above <paramref name="enough"/> when their boxes lie that far apart.</summary>
    public static double SegmentGap(double a0x, double a0y, double a1x, double a1y, double b0x, double b0y, double b1x, double b1y, double enough)
    {
        if (Math.Min(a0x, a1x) > Math.Max(b0x, b1x) + enough || Math.Min(b0x, b1x) > Math.Max(a0x, a1x) + enough
            || Math.Min(a0y, a1y) > Math.Max(b0y, b1y) + enough || Math.Min(b0y, b1y) > Math.Max(a0y, a1y) + enough) return enough;
        var s1 = Side(b0x, b0y, b1x, b1y, a0x, a0y);
        var s2 = Side(b0x, b0y, b1x, b1y, a1x, a1y);
        var s3 = Side(a0x, a0y, a1x, a1y, b0x, b0y);
        var s4 = Side(a0x, a0y, a1x, a1y, b1x, b1y);
        if (s1 * s2 < 0 && s3 * s4 < 0) return 0;
        return Math.Min(Math.Min(PointToSegment(a0x, a0y, b0x, b0y, b1x, b1y), PointToSegment(a1x, a1y, b0x, b0y, b1x, b1y)),
            Math.Min(PointToSegment(b0x, b0y, a0x, a0y, a1x, a1y), PointToSegment(b1x, b1y, a0x, a0y, a1x, a1y)));
    }

    private static double Side(double ax, double ay, double bx, double by, double px, double py) => (bx - ax) * (py - ay) - (by - ay) * (px - ax);

    private static double PointToSegment(double px, double py, double ax, double ay, double bx, double by)
    {
        var (dx, dy) = (bx - ax, by - ay);
        var len2 = dx * dx + dy * dy;
        var t = len2 < 1e-18 ? 0 : Math.Clamp(((px - ax) * dx + (py - ay) * dy) / len2, 0, 1);
        var (cx, cy) = (ax + dx * t - px, ay + dy * t - py);
        return Math.Sqrt(cx * cx + cy * cy);
    }
}
