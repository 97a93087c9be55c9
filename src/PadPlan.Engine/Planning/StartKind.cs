namespace PadPlan.Planning;

/// <summary>Where annealing starts from.</summary>
public enum StartKind
{
    /// <summary>On a small circuit both, run by run: even runs start from the spring placement, odd runs from a scatter, and the best result is kept; on a larger circuit (more than <see cref="PlacerSettings.SmallCircuit"/> parts) every run starts from the spring placement, which gives lower cost there and legalises more surely.</summary>
    Mixed,
    /// <summary>An analytic global placement: parts where their nets pull them (a spring model solved for least squared wire), spread over the board in that order; annealed cool from there.</summary>
    Spring,
    /// <summary>Parts scattered at random over the board; annealed hot from there (classic simulated annealing).</summary>
    Scatter,
}
