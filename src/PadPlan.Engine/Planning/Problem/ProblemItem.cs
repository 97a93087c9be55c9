using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>One thing the annealer moves as a whole: a part (with any strips it sits on) or a free pad. Geometry is at rotation 0, relative to the item's position.</summary>
internal sealed class ProblemItem
{
    public int Index;
    public Part? Part;
    public Footprint? Footprint;
    public PlannedPad? Pad;
    /// <summary>A pad from the existing layout that stays exactly as it is.</summary>
    public Pad? KeptPad;
    public bool Fixed;
    public double StartX, StartY;
    public int StartRot;
    public int[] Islands = [];
    public int[] Leads = [];
    public int[] GroundLeads = [];
    /// <summary>Nets whose cost changes when this item moves.</summary>
    public int[] Nets = [];
    public double BodyMinX, BodyMinY, BodyMaxX, BodyMaxY;
    public bool HasBody;
    public bool IsLanding;
    /// <summary>A part whose body should stay off other parts' pads (every part but a wire landing): a body over a pad hides the joint.</summary>
    public bool KeepsOffPads;
    /// <summary>An axial part lying on the board: its body would rest on any pad beneath it.</summary>
    public bool LiesFlat;
    /// <summary>Height of the body's underside above the plane (mm), and the highest a lead of this part runs (its lead bend, at least one lead diameter, plus half a diameter), both from the copper the part stands on: the pad tops, or the plane when every lead goes to ground.</summary>
    public double BodyBottom, LeadLevel;
    /// <summary>-1 pulled to the left edge (input), +1 to the right edge (output), 0 neither.</summary>
    public int Flow;
    /// <summary>Rectangular free pads may be turned a quarter.</summary>
    public bool CanTurn;
    public IReadOnlyList<StripRun> Strips = [];

    public bool IsPart => Part is not null;
    public string Name => Part?.Ref ?? KeptPad?.Id ?? $"pad of {Pad?.Net}";
}
