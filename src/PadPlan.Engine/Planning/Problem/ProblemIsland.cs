namespace PadPlan.Planning;

/// <summary>One copper island in the engine: a free pad, a strip segment carried by its part, or an island of a kept pad. Offsets are at rotation 0 from the owning item's position.</summary>
internal sealed class ProblemIsland
{
    public int Item;
    /// <summary>Net index, or -1 for a segment under an unconnected pin.</summary>
    public int Net;
    public bool Round;
    public double LocalX, LocalY, HalfW, HalfH;
    /// <summary>The box a lead from another item lands in: the whole island, or for a strip segment partly under its own part's body the largest piece the body leaves bare (a joint under a body can be neither made nor seen, and the lead would come down through the body).</summary>
    public double LandX, LandY, LandHalfW, LandHalfH;
    /// <summary>Its own item's body covers part of it, so the land box is smaller than the island.</summary>
    public bool Covered;
    public int Capacity;
    /// <summary>Islands of one strip share a group; neighbours in it need no gap (the score isolates them).</summary>
    public int StripGroup = -1;
    public int StripIndex;
    public string Id = "";
}
