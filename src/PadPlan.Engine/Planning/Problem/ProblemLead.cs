namespace PadPlan.Planning;

/// <summary>One lead of a part in the engine: where it leaves the body, how far it may reach, and where it may land.</summary>
internal sealed class ProblemLead
{
    public int Item;
    public string Pin = "";
    /// <summary>Net index; -1 for a pin with no connection.</summary>
    public int Net = -1;
    public bool Ground;
    public double Diameter, MinReach, MaxReach;
    public double ExitX, ExitY, OutX, OutY;
    /// <summary>The strip segment beneath this pin, or -1 when the lead is free to land on any island of its net.</summary>
    public int OwnIsland = -1;
    /// <summary>Ground landing candidates at rotation 0 relative to the part, with the reach each needs; the first is the shortest.</summary>
    public double[] GroundX = [], GroundY = [], GroundReach = [];
    /// <summary>For a ground lead of a held part: the candidate landing nearest where the layout has it (0 otherwise).</summary>
    public int StartChoice;
    public double Weight = 1;
}
