using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>Shapes drawn only inside a rectangle, e.g. one tile of a board too large for the paper.</summary>
public sealed record ClipGroup(Box Clip, ValueList<Shape> Shapes) : Shape;
