namespace PadPlan.Planning;

/// <summary>One copper island in the engine: a free pad, a strip segment carried by its part, or an island of a kept pad. Offsets are at rotation 0 from the owning item's position.</summary>
internal sealed class ProblemIsland
{
    public int Item;
    /// <summary>Net index, or -1 for a segment under an unconnected pin.</summary>
    public int Net;
    public bool Round;
    public double LocalX, LocalY, HalfW, HalfH;
    public int Capacity;
    /// <summary>How high above the pad tops a body over this island must start (mm): the highest lead of its net that may land here, plus the lead gap.</summary>
    public double Clearance;
    /// <summary>Islands of one strip share a group; neighbours in it need no gap (the score isolates them).</summary>
    public int StripGroup = -1;
    public int StripIndex;
    public string Id = "";
}
