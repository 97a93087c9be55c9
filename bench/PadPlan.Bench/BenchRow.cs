namespace PadPlan.Bench;

/// <summary>One benchmark case's figures: the annealing placer and the row baseline side by side.</summary>
internal sealed record BenchRow(
    string Case, int Parts, bool Placed, string Note, double Seconds, double MovesPerSecond, int Violations, double CheckMilliseconds,
    double LeadRatio, double AreaRatio, double Cost, int BaselineViolations, double BaselineLeadRatio, double BaselineAreaRatio, double BaselineCost, string Board)
{
    public double Gain => Cost > 0 ? BaselineCost / Cost : double.NaN;
}
