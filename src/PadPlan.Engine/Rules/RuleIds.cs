namespace PadPlan.Rules;

/// <summary>The id of every rule the checker applies; docs/rules.md explains each one, its source and its fix.</summary>
public static class RuleIds
{
    // Plan completeness
    public const string LayoutMissing = "layout-missing";
    public const string BoardSize = "board-size";
    public const string PartUnplaced = "part-unplaced";
    public const string LeadUnplaced = "lead-unplaced";
    public const string SingleConnection = "single-connection";
    public const string FootprintAssumed = "footprint-assumed";

    // Connectivity rebuilt from geometry
    public const string Open = "open";
    public const string Short = "short";
    public const string LeadWrongPad = "lead-wrong-pad";
    public const string LeadOffPad = "lead-off-pad";
    public const string GroundOnPad = "ground-on-pad";
    public const string PadShort = "pad-short";
    public const string JumperShort = "jumper-short";
    public const string JumperEnd = "jumper-end";
    public const string LandingMismatch = "landing-mismatch";
    public const string PadUnused = "pad-unused";

    // Spacing and leads
    public const string PadGap = "pad-gap";
    public const string GroundGap = "ground-gap";
    public const string LeadEdge = "lead-edge";
    public const string LeadReach = "lead-reach";
    public const string LeadLength = "lead-length";
    public const string PadCapacity = "pad-capacity";
    public const string LeadCrossing = "lead-crossing";

    // Parts and board
    public const string BodyOverlap = "body-overlap";
    public const string BodyOverPad = "body-over-pad";
    public const string LeadMeetsBody = "lead-meets-body";
    public const string BoardMargin = "board-margin";
    public const string Keepout = "keepout";

    // Electrical
    public const string HvSpacing = "hv-spacing";
    public const string HvCreepage = "hv-creepage";
    public const string HvCaution = "hv-caution";
    public const string StripCurrent = "strip-current";

    // At the operating point (ngspice)
    public const string OperatingPoint = "operating-point";
    public const string CapReversed = "cap-reversed";
    public const string CapVoltage = "cap-voltage";
    public const string ResistorPower = "resistor-power";
    public const string DevicePower = "device-power";
    public const string ForwardCurrent = "forward-current";

    /// <summary>Every rule id, in the order docs/rules.md lists them.</summary>
    public static IReadOnlyList<string> All { get; } =
    [
        LayoutMissing, BoardSize, PartUnplaced, LeadUnplaced, SingleConnection, FootprintAssumed,
        Open, Short, LeadWrongPad, LeadOffPad, GroundOnPad, PadShort, JumperShort, JumperEnd, LandingMismatch, PadUnused,
        PadGap, GroundGap, LeadEdge, LeadReach, LeadLength, PadCapacity, LeadCrossing,
        BodyOverlap, BodyOverPad, LeadMeetsBody, BoardMargin, Keepout,
        HvSpacing, HvCreepage, HvCaution, StripCurrent,
        OperatingPoint, CapReversed, CapVoltage, ResistorPower, DevicePower, ForwardCurrent,
    ];
}
