namespace PadPlan.Planning;

/// <summary>The shape the pad planner chose for one free pad of a net: a punched disc or a cut rectangle.</summary>
public enum PlannedShape
{
    Round,
    Rect,
}

/// <summary>One pad the planner decided to make for a net, before it has a place. Round pads have Width = Height = diameter.</summary>
public sealed record PlannedPad(string Net, PlannedShape Shape, double Width, double Height, int Capacity);

