namespace PadPlan.Model;

/// <summary>Where one lead of a part lands: on a pad or strip segment (by id), or on the ground plane when Pad is null.</summary>
public sealed record LeadLanding(string Pin, string? Pad, Point At)
{
    public string Pin { get; } = Guard.Name(Pin, "lead pin");
    public Point At { get; } = Guard.Finite(At, "landing point");
    public bool OnPlane => Pad is null;
}

/// <summary>A part's place on the board and where each of its leads lands.</summary>
public sealed record Placement(string Ref, Point Position, Rotation Rotation, ValueList<LeadLanding> Leads)
{
    public string Ref { get; } = Guard.Name(Ref, "placement reference");
    public Point Position { get; } = Guard.Finite(Position, "part position");

    /// <summary>Maps a point in footprint coordinates to board coordinates.</summary>
    public Point ToBoard(Point local) => Position + local.Rotated(Rotation);
}

/// <summary>A wire link between two pads (or segments) of the same net, where no single pad holds every lead.</summary>
public sealed record Jumper(string Id, string From, string To, ValueList<Point>? Path = null)
{
    public string Id { get; } = Guard.Name(Id, "jumper id");
    public string From { get; } = Guard.Name(From, "jumper start pad");
    public string To { get; } = Guard.Name(To, "jumper end pad");
    /// <summary>Bend points between the two pads; empty for a straight link.</summary>
    public ValueList<Point> Path { get; } = Path ?? ValueList<Point>.Empty;
}

/// <summary>The physical plan: pads, part placements and jumpers.</summary>
public sealed record Layout(ValueList<Pad> Pads, ValueList<Placement> Placements, ValueList<Jumper> Jumpers)
{
    public static Layout Empty { get; } = new(ValueList<Pad>.Empty, ValueList<Placement>.Empty, ValueList<Jumper>.Empty);

    /// <summary>Every copper island of every pad.</summary>
    public IEnumerable<Island> Islands() => Pads.SelectMany(p => p.Islands());
}
