using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>A point above the board in mm: X and Y in board coordinates (origin top-left, y down), Z up from the plane's copper face.</summary>
public readonly record struct Point3(double X, double Y, double Z)
{
    public Point3(Point p, double z) : this(p.X, p.Y, z) { }

    /// <summary>The point as seen from above.</summary>
    public Point Plan => new(X, Y);

    public override string ToString() => FormattableString.Invariant($"({X:0.###}, {Y:0.###}, {Z:0.###})");
}
