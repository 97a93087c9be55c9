namespace PadPlan.Planning;

/// <summary>The adaptive cooling schedule and move-range limiter of VPR (Betz and Rose, 1997): the acceptance rate of the last temperature sets how fast to cool and how far moves may reach.</summary>
internal sealed class AnnealSchedule(double startTemperature, double maxRange)
{
    private readonly double _maxRange = maxRange;

    public double Temperature { get; private set; } = startTemperature;
    public double Range { get; private set; } = maxRange;
    public int Step { get; private set; }

    /// <summary>Cools after one temperature's moves. Cooling factors are VPR's: slow in the productive middle, fast when nearly everything or nearly nothing is accepted.</summary>
    public void Update(double acceptance)
    {
        var alpha = acceptance > 0.96 ? 0.5 : acceptance > 0.8 ? 0.9 : acceptance > 0.15 ? 0.95 : 0.8;
        Temperature *= alpha;
        Range = Math.Clamp(Range * (1 - PlacerLimits.TargetAcceptance + acceptance), PlacerLimits.MinRange, _maxRange);
        Step++;
    }

    /// <summary>VPR's exit rule: the temperature is a small fraction of the average cost per net, so no uphill move is still worth taking.</summary>
    public bool Done(double cost, int nets) => Temperature < PlacerLimits.StopFraction * cost / Math.Max(1, nets) || Step >= PlacerLimits.MaxSteps;
}
