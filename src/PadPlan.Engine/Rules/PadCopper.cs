using PadPlan.Model;

namespace PadPlan.Rules;

/// <summary>One copper island of the plan with the pad it is cut from (Segment is its index along a strip, -1 for round and rect pads).</summary>
public sealed record PadCopper(Island Island, Pad Pad, int Segment)
{
    public string Id => Island.Id;
    public double StockThickness => Pad.StockThickness;

    /// <summary>Next-door segments of one strip: only the score isolates them, so the pad gap does not apply between them.</summary>
    public bool IsNeighbourSegment(PadCopper other) =>
        Segment >= 0 && other.Segment >= 0 && ReferenceEquals(Pad, other.Pad) && Math.Abs(Segment - other.Segment) == 1;
}
