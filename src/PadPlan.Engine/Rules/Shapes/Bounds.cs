using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>An axis-aligned bounding box, for skipping pairs of shapes that cannot meet.</summary>
public readonly record struct Bounds(double Left, double Top, double Right, double Bottom)
{
    public static Bounds Of(IReadOnlyList<Point> points)
    {
        double l = double.PositiveInfinity, t = double.PositiveInfinity, r = double.NegativeInfinity, b = double.NegativeInfinity;
        foreach (var p in points)
        {
            l = Math.Min(l, p.X);
            t = Math.Min(t, p.Y);
            r = Math.Max(r, p.X);
            b = Math.Max(b, p.Y);
        }
        return new Bounds(l, t, r, b);
    }

    public static Bounds Of(Island island) => new(island.Left, island.Top, island.Right, island.Bottom);

    /// <summary>Whether the boxes share more than an edge.</summary>
    public bool Overlaps(Bounds other) =>
        Left < other.Right && other.Left < Right && Top < other.Bottom && other.Top < Bottom;
}
