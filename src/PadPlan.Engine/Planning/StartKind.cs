namespace PadPlan.Planning;

/// <summary>Where annealing starts from.</summary>
public enum StartKind
{
    /// <summary>Both, run by run: even runs start from the spring placement, odd runs from a scatter, and the best result is kept. The spring start gives lower cost on most boards, the scatter legalises more surely on crowded ones.</summary>
    Mixed,
    /// <summary>An analytic global placement: parts where their nets pull them (a spring model solved for least squared wire), spread over the board in that order; annealed cool from there.</summary>
    Spring,
    /// <summary>Parts scattered at random over the board; annealed hot from there (classic simulated annealing).</summary>
    Scatter,
}
