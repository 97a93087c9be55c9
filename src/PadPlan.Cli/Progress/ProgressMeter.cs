using PadPlan.Planning;

namespace PadPlan.Cli.Progress;

/// <summary>
/// Turns the placer's reports into how far along it is: runs finished, temperature steps of the runs still going against the steps that
/// finished runs took, the best legal cost so far, and the time left at the pace so far. Pure bookkeeping; the clock is passed in.
/// </summary>
public sealed class ProgressMeter(int runs)
{
    /// <summary>Steps a run is taken to need before any run has finished: a middling anneal (common practice here, no source).</summary>
    public const int FirstGuessSteps = 120;

    private readonly Dictionary<int, int> _steps = [];
    private readonly HashSet<int> _finished = [];
    private int _typical;

    public int Runs { get; } = Math.Max(1, runs);
    /// <summary>The run of the latest report.</summary>
    public int Run { get; private set; } = 1;
    /// <summary>How many times the runs started over (another seed after the checker failed a layout, or a larger automatic board).</summary>
    public int Round { get; private set; } = 1;
    /// <summary>Lowest cost of a layout that broke no rule; null until there is one.</summary>
    public double? BestCost { get; private set; }

    public void Report(PlacerProgress p)
    {
        if (p.Stage == "annealing" && _finished.Contains(p.Run))
        {
            _finished.Clear();
            _steps.Clear();
            Round++;
        }
        Run = p.Run;
        if (p.Stage == "annealing") _steps[p.Run] = p.Step;
        else
        {
            _finished.Add(p.Run);
            _typical = Math.Max(_typical, _steps.GetValueOrDefault(p.Run));
        }
        if (p.Violation < 1e-9 && p.Stage != "not legal" && (BestCost is null || p.Cost < BestCost)) BestCost = p.Cost;
    }

    /// <summary>Share of this round's work done, 0 to 1; never 1 before every run has finished.</summary>
    public double Fraction
    {
        get
        {
            var expected = _typical > 0 ? _typical : FirstGuessSteps;
            var going = _steps.Where(kv => !_finished.Contains(kv.Key)).Sum(kv => Math.Min(0.95, (double)kv.Value / expected));
            return Math.Min(1.0, (_finished.Count + going) / Runs);
        }
    }

    /// <summary>Time left at the pace so far; null while too little is done to tell.</summary>
    public TimeSpan? Left(TimeSpan elapsed)
    {
        var f = Fraction;
        return f < 0.02 ? null : TimeSpan.FromSeconds(elapsed.TotalSeconds * (1 - f) / f);
    }
}
