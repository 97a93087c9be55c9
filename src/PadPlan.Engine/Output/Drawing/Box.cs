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

    public Box Union(Box other) => new(Math.Min(Left, other.Left), Math.Min(Top, other.Top), Math.Max(Right, other.Right), Math.Max(Bottom, other.Bottom));
}
