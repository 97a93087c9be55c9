using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Model3D;

/// <summary>Collects triangles by finish and makes the solids the model is built of: prisms, cylinders and cones, spheres, tori.</summary>
/// <remarks>Triangles are wound for glTF's right-handed frame (x, z, y of the board): counter-clockwise seen from outside.
/// The board frame (x right, y down, z up) is left-handed, so a triangle whose board-frame cross product points along its
/// normal is turned round.</remarks>
internal sealed class MeshBuilder
{
    private readonly SortedDictionary<Finish, (List<Point3> P, List<Point3> N, List<int> I)> _parts = [];

    public IReadOnlyList<Mesh> Build() =>
        _parts.Where(kv => kv.Value.I.Count > 0).Select(kv => new Mesh(kv.Key, kv.Value.P, kv.Value.N, kv.Value.I)).ToList();

    public void Triangle(Finish finish, Point3 a, Point3 b, Point3 c, Point3 na, Point3 nb, Point3 nc)
    {
        var (p, n, idx) = Part(finish);
        var g = Cross(Sub(b, a), Sub(c, a));
        var sum = Add(Add(na, nb), nc);
        if (Dot(g, sum) > 0) (b, c, nb, nc) = (c, b, nc, nb);
        var k = p.Count;
        p.Add(a); p.Add(b); p.Add(c);
        n.Add(Unit(na)); n.Add(Unit(nb)); n.Add(Unit(nc));
        idx.Add(k); idx.Add(k + 1); idx.Add(k + 2);
    }

    public void Quad(Finish finish, Point3 a, Point3 b, Point3 c, Point3 d, Point3 normal)
    {
        Triangle(finish, a, b, c, normal, normal, normal);
        Triangle(finish, a, c, d, normal, normal, normal);
    }

    /// <summary>The plan outline raised from z0 to z1: flat top and bottom, one flat face per edge.</summary>
    public void Prism(IReadOnlyList<Point> outline, double z0, double z1, Finish sides, Finish top, Finish bottom)
    {
        var ring = Clean(outline);
        if (ring.Count < 3 || z1 - z0 < 1e-9) return;
        var up = new Point3(0, 0, 1);
        var down = new Point3(0, 0, -1);
        foreach (var (a, b, c) in EarClip(ring))
        {
            Triangle(top, new Point3(a, z1), new Point3(b, z1), new Point3(c, z1), up, up, up);
            Triangle(bottom, new Point3(a, z0), new Point3(b, z0), new Point3(c, z0), down, down, down);
        }
        var ccw = SignedArea(ring) > 0;
        for (var i = 0; i < ring.Count; i++)
        {
            var p = ring[i];
            var q = ring[(i + 1) % ring.Count];
            var (dx, dy) = (q.X - p.X, q.Y - p.Y);
            var len = Math.Sqrt(dx * dx + dy * dy);
            if (len < 1e-9) continue;
            var outward = ccw ? new Point3(dy / len, -dx / len, 0) : new Point3(-dy / len, dx / len, 0);
            Quad(sides, new Point3(p, z0), new Point3(q, z0), new Point3(q, z1), new Point3(p, z1), outward);
        }
    }

    /// <summary>A round solid along the axis a-b, radius ra at a and rb at b (a cylinder or a cone frustum), with flat ends.</summary>
    public void Cylinder(Point3 a, Point3 b, double ra, double rb, Finish side, Finish ends, int segments = 16, bool capA = true, bool capB = true)
    {
        var axis = Sub(b, a);
        var length = Math.Sqrt(Dot(axis, axis));
        if (length < 1e-9) return;
        var u = Scale(axis, 1 / length);
        var (v, w) = Basis(u);
        // The side's normal tilts toward the narrow end by the cone's slope.
        var slope = (ra - rb) / length;
        for (var k = 0; k < segments; k++)
        {
            var (c0, s0) = (Math.Cos(2 * Math.PI * k / segments), Math.Sin(2 * Math.PI * k / segments));
            var (c1, s1) = (Math.Cos(2 * Math.PI * (k + 1) / segments), Math.Sin(2 * Math.PI * (k + 1) / segments));
            var r0 = Add(Scale(v, c0), Scale(w, s0));
            var r1 = Add(Scale(v, c1), Scale(w, s1));
            var n0 = Add(r0, Scale(u, slope));
            var n1 = Add(r1, Scale(u, slope));
            var a0 = Add(a, Scale(r0, ra)); var a1 = Add(a, Scale(r1, ra));
            var b0 = Add(b, Scale(r0, rb)); var b1 = Add(b, Scale(r1, rb));
            Triangle(side, a0, a1, b1, n0, n1, n1);
            Triangle(side, a0, b1, b0, n0, n1, n0);
            var back = Scale(u, -1);
            if (capA && ra > 1e-9) Triangle(ends, a, a0, a1, back, back, back);
            if (capB && rb > 1e-9) Triangle(ends, b, b0, b1, u, u, u);
        }
    }

    public void Sphere(Point3 c, double r, Finish finish, int segments = 8, int rings = 6)
    {
        Point3 At(int ring, int seg)
        {
            var theta = Math.PI * ring / rings;
            var phi = 2 * Math.PI * seg / segments;
            return new Point3(Math.Sin(theta) * Math.Cos(phi), Math.Sin(theta) * Math.Sin(phi), Math.Cos(theta));
        }
        for (var i = 0; i < rings; i++)
            for (var k = 0; k < segments; k++)
            {
                var (n00, n01, n10, n11) = (At(i, k), At(i, k + 1), At(i + 1, k), At(i + 1, k + 1));
                var (p00, p01, p10, p11) = (Add(c, Scale(n00, r)), Add(c, Scale(n01, r)), Add(c, Scale(n10, r)), Add(c, Scale(n11, r)));
                if (i > 0) Triangle(finish, p00, p10, p01, n00, n10, n01);
                if (i < rings - 1) Triangle(finish, p01, p10, p11, n01, n10, n11);
            }
    }

