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

    /// <summary>Independent runs (seeds Seed, Seed+1, ...) whose best result is kept; fixed by effort and circuit size, so the result never depends on the machine.</summary>
    public int RunsFor(int parts) => (Effort == Effort.Thorough ? 4 : 2) * (parts <= SmallCircuit ? 2 : 1);

    /// <summary>Scale of moves per temperature relative to the VPR default of N^(4/3).</summary>
    public double MovesFactor => Effort switch
    {
        Effort.Quick => 2.0,
        Effort.Thorough => 10.0,
        _ => 4.0,
    };
}
