namespace PadPlan.Model;

/// <summary>A piece of board glued copper-up on the plane: one isolated island (or a scored strip of several).</summary>
public abstract record Pad(string Id, double StockThickness, bool Locked)
{
    public string Id { get; } = Guard.Name(Id, "pad id");
    /// <summary>Thickness of the stock the pad is cut from (mm); its edge is the creepage path to the plane.</summary>
    public double StockThickness { get; } = Guard.Positive(StockThickness, "pad stock thickness");

    /// <summary>The isolated copper islands this pad gives, in board coordinates.</summary>
    public abstract IReadOnlyList<Island> Islands();
}

/// <summary>A punched disc.</summary>
public sealed record RoundPad(string Id, string? Net, Point Center, double Diameter, double StockThickness = 1.6, bool Locked = false) : Pad(Id, StockThickness, Locked)
{
    public Point Center { get; } = Guard.Finite(Center, "pad centre");
    public double Diameter { get; } = Guard.Positive(Diameter, "pad diameter");

    public override IReadOnlyList<Island> Islands() => [new Island(Id, Net, Center, Diameter, Diameter, IslandShape.Round)];
}

/// <summary>A cut rectangle, axis-aligned, given by its centre.</summary>
public sealed record RectPad(string Id, string? Net, Point Center, double Width, double Height, double StockThickness = 1.6, bool Locked = false) : Pad(Id, StockThickness, Locked)
{
    public Point Center { get; } = Guard.Finite(Center, "pad centre");
    public double Width { get; } = Guard.Positive(Width, "pad width");
    public double Height { get; } = Guard.Positive(Height, "pad height");

    public override IReadOnlyList<Island> Islands() => [new Island(Id, Net, Center, Width, Height, IslandShape.Rect)];
}

/// <summary>One isolated length of a scored strip, with its own net.</summary>
public sealed record StripSegment(string Id, string? Net, double Length)
{
    public string Id { get; } = Guard.Name(Id, "segment id");
    public double Length { get; } = Guard.Positive(Length, "segment length");
}

/// <summary>A strip of board scored across into isolated segments, e.g. under a DIP row. Horizontal strips (R0) run left to right from their start; vertical strips (R90) run top to bottom.</summary>
public sealed record StripPad : Pad
{
    public StripPad(string id, Point start, bool vertical, double width, ValueList<StripSegment> segments, double scoreWidth = 0.6, double stockThickness = 1.6, bool locked = false)
        : base(id, stockThickness, locked)
    {
        Start = Guard.Finite(start, "strip start");
        Vertical = vertical;
        Width = Guard.Positive(width, "strip width");
        if (segments.Count == 0) throw new ArgumentException($"Strip {id} has no segments.", nameof(segments));
        Segments = segments;
        ScoreWidth = Guard.Positive(scoreWidth, "score width");
        foreach (var s in segments)
            if (s.Length <= scoreWidth) throw new ArgumentOutOfRangeException(nameof(segments), $"Strip {id}: segment {s.Id} is no longer than the score between segments.");
    }

    /// <summary>Centre of the strip's starting end (left end, or top end when vertical).</summary>
    public Point Start { get; init; }
    public bool Vertical { get; init; }
    /// <summary>Width across the strip (mm).</summary>
    public double Width { get; init; }
    public ValueList<StripSegment> Segments { get; init; }
    /// <summary>Width of the score between segments; each inner segment end loses half of it.</summary>
    public double ScoreWidth { get; init; }

    public double Length => Segments.Sum(s => s.Length);

    public override IReadOnlyList<Island> Islands()
    {
        var islands = new List<Island>(Segments.Count);
        var along = 0.0;
        for (var i = 0; i < Segments.Count; i++)
        {
            var seg = Segments[i];
            var from = along + (i > 0 ? ScoreWidth / 2 : 0);
            var to = along + seg.Length - (i < Segments.Count - 1 ? ScoreWidth / 2 : 0);
            var mid = (from + to) / 2;
            var center = Vertical ? new Point(Start.X, Start.Y + mid) : new Point(Start.X + mid, Start.Y);
            islands.Add(Vertical
                ? new Island(seg.Id, seg.Net, center, Width, to - from, IslandShape.Rect)
                : new Island(seg.Id, seg.Net, center, to - from, Width, IslandShape.Rect));
            along += seg.Length;
        }
        return islands;
    }
}

/// <summary>The shape of one copper island.</summary>
public enum IslandShape
{
    Round,
    Rect,
}

/// <summary>One isolated piece of pad copper in board coordinates: a round pad, a rectangle or one strip segment. Round islands have Width = Height = diameter.</summary>
public sealed record Island(string Id, string? Net, Point Center, double Width, double Height, IslandShape Shape)
{
    public double Left => Center.X - Width / 2;
    public double Right => Center.X + Width / 2;
    public double Top => Center.Y - Height / 2;
    public double Bottom => Center.Y + Height / 2;
    public double Area => Shape == IslandShape.Round ? Math.PI * Width * Width / 4 : Width * Height;
}
