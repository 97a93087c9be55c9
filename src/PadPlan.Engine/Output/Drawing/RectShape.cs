namespace PadPlan.Output.Drawing;

/// <summary>An axis-aligned rectangle, optionally with round corners; filled and/or stroked.</summary>
public sealed record RectShape(Box Box, Stroke? Stroke, Ink? Fill = null, double CornerRadius = 0) : Shape;
