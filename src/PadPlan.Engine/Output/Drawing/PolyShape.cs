using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>A polyline, or a polygon when closed; filled and/or stroked.</summary>
public sealed record PolyShape(ValueList<Point> Points, bool Closed, Stroke? Stroke, Ink? Fill = null) : Shape
{
    public ValueList<Point> Points { get; } = Points.Count >= 2 ? Points : throw new ArgumentException("a polyline needs at least two points.", nameof(Points));
}
