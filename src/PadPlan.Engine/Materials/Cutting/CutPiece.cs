using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>One piece to cut from stock: a rectangle pad, a scored strip, or a strip for punching discs. Length runs along X of the piece (Width), the strip's width across (Height).</summary>
public sealed record CutPiece
{
    public CutPiece(string id, CutPieceKind kind, double width, double height, double thickness, ValueList<string> pads, ValueList<double>? positions = null, double scoreWidth = 0)
    {
        Id = Guard.Name(id, "piece id");
        Kind = kind;
        Width = Guard.Positive(width, "piece width");
        Height = Guard.Positive(height, "piece height");
        Thickness = Guard.Positive(thickness, "piece stock thickness");
        Pads = pads;
        Positions = positions ?? ValueList<double>.Empty;
        ScoreWidth = Guard.NonNegative(scoreWidth, "score width");
    }

    public string Id { get; }
    public CutPieceKind Kind { get; }
    public double Width { get; }
    public double Height { get; }
    /// <summary>Thickness of the board the piece is cut from (mm).</summary>
    public double Thickness { get; }
    /// <summary>The pad or segment ids this piece gives.</summary>
    public ValueList<string> Pads { get; }
    /// <summary>Score centres (strips) or disc centres (punching strips), mm from the start end; empty for rectangles.</summary>
    public ValueList<double> Positions { get; }
    /// <summary>Width of each score across a strip (mm): wider than usual where high voltage stands between neighbouring segments; 0 for other pieces.</summary>
    public double ScoreWidth { get; }

    public double Area => Width * Height;
}
