namespace PadPlan.Output.Sheets;

/// <summary>What the sheets are printed on and the date they carry (fixed by the caller so that output repeats byte for byte).</summary>
/// <remarks>Simulation is the operating point (or why there is none) that voltages on the sheets come from.</remarks>
public sealed record SheetOptions(Paper Paper, DateOnly Date, PadPlan.Simulation.SimulationResult? Simulation = null)
{
    /// <summary>Least overlap between neighbouring tiles of a board larger than the paper (mm); common practice, no source.</summary>
    public double TileOverlap { get; init; } = 12;
    /// <summary>Largest enlargement of the assembly view for a small board (the largest of its standard scales, 5 : 1).</summary>
    public double MaxAssemblyScale { get; init; } = 5;
}
