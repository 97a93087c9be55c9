using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>How a line is drawn: colour, width (page mm) and an optional dash pattern (on, off, ... in page mm).</summary>
public sealed record Stroke(Ink Ink, double Width, ValueList<double>? Dash = null)
{
    public double Width { get; } = Width > 0 && double.IsFinite(Width) ? Width : throw new ArgumentOutOfRangeException(nameof(Width), Width, "stroke width must be positive.");
    public ValueList<double> Dash { get; } = Dash ?? ValueList<double>.Empty;

    public static Stroke Solid(Ink ink, double width) => new(ink, width);
    public static Stroke Dashed(Ink ink, double width, params double[] pattern) => new(ink, width, pattern.ToValueList());
}
