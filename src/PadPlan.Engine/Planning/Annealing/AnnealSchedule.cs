namespace PadPlan.Planning;

/// <summary>The adaptive cooling schedule and move-range limiter of VPR (Betz and Rose, 1997): the acceptance rate of the last temperature sets how fast to cool and how far moves may reach; the run stops when it has converged.</summary>
internal sealed class AnnealSchedule(double startTemperature, double maxRange, double startRange, double middleCooling = PlacerLimits.MiddleCooling)
{
    private readonly double _maxRange = maxRange;
    private double _lastTotal = double.NaN;
    private int _quietSteps;

    public AnnealSchedule(double startTemperature, double maxRange) : this(startTemperature, maxRange, maxRange) { }

    public double Temperature { get; private set; } = startTemperature;
    public double Range { get; private set; } = Math.Clamp(startRange, PlacerLimits.MinRange, maxRange);
    public int Step { get; private set; }
    public double Acceptance { get; private set; } = 1;

    /// <summary>Cools after one temperature's moves. Cooling factors are VPR's (but 0.9 in the middle band on larger circuits, see docs/placement.md): slow in the productive middle, fast when nearly everything or nearly nothing is accepted.</summary>
    /// <param name="acceptance">Share of the last temperature's moves that were kept.</param>
    /// <param name="total">Annealing cost (soft cost plus weighted violations) after the last temperature.</param>
    public void Update(double acceptance, double total)
    {
        var alpha = acceptance > 0.96 ? 0.5 : acceptance > 0.8 ? 0.9 : acceptance > 0.15 ? middleCooling : 0.8;
        Temperature *= alpha;
        Range = Math.Clamp(Range * (1 - PlacerLimits.TargetAcceptance + acceptance), PlacerLimits.MinRange, _maxRange);
        Step++;
        Acceptance = acceptance;
        var change = double.IsNaN(_lastTotal) ? double.PositiveInfinity : Math.Abs(total - _lastTotal) / Math.Max(1e-9, Math.Abs(_lastTotal));
        // Acceptance alone cannot say "frozen": moves that change nothing (an equal ground landing, a pad nudged inside its slack) are always kept.
        _quietSteps = change < PlacerLimits.FrozenCostChange ? _quietSteps + 1 : 0;
        _lastTotal = total;
    }

    /// <summary>
    /// VPR's exit rule on the soft cost (the temperature is a small fraction of the average cost per net, so no uphill move is still
    /// worth taking), or convergence: a few temperatures in a row that change the cost by almost nothing.
    /// Broken rules keep the run going: while they last the growing penalty keeps the total moving.
    /// </summary>
    public bool Done(double softCost, double violation, int nets) =>
        Step >= PlacerLimits.MaxSteps
        || _quietSteps >= PlacerLimits.FrozenSteps
        || (Temperature < PlacerLimits.StopFraction * softCost / Math.Max(1, nets) && violation <= PlacerLimits.ViolationTolerance);
}
