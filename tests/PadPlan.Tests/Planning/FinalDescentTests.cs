using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>The final descent of the kept layout (docs/placement.md section 4): greedy moves to a local minimum that never break a rule.</summary>
public class FinalDescentTests
{
    /// <summary>
    /// One annealed, legalised and polished run of the crystal oscillator, descended: still legal, cheaper, and no new rule
    /// broken. The run is what the placer keeps before its descent, so the gain shown is the one the placer takes.
    /// </summary>
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void Descent_keeps_a_legal_run_legal_and_lowers_its_cost(int seed)
    {
        var settings = new PlacerSettings(Seed: seed, Effort: Effort.Quick);
        var problem = ProblemBuilder.Build(ExampleProjects.Unplaced("xtal-osc-40m"), settings, CostWeights.Default);
        var state = new AnnealState(problem);
        // a single run is not always legal (the placer makes several): the first legal one of eight
        var run = Enumerable.Range(0, 8).Select(k =>
        {
            var a = new Annealer(state, seed * 7919L + k);
            a.Start(StartKind.Mixed, k);
            a.Run(settings.MovesFactor, null);
            return (Annealer: a, Legal: Legaliser.Finish(state));
        }).First(r => r.Legal);
        run.Annealer.Polish(settings.MovesFactor);
        Assert.True(Legaliser.Finish(state), string.Join("; ", state.Problems().Take(3)));
        var before = state.Cost;

        var moves = new Annealer(state, seed * 7919L + PlacerLimits.DescentRun).Descend(settings.MovesFactor);

        Assert.True(moves > 0);
        Assert.True(Legaliser.Finish(state), string.Join("; ", state.Problems().Take(3)));
        Assert.Empty(state.Problems());
        // common practice, no source (a greedy descent never raises the cost it descends); not a measured figure, a direction: a run ends with a quench of two temperatures' moves and the polish of one pass,
        // so rounds at several ranges still find moves that pay (docs/benchmarks.md, "The final descent": the kept layouts'
        // total lead fell by 4-17 % at the median over 20 seeds).
        Assert.True(state.Cost < before, $"cost {before:0.00} before the descent, {state.Cost:0.00} after");
    }
}
