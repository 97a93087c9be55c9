using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>
/// An area on a page that a label must keep off or stay near: a box, a disc, a polygon or a line. Each answers the two
/// questions a label placer asks: does a label box cover part of it, and how far is a label box from it.
/// </summary>
public abstract record Zone
{
    public abstract Box Bounds { get; }

    /// <summary>True when the box covers some of the zone's area (or, for a line, crosses it).</summary>
    public abstract bool Overlaps(Box box);

    /// <summary>Shortest distance from the box to the zone (0 when they overlap or touch).</summary>
    public abstract double DistanceTo(Box box);

    /// <summary>The zone's point nearest to a point: where a leader line ends.</summary>
    public abstract Point Nearest(Point p);
}

public sealed record BoxZone(Box Box) : Zone
{
    public override Box Bounds => Box;
    public override bool Overlaps(Box box) => Box.Overlaps(box);
    public override double DistanceTo(Box box) => Box.DistanceTo(box);
    public override Point Nearest(Point p) => Box.Nearest(p);
}

public sealed record DiscZone(Point Center, double Radius) : Zone
{
    public override Box Bounds => Box.Around(Center, 2 * Radius, 2 * Radius);
    public override bool Overlaps(Box box) => box.DistanceTo(Center) < Radius - 1e-9;
    public override double DistanceTo(Box box) => Math.Max(0, box.DistanceTo(Center) - Radius);
    public override Point Nearest(Point p)
    {
        var d = p - Center;
        return d.Length <= Radius ? p : Center + d * (Radius / d.Length);
    }
}

/// <summary>A line segment of some width, e.g. a lead or a leader.</summary>
public sealed record LineZone(Point From, Point To, double Width) : Zone
{
    public override Box Bounds => new Box(Math.Min(From.X, To.X), Math.Min(From.Y, To.Y), Math.Max(From.X, To.X), Math.Max(From.Y, To.Y)).Inflate(Width / 2);
    public override bool Overlaps(Box box) => Geometry2D.SegmentDistance(box, From, To) < Width / 2 - 1e-9;
    public override double DistanceTo(Box box) => Math.Max(0, Geometry2D.SegmentDistance(box, From, To) - Width / 2);
    public override Point Nearest(Point p) => Geometry2D.NearestOnSegment(p, From, To);
}

/// <summary>A closed polygon (a part body): its inside counts, not only its outline.</summary>
public sealed record PolygonZone : Zone
{
    public PolygonZone(IReadOnlyList<Point> points)
    {
        if (points.Count < 3) throw new ArgumentException("a polygon zone needs at least three points.", nameof(points));
        Points = points.ToValueList();
        Bounds = new Box(points.Min(p => p.X), points.Min(p => p.Y), points.Max(p => p.X), points.Max(p => p.Y));
    }

    public ValueList<Point> Points { get; }
    public override Box Bounds { get; }

    public override bool Overlaps(Box box)
    {
        if (!Bounds.Overlaps(box)) return false;
        if (Geometry2D.Inside(box.Center, Points)) return true;
        foreach (var p in Points) if (p.X > box.Left && p.X < box.Right && p.Y > box.Top && p.Y < box.Bottom) return true;
        return Edges().Any(e => Geometry2D.SegmentDistance(box, e.A, e.B) < 1e-9 && Geometry2D.CrossesInterior(box, e.A, e.B));
    }

    public override double DistanceTo(Box box) => Overlaps(box) ? 0 : Edges().Min(e => Geometry2D.SegmentDistance(box, e.A, e.B));

    public override Point Nearest(Point p) => Geometry2D.Inside(p, Points) ? p
        : Edges().Select(e => Geometry2D.NearestOnSegment(p, e.A, e.B)).MinBy(q => q.DistanceTo(p));

    private IEnumerable<(Point A, Point B)> Edges() => Points.Select((p, i) => (p, Points[(i + 1) % Points.Count]));
}
