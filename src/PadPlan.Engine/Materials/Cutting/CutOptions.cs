using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>What the cutting plan works with: the builder's stock, the saw kerf and the room a punch needs around a disc.</summary>
public sealed record CutOptions
{
    /// <summary>Stock assumed when the builder names none: one 100 x 160 mm offcut (a common board size) of each thickness the pads need.</summary>
    public const double DefaultStockWidth = 100;
    public const double DefaultStockHeight = 160;

    public CutOptions(ValueList<StockPiece>? stock = null, double kerf = 1.0, double punchMargin = 1.0)
    {
        Stock = stock ?? ValueList<StockPiece>.Empty;
        Kerf = Guard.NonNegative(kerf, "kerf");
        PunchMargin = Guard.NonNegative(punchMargin, "punch margin");
    }

    /// <summary>The builder's stock pieces, used in this order; empty takes the default offcut.</summary>
    public ValueList<StockPiece> Stock { get; }
    /// <summary>Material one saw cut removes (mm). 1.0 mm suits a hacksaw or fine saw; 0 for shears. Common practice, no source.</summary>
    public double Kerf { get; }
    /// <summary>Extra width and pitch a punching strip gets beyond the disc diameter (mm), so the punch bites whole board. Common practice, no source.</summary>
    public double PunchMargin { get; }

    public static CutOptions Default { get; } = new();
}
