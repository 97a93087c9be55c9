using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>Round pads of one punch diameter and one stock thickness.</summary>
public sealed record PunchGroup(double Diameter, double Thickness, ValueList<string> Pads)
{
    public int Count => Pads.Count;
}
