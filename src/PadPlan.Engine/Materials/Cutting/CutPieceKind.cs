namespace PadPlan.Materials.Cutting;

/// <summary>What a piece cut from stock becomes.</summary>
public enum CutPieceKind
{
    /// <summary>A rectangle pad, glued as it is.</summary>
    Rect,
    /// <summary>A strip to be scored across into isolated segments (IC rows).</summary>
    Strip,
    /// <summary>A strip that round pads are punched from, one disc per pitch.</summary>
    PunchStrip,
}
