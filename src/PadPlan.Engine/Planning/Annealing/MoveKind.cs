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
    /// <summary>Take a net whose leads do not all reach its pads and bring its worst lead and its island together: the pad to the middle of the leads it serves, or the part beside the island (a directed move, as placers aim moves at broken constraints).</summary>
    MendReach,
    /// <summary>Shift an item that broke a gap or overlap rule at the last recount by at least a few millimetres: a directed move at crowding the move range has shrunk too far to clear.</summary>
    MendCrowding,
}
