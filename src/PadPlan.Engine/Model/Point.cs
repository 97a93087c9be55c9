namespace PadPlan.Model;

/// <summary>A point or offset in millimetres. Board coordinates: origin at the board's top-left corner, x to the right, y down (as the template lies on the bench).</summary>
public readonly record struct Point(double X, double Y)
{
    public static Point Origin { get; } = new(0, 0);

    public static Point operator +(Point a, Point b) => new(a.X + b.X, a.Y + b.Y);
    public static Point operator -(Point a, Point b) => new(a.X - b.X, a.Y - b.Y);
    public static Point operator *(Point a, double k) => new(a.X * k, a.Y * k);

    public double Length => Math.Sqrt(X * X + Y * Y);
    public double DistanceTo(Point other) => (this - other).Length;

    /// <summary>Turns the point about the origin by a quarter-turn rotation (clockwise as seen on the board, since y points down).</summary>
    public Point Rotated(Rotation rotation) => rotation switch
    {
        Rotation.R0 => this,
        Rotation.R90 => new(-Y, X),
        Rotation.R180 => new(-X, -Y),
        Rotation.R270 => new(Y, -X),
        _ => throw new ArgumentOutOfRangeException(nameof(rotation), rotation, "rotation must be 0, 90, 180 or 270 degrees"),
    };

    public override string ToString() => FormattableString.Invariant($"({X:0.###}, {Y:0.###})");
}
