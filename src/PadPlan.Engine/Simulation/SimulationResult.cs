namespace PadPlan.Simulation;

/// <summary>
/// The operating point, or why there is none. Every place that would show a simulated figure shows the reason instead,
/// followed by "upper bound from DC paths" when it falls back to the importer's estimate: never silent.
/// </summary>
public sealed record SimulationResult(OperatingPoint? Point, string? Reason)
{
    /// <summary>The reason given when no ngspice program is found.</summary>
    public const string NoSimulator = "no simulator found";

    /// <summary>What a figure printed instead of a simulated one is.</summary>
    public const string UpperBound = "upper bound from DC paths";

    public static SimulationResult NotFound { get; } = new(null, NoSimulator);

    public static SimulationResult Of(OperatingPoint point) => new(point, null);

    public static SimulationResult Without(string reason) => new(null, reason);

    public bool Simulated => Point is not null;

    /// <summary>"no simulator found: upper bound from DC paths" and the like; "simulated by ngspice" when there is a point.</summary>
    public string Label => Point is not null ? "simulated by ngspice (operating point)" : $"{Reason}: {UpperBound}";
}
