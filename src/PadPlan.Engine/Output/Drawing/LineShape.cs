using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>A straight line.</summary>
public sealed record LineShape(Point From, Point To, Stroke Stroke) : Shape;
