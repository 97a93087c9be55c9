namespace PadPlan.Planning;

/// <summary>Everything a caller may choose about one placement run; all other numbers live in <see cref="CostWeights"/> and <see cref="PlacerLimits"/>.</summary>
/// <param name="Seed">Seed of the random moves: the same project and seed give the same layout, byte for byte.</param>
/// <param name="Effort">How long to anneal.</param>
/// <param name="KeepExisting">Keep every part and pad already in the layout where it is and place only the rest.</param>
/// <param name="AllowThreads">Run the independent annealing runs in parallel; the result does not depend on it.</param>
public sealed record PlacerSettings(int Seed = 1, Effort Effort = Effort.Normal, bool KeepExisting = false, bool AllowThreads = true)
{
    public static PlacerSettings Default { get; } = new();

    /// <summary>Where annealing starts: both starts run by run (default), the analytic spring placement, or a random scatter. See docs/benchmarks.md for the side-by-side figures.</summary>
    public StartKind Start { get; init; } = StartKind.Mixed;

    /// <summary>Circuits up to this many parts get twice the runs: each run is cheap, and the best of more seeds is markedly better.</summary>
    public const int SmallCircuit = 30;

    /// <summary>Circuits up to this many parts are placed for steadiness: slower cooling, every independent run made, then runs that anneal the best layout again (docs/placement.md, section 4).</summary>
    public const int SteadyCircuit = 100;

    /// <summary>All runs of a placement: the independent ones and those that start again from the best layout. Fixed by effort and circuit size, so the result never depends on the machine.</summary>
    public int RunsFor(int parts) => IndependentRunsFor(parts) + RefinesFor(parts);

    /// <summary>Independent runs (seed x 7919 + k) whose best result is kept.</summary>
    public int IndependentRunsFor(int parts) => (Effort == Effort.Thorough ? 4 : 2) * (parts <= SmallCircuit ? 2 : 1);

    /// <summary>Runs that start again from the best layout so far (none at quick effort or above <see cref="SteadyCircuit"/> parts).</summary>
    public int RefinesFor(int parts) => Effort == Effort.Quick || parts > SteadyCircuit ? 0 : PlacerLimits.RefineRuns;

    /// <summary>Scale of moves per temperature relative to the VPR default of N^(4/3).</summary>
    public double MovesFactor => Effort switch
    {
        Effort.Quick => 2.0,
        Effort.Thorough => 10.0,
        _ => 4.0,
    };
}
