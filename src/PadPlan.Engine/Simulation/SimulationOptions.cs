namespace PadPlan.Simulation;

/// <summary>How to find and run the simulator: an explicit ngspice path (else the PADPLAN_NGSPICE environment variable, else PATH) and a time limit.</summary>
public sealed record SimulationOptions(string? NgspicePath = null, TimeSpan? TimeLimit = null, bool Off = false)
{
    /// <summary>The environment variable that names the ngspice program when no option does.</summary>
    public const string EnvironmentVariable = "PADPLAN_NGSPICE";

    /// <summary>The longest one operating point may take; a small board needs well under a second.</summary>
    public static readonly TimeSpan DefaultTimeLimit = TimeSpan.FromSeconds(20);

    public static SimulationOptions Default { get; } = new();

    public TimeSpan Limit => TimeLimit ?? DefaultTimeLimit;
}
