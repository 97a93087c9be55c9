namespace PadPlan.Materials.Cutting;

/// <summary>A free rectangle of one stock piece, in kerf-grown coordinates, during packing.</summary>
internal readonly record struct FreeRect(int Stock, double X, double Y, double Width, double Height)
{
    public double Area => Width * Height;
}
