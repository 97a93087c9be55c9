using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>Everything to cut for a layout: round pads by punch, rectangles and scored strips, the punching strips, and the plan that nests them on stock.</summary>
public sealed record CutList(
    ValueList<PunchGroup> Rounds,
    ValueList<CutPiece> Pieces,
    ValueList<CutPiece> PunchStrips,
    CuttingPlan Plan,
    double PadCopperArea,
    bool DefaultStock)
{
    /// <summary>Every piece to cut from stock: rectangles, scored strips and punching strips.</summary>
    public IEnumerable<CutPiece> AllPieces => Pieces.Concat(PunchStrips);

    /// <summary>Board area the pieces take, before kerf (mm²).</summary>
    public double StockAreaNeeded => AllPieces.Sum(p => p.Area);

    /// <summary>Board area the pieces take with one kerf added to each side's length (mm²): an upper bound of what the cuts consume.</summary>
    public double StockAreaWithKerf => AllPieces.Sum(p => (p.Width + Plan.Kerf) * (p.Height + Plan.Kerf));

    /// <summary>Number of pads and strip segments the cut list gives.</summary>
    public int IslandCount => Rounds.Sum(r => r.Count) + Pieces.Sum(p => p.Pads.Count);
}
