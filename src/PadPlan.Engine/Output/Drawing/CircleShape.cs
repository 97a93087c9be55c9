using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>A circle; filled and/or stroked.</summary>
public sealed record CircleShape(Point Center, double Radius, Stroke? Stroke, Ink? Fill = null) : Shape
{
    public double Radius { get; } = Radius > 0 && double.IsFinite(Radius) ? Radius : throw new ArgumentOutOfRangeException(nameof(Radius), Radius, "circle radius must be positive.");
}
