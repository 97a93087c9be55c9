using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>
/// One straight saw or shear cut on a stock piece, in stock mm (origin at the stock's corner, y down), along the middle
/// of the kerf: Number is its place in the cut order on that stock (1 first); Vertical cuts run along y at X = Start.X.
/// It runs from edge to edge of the part of the board it divides (Start and End lie on that part's edges: a stock edge or the middle of an earlier cut).
/// </summary>
public sealed record StockCut(string StockId, int Number, bool Vertical, Point Start, Point End)
{
    /// <summary>Where the cut lies across its direction: x for a vertical cut, y for a horizontal one.</summary>
    public double At => Vertical ? Start.X : Start.Y;
}