    /// <summary>A ring lying flat: centre line radius <paramref name="major"/>, tube radius <paramref name="minor"/>.</summary>
    public void Torus(Point3 c, double major, double minor, Finish finish, int segments = 24, int sides = 10)
    {
        (Point3 P, Point3 N) At(int seg, int side)
        {
            var phi = 2 * Math.PI * seg / segments;
            var theta = 2 * Math.PI * side / sides;
            var n = new Point3(Math.Cos(theta) * Math.Cos(phi), Math.Cos(theta) * Math.Sin(phi), Math.Sin(theta));
            var centre = new Point3(c.X + major * Math.Cos(phi), c.Y + major * Math.Sin(phi), c.Z);
            return (Add(centre, Scale(n, minor)), n);
        }
        for (var i = 0; i < segments; i++)
            for (var k = 0; k < sides; k++)
            {
                var (a, b, cc, d) = (At(i, k), At(i + 1, k), At(i + 1, k + 1), At(i, k + 1));
                Triangle(finish, a.P, b.P, cc.P, a.N, b.N, cc.N);
                Triangle(finish, a.P, cc.P, d.P, a.N, cc.N, d.N);
            }
    }

    /// <summary>A wire along a path: a cylinder per stretch and a ball at each bend; the ends are flat.</summary>
    public void Wire(IReadOnlyList<Point3> path, double radius, Finish finish)
    {
        for (var i = 1; i < path.Count; i++) Cylinder(path[i - 1], path[i], radius, radius, finish, finish, 8, capA: i == 1, capB: i == path.Count - 1);
        for (var i = 1; i < path.Count - 1; i++) Sphere(path[i], radius, finish, 8, 4);
    }

    private (List<Point3> P, List<Point3> N, List<int> I) Part(Finish finish)
    {
        if (!_parts.TryGetValue(finish, out var part)) _parts[finish] = part = ([], [], []);
        return part;
    }

    private static List<Point> Clean(IReadOnlyList<Point> outline)
    {
        var ring = new List<Point>();
        foreach (var p in outline)
            if (ring.Count == 0 || ring[^1].DistanceTo(p) > 1e-9) ring.Add(p);
        while (ring.Count > 1 && ring[0].DistanceTo(ring[^1]) <= 1e-9) ring.RemoveAt(ring.Count - 1);
        return ring;
    }

    private static double SignedArea(IReadOnlyList<Point> ring)
    {
        var area = 0.0;
        for (var i = 0; i < ring.Count; i++)
        {
            var (p, q) = (ring[i], ring[(i + 1) % ring.Count]);
            area += p.X * q.Y - q.X * p.Y;
        }
        return area / 2;
    }

    /// <summary>Triangles covering a simple polygon (ear clipping); a polygon it cannot clip is fanned from its first corner.</summary>
    internal static List<(Point A, Point B, Point C)> EarClip(IReadOnlyList<Point> ring)
    {
        var pts = SignedArea(ring) >= 0 ? ring.ToList() : ring.Reverse().ToList();
        var result = new List<(Point, Point, Point)>();
        var guard = 0;
        while (pts.Count > 3 && guard++ < 10_000)
        {
            var clipped = false;
            for (var i = 0; i < pts.Count; i++)
            {
                var (a, b, c) = (pts[(i + pts.Count - 1) % pts.Count], pts[i], pts[(i + 1) % pts.Count]);
                var turn = (b.X - a.X) * (c.Y - a.Y) - (b.Y - a.Y) * (c.X - a.X);
                if (turn <= 1e-12) { if (Math.Abs(turn) <= 1e-12) { pts.RemoveAt(i); clipped = true; break; } continue; }
                if (pts.Any(p => p != a && p != b && p != c && Inside(p, a, b, c))) continue;
                result.Add((a, b, c));
                pts.RemoveAt(i);
                clipped = true;
                break;
            }
            if (!clipped) break;
        }
        if (pts.Count == 3) result.Add((pts[0], pts[1], pts[2]));
        else for (var i = 1; i + 1 < pts.Count; i++) result.Add((pts[0], pts[i], pts[i + 1]));
        return result;
    }

    private static bool Inside(Point p, Point a, Point b, Point c)
    {
        static double Side(Point p, Point a, Point b) => (b.X - a.X) * (p.Y - a.Y) - (b.Y - a.Y) * (p.X - a.X);
        return Side(p, a, b) >= 0 && Side(p, b, c) >= 0 && Side(p, c, a) >= 0;
    }

    private static (Point3 V, Point3 W) Basis(Point3 u)
    {
        var helper = Math.Abs(u.Z) < 0.9 ? new Point3(0, 0, 1) : new Point3(1, 0, 0);
        var v = Unit(Cross(u, helper));
        return (v, Cross(u, v));
    }

    internal static Point3 Add(Point3 a, Point3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);
    internal static Point3 Sub(Point3 a, Point3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);
    internal static Point3 Scale(Point3 a, double k) => new(a.X * k, a.Y * k, a.Z * k);
    internal static double Dot(Point3 a, Point3 b) => a.X * b.X + a.Y * b.Y + a.Z * b.Z;
    internal static Point3 Cross(Point3 a, Point3 b) => new(a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);
    internal static Point3 Unit(Point3 a)
    {
        var len = Math.Sqrt(Dot(a, a));
        return len < 1e-12 ? new Point3(0, 0, 1) : Scale(a, 1 / len);
    }
}
