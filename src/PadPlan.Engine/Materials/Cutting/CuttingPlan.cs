using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>The result of nesting pieces on stock: where each piece is cut, what would not fit, and how well the stock is used.</summary>
public sealed record CuttingPlan(ValueList<StockPiece> Stock, ValueList<PlacedPiece> Placed, ValueList<CutPiece> Unplaced, double Kerf)
{
    public bool Complete => Unplaced.Count == 0;

    public IEnumerable<PlacedPiece> On(StockPiece stock) => Placed.Where(p => p.StockId == stock.Id);

    /// <summary>The straight cuts that free every piece on one stock piece, numbered in the order to make them (<see cref="CutOrder"/>).</summary>
    public ValueList<StockCut> CutsOn(StockPiece stock) => CutOrder.On(this, stock);

    /// <summary>Stock pieces that have at least one piece cut from them.</summary>
    public IEnumerable<StockPiece> Used => Stock.Where(s => On(s).Any());

    /// <summary>Area of the pieces cut from one stock piece over its area (0..1).</summary>
    public double UtilisationOf(StockPiece stock) => On(stock).Sum(p => p.Piece.Area) / stock.Area;

    /// <summary>The corner region of a stock piece that holds all its pieces (width, height in mm); (0, 0) when none. Two straight cuts along its edges free it without touching a piece.</summary>
    public (double Width, double Height) Extent(StockPiece stock)
    {
        var on = On(stock).ToList();
        return on.Count == 0 ? (0, 0) : (on.Max(p => p.Right), on.Max(p => p.Bottom));
    }

    /// <summary>Area of all placed pieces over the area of the stock pieces used (0..1); 0 when nothing is placed.</summary>
    public double Utilisation
    {
        get
        {
            var used = Used.Sum(s => s.Area);
            return used > 0 ? Placed.Sum(p => p.Piece.Area) / used : 0;
        }
    }
}
