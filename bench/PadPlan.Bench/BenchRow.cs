namespace PadPlan.Bench;

/// <summary>One benchmark case's figures: the placer (times over several runs, quality of the first) and the row baseline side by side.</summary>
internal sealed record BenchRow(
    string Case, int Parts, bool Placed, string Note, Spread Seconds, Spread CpuSeconds, double MovesPerSecond, int Violations, double CheckMilliseconds,
    double LeadRatio, double WireRatio, double AreaRatio, double Cost, int BaselineViolations, double BaselineLeadRatio, double BaselineCost, string Board, string Load)
{
    public double Gain => Cost > 0 ? BaselineCost / Cost : double.NaN;
}

/// <summary>Median, lowest and highest of a few measurements.</summary>
internal readonly record struct Spread(double Median, double Min, double Max)
{
    public static Spread Of(IReadOnlyList<double> values)
    {
        var sorted = values.Order().ToArray();
        var mid = sorted.Length / 2;
        var median = sorted.Length % 2 == 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
        return new Spread(median, sorted[0], sorted[^1]);
    }

    /// <summary>Highest over lowest, less one: how far apart the measurements are.</summary>
    public double Width => Min > 0 ? Max / Min - 1 : 0;

    public override string ToString() => FormattableString.Invariant($"{Median:0.00} ({Min:0.00}-{Max:0.00})");
}
