namespace PadPlan.Planning;

/// <summary>Weights of the placement cost terms, per millimetre. All defaults are judgement calls (common practice, no source).</summary>
internal sealed record CostWeights
{
    public double Lead { get; init; } = 1.0;
    /// <summary>A lead this long (mm) costs twice as much per mm as a very short one: the longest leads are what a builder notices, and they vary most from seed to seed.</summary>
    public double LongLead { get; init; } = 10.0;
    /// <summary>RF leads count this many times over: each mm adds about 1 nH (DOMAIN 2).</summary>
    public double RfFactor { get; init; } = 3.0;
    /// <summary>Each RF net's longest lead costs this much more per mm, on top of its weighted length: the longest lead sets the worst stray inductance of the net (common practice, no source).</summary>
    public double RfLongestLead { get; init; } = 2.0;
    public double Jumper { get; init; } = 1.5;
    public double GroundLead { get; init; } = 1.0;
    /// <summary>Pull of every item toward the middle of the region: keeps the used area small.</summary>
    public double Gravity { get; init; } = 0.03;
    /// <summary>Pull of input nets to the left edge and output nets to the right edge, per mm.</summary>
    public double Flow { get; init; } = 0.15;
    /// <summary>Pull of off-board wire landings toward the nearest edge, per mm.</summary>
    public double LandingEdge { get; init; } = 0.2;
    /// <summary>Cost per mm a flat-lying body reaches over another part's pad: it rests on the joint.</summary>
    public double FlatBodyOverPad { get; init; } = 5;
    /// <summary>Cost per mm a standing body reaches over another part's pad: it hides the joint but does not rest on it.</summary>
    public double UprightBodyOverPad { get; init; } = 0.3;
    /// <summary>Weight of hard-rule violations at the start and end of annealing; it rises step by step.</summary>
    public double PenaltyStart { get; init; } = 20.0;
    public double PenaltyEnd { get; init; } = 400.0;
    public double PenaltyGrowth { get; init; } = 1.05;

    public static CostWeights Default { get; } = new();
}
