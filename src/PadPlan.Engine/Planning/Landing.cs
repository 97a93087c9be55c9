namespace PadPlan.Planning;

/// <summary>Where a lead lands on an island: the nearest point of the island's usable copper (half a lead diameter plus a rounding allowance in from its edge), pushed further when the lead must be longer than its minimum bend.</summary>
internal static class Landing
{
    /// <summary>Returns the lead length; the landing point comes out in ax, ay and any broken reach limit in violation (mm).</summary>
    public static double Find(double ex, double ey, double ox, double oy, bool round, double cx, double cy, double hw, double hh,
        double diameter, double minReach, double maxReach, out double ax, out double ay, out double violation)
    {
        var inset = diameter / 2 + PlacerLimits.Safety;
        var min = minReach > 0 ? minReach + PlacerLimits.Safety : 0;
        double len;
        violation = 0;
        if (round)
        {
            var r = Math.Max(0, hw - inset);
            var vx = ex - cx;
            var vy = ey - cy;
            var dist = Math.Sqrt(vx * vx + vy * vy);
            if (dist <= r) { ax = ex; ay = ey; len = 0; }
            else { ax = cx + vx / dist * r; ay = cy + vy / dist * r; len = dist - r; }
            if (len < min)
            {
                var (ux, uy) = dist > 1e-6 ? (-vx / dist, -vy / dist) : (ox, oy);
                var px = ex + ux * min;
                var py = ey + uy * min;
                var off = Math.Sqrt((px - cx) * (px - cx) + (py - cy) * (py - cy));
                if (off <= r + 1e-9) { ax = px; ay = py; len = min; }
                else
                {
                    ax = cx + ux * r;
                    ay = cy + uy * r;
                    len = Math.Sqrt((ax - ex) * (ax - ex) + (ay - ey) * (ay - ey));
                    violation += Math.Max(0, min - len);
                }
            }
        }
        else
        {
            var rw = Math.Max(0, hw - inset);
            var rh = Math.Max(0, hh - inset);
            ax = Math.Clamp(ex, cx - rw, cx + rw);
            ay = Math.Clamp(ey, cy - rh, cy + rh);
            len = Math.Sqrt((ax - ex) * (ax - ex) + (ay - ey) * (ay - ey));
            if (len < min)
            {
                var (ux, uy) = len > 1e-6 ? ((ax - ex) / len, (ay - ey) / len) : (ox, oy);
                var px = ex + ux * min;
                var py = ey + uy * min;
                if (Math.Abs(px - cx) <= rw + 1e-9 && Math.Abs(py - cy) <= rh + 1e-9) { ax = px; ay = py; len = min; }
                else
                {
                    // the corner farthest from the exit gives the most lead there is room for
                    ax = ex < cx ? cx + rw : cx - rw;
                    ay = ey < cy ? cy + rh : cy - rh;
                    len = Math.Sqrt((ax - ex) * (ax - ex) + (ay - ey) * (ay - ey));
                    violation += Math.Max(0, min - len);
                }
            }
        }
        violation += Math.Max(0, len - (maxReach - PlacerLimits.Safety));
        return len;
    }

    /// <summary>How far a lead of this length breaks its reach limits (mm): shorter than its minimum bend, or longer than its maximum.</summary>
    public static double ReachViolation(double len, double minReach, double maxReach)
    {
        var min = minReach > 0 ? minReach + PlacerLimits.Safety : 0;
        return Math.Max(0, min - len) + Math.Max(0, len - (maxReach - PlacerLimits.Safety));
    }
}
