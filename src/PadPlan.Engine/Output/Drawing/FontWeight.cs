namespace PadPlan.Output.Drawing;

/// <summary>The two faces of the shipped font.</summary>
public enum FontWeight
{
    Regular,
    Bold,
}
