namespace PadPlan.Output.Drawing;

/// <summary>One element of a drawing page, in page millimetres (origin top-left, y down).</summary>
public abstract record Shape;
