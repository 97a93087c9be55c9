namespace PadPlan.Output.Drawing;

/// <summary>Which point of a line of text its anchor is: its start, middle or end on the baseline.</summary>
public enum TextAnchor
{
    Start,
    Middle,
    End,
}
