using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>A piece of copper-clad board the builder has to cut pads from.</summary>
public sealed record StockPiece
{
    public StockPiece(string id, double width, double height, double thickness)
    {
        Id = Guard.Name(id, "stock id");
        Width = Guard.Positive(width, "stock width");
        Height = Guard.Positive(height, "stock height");
        Thickness = Guard.Positive(thickness, "stock thickness");
    }

    public string Id { get; }
    public double Width { get; }
    public double Height { get; }
    public double Thickness { get; }
    public double Area => Width * Height;

    /// <summary>Whether this stock is the same board thickness (within 0.01 mm).</summary>
    public bool IsThickness(double thickness) => Math.Abs(Thickness - thickness) < 0.01;
}
