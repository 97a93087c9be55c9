using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>One page of drawing: its paper size in mm and the shapes on it, painted in order on white.</summary>
public sealed record DrawingPage(double Width, double Height, string Title, ValueList<Shape> Shapes)
{
    public double Width { get; } = Width > 0 ? Width : throw new ArgumentOutOfRangeException(nameof(Width), Width, "page width must be positive.");
    public double Height { get; } = Height > 0 ? Height : throw new ArgumentOutOfRangeException(nameof(Height), Height, "page height must be positive.");
}
