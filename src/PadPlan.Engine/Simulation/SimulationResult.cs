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

    /// <summary>The reason given when the user leaves the simulation out (--ngspice none).</summary>
    public const string SwitchedOff = "simulation switched off";

    public static SimulationResult NotFound { get; } = new(null, NoSimulator);

    /// <summary>
    /// What to do about a missing operating point: install or name ngspice when none was found, simulate when it was left out;
    /// when ngspice ran and found none, mend what the reason names, or report a deck that ngspice refused.
    /// </summary>
    public string Remedy => Reason switch
    {
        null => "",
        NoSimulator => $"Install ngspice (Debian package ngspice) or name it with --ngspice or {SimulationOptions.EnvironmentVariable}; then check again.",
        SwitchedOff => "Leave out --ngspice none to simulate.",
        _ when Reason.Contains("Error on line", StringComparison.OrdinalIgnoreCase) =>
            "ngspice refused the deck PadPlan wrote from the project, a fault of PadPlan's or a model ngspice cannot read: check the named line's part and its model, and report it with the project file.",
        _ => "ngspice ran but found no operating point: mend what the reason names, then check again.",
    };

    public static SimulationResult Of(OperatingPoint point) => new(point, null);

    public static SimulationResult Without(string reason) => new(null, reason);

    public bool Simulated => Point is not null;

    /// <summary>"no simulator found: upper bound from DC paths" and the like; "simulated by ngspice" when there is a point.</summary>
    public string Label => Point is not null ? "simulated by ngspice (operating point)" : $"{Reason}: {UpperBound}";
}
