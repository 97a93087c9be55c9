namespace PadPlan.Planning;

/// <summary>The kinds of trial move the annealer makes.</summary>
internal enum MoveKind
{
    /// <summary>Shift a part within the move range (sometimes turning it too).</summary>
    ShiftPart,
    TurnPart,
    ShiftPad,
    /// <summary>Send a pad to the middle of the lead exits it serves: a directed move that shortens leads fast.</summary>
    PadToLeads,
    /// <summary>Send a part to where its leads' islands are: the part-side twin of <see cref="PadToLeads"/>.</summary>
    PartToPads,
    SwapParts,
    /// <summary>Choose another ground landing for one ground lead.</summary>
    GroundLanding,
}
