namespace PadPlan.Planning;

/// <summary>A progress report from a running placement: which run, what stage, the temperature step, the current cost and how far (mm, summed) the layout still breaks rules.</summary>
public readonly record struct PlacerProgress(int Run, string Stage, int Step, double Cost, double Violation)
{
    /// <summary>What is left to do, in plain words: the overlaps and overstretched leads the run must still clear, summed in mm.</summary>
    public string Remaining => Violation < 1e-9
        ? "nothing overlaps and every lead reaches; now shortening leads"
        : FormattableString.Invariant($"parts and pads still overlap, or leads still overreach, by {Violation:0.0} mm in all (0 when the plan is legal)");
}
