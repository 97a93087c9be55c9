using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>An axis-aligned rectangle in page or board mm, by its edges.</summary>
public readonly record struct Box(double Left, double Top, double Right, double Bottom)
{
    public double Width => Right - Left;
    public double Height => Bottom - Top;
    public Point Center => new((Left + Right) / 2, (Top + Bottom) / 2);

    public static Box Around(Point center, double width, double height) =>
        new(center.X - width / 2, center.Y - height / 2, center.X + width / 2, center.Y + height / 2);

    public static Box Of(double left, double top, double width, double height) => new(left, top, left + width, top + height);

    public Box Inflate(double by) => new(Left - by, Top - by, Right + by, Bottom + by);

    public bool Contains(Box other) => other.Left >= Left - 1e-9 && other.Right <= Right + 1e-9 && other.Top >= Top - 1e-9 && other.Bottom <= Bottom + 1e-9;

    /// <summary>Area shared with another box (0 when apart).</summary>
    public double OverlapArea(Box other)
    {
        var w = Math.Min(Right, other.Right) - Math.Max(Left, other.Left);
        var h = Math.Min(Bottom, other.Bottom) - Math.Max(Top, other.Top);
        return w > 0 && h > 0 ? w * h : 0;
    }

    /// <summary>True when the two boxes share some area (touching edges do not count).</summary>
    public bool Overlaps(Box other) => OverlapArea(other) > 0;

    /// <summary>The box moved by an offset.</summary>
    public Box Offset(Point by) => new(Left + by.X, Top + by.Y, Right + by.X, Bottom + by.Y);

    /// <summary>Shortest distance to a point (0 inside).</summary>
    public double DistanceTo(Point p)
    {
        var dx = Math.Max(Math.Max(Left - p.X, 0), p.X - Right);
        var dy = Math.Max(Math.Max(Top - p.Y, 0), p.Y - Bottom);
        return Math.Sqrt(dx * dx + dy * dy);
    }

    /// <summary>Shortest distance between the two boxes (0 when they touch or overlap).</summary>
    public double DistanceTo(Box other)
    {
        var dx = Math.Max(Math.Max(Left - other.Right, 0), other.Left - Right);
        var dy = Math.Max(Math.Max(Top - other.Bottom, 0), other.Top - Bottom);
        return Math.Sqrt(dx * dx + dy * dy);
    }

    /// <summary>The point of the box nearest a given point (the point itself when inside).</summary>
    public Point Nearest(Point p) => new(Math.Clamp(p.X, Left, Right), Math.Clamp(p.Y, Top, Bottom));

    public Box Union(Box other) => new(Math.Min(Left, other.Left), Math.Min(Top, other.Top), Math.Max(Right, other.Right), Math.Max(Bottom, other.Bottom));
}
