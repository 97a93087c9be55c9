namespace PadPlan.Materials.Cutting;

/// <summary>Where a piece is cut from a stock piece: its corner nearest the stock's origin corner, and whether it lies turned a quarter.</summary>
public sealed record PlacedPiece(CutPiece Piece, string StockId, double X, double Y, bool Turned)
{
    /// <summary>Size along the stock's X as cut.</summary>
    public double Width => Turned ? Piece.Height : Piece.Width;
    /// <summary>Size along the stock's Y as cut.</summary>
    public double Height => Turned ? Piece.Width : Piece.Height;
    public double Right => X + Width;
    public double Bottom => Y + Height;
}
