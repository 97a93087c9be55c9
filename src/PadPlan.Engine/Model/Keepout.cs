namespace PadPlan.Model;

/// <summary>An area of the board where no pad, body or ground landing may go (mounting hole, standoff, heat sink).</summary>
public abstract record Keepout(string Id)
{
    public string Id { get; } = Guard.Name(Id, "keep-out id");
}

/// <summary>A round keep-out, e.g. a mounting hole with its washer.</summary>
public sealed record CircleKeepout(string Id, Point Center, double Diameter) : Keepout(Id)
{
    public Point Center { get; } = Guard.Finite(Center, "keep-out centre");
    public double Diameter { get; } = Guard.Positive(Diameter, "keep-out diameter");
}

/// <summary>An axis-aligned rectangular keep-out, given by its centre.</summary>
public sealed record RectKeepout(string Id, Point Center, double Width, double Height) : Keepout(Id)
{
    public Point Center { get; } = Guard.Finite(Center, "keep-out centre");
    public double Width { get; } = Guard.Positive(Width, "keep-out width");
    public double Height { get; } = Guard.Positive(Height, "keep-out height");
}
