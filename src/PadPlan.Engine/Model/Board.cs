namespace PadPlan.Model;

/// <summary>The base board: its copper is the ground plane. Width and height are null while the size is left to the placer ("auto").</summary>
public sealed record Board
{
    public Board(double? width, double? height, double cornerRadius = 0, double margin = 2.0, double thickness = 1.6, ValueList<Keepout>? keepouts = null)
    {
        if (width is null != height is null)
            throw new ArgumentException("Give both board width and height, or neither for an automatic size.", nameof(width));
        Width = Guard.PositiveOrNull(width, "board width");
        Height = Guard.PositiveOrNull(height, "board height");
        CornerRadius = Guard.NonNegative(cornerRadius, "corner radius");
        if (width is not null && cornerRadius * 2 > Math.Min(width.Value, height!.Value))
            throw new ArgumentOutOfRangeException(nameof(cornerRadius), cornerRadius, "corner radius must be at most half the shorter board side.");
        Margin = Guard.NonNegative(margin, "board margin");
        Thickness = Guard.Positive(thickness, "board thickness");
        Keepouts = keepouts ?? ValueList<Keepout>.Empty;
    }

    public double? Width { get; init; }
    public double? Height { get; init; }
    public double CornerRadius { get; init; }
    /// <summary>Distance every pad and body keeps from the board edge.</summary>
    public double Margin { get; init; }
    public double Thickness { get; init; }
    public ValueList<Keepout> Keepouts { get; init; }

    public bool IsAuto => Width is null;

    public static Board Auto { get; } = new(null, null);

    public Board WithSize(double width, double height) => new(width, height, CornerRadius, Margin, Thickness, Keepouts);
}
