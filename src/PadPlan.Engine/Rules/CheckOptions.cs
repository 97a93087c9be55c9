using PadPlan.Simulation;

namespace PadPlan.Rules;

/// <summary>
/// What a check reports beyond the rules: parasitic estimates for every net, not only those of class rf; and the
/// operating point (or why there is none), for the polarity and rating rules. With no simulation result given, those
/// rules are not run at all (the placer's gate, the editor); with one that says why there is no point, a note says so.
/// </summary>
public sealed record CheckOptions(bool ParasiticsForAllNets = false, SimulationResult? Simulation = null)
{
    public static CheckOptions Default { get; } = new();
}
