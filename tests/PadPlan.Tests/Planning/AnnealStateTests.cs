using PadPlan.Model;
using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>Verify mode: the annealer's incremental cost must equal a recomputation from scratch after many moves.</summary>
public class AnnealStateTests
{
    [Theory]
    [InlineData(0.4)]
    [InlineData(0.0)]
    public void Incremental_cost_matches_a_full_recount(double slack)
    {
        var (problem, state) = RandomWalk(slack);
        var (cost, violation) = (state.Cost, state.Violation);
        state.Recompute();
        Assert.Equal(state.Cost, cost, 6);
        Assert.Equal(state.Violation, violation, 6);
        Assert.True(violation > 0, "the random walk should leave some rule broken, or the check proves little");
    }

    /// <summary>The count of bodies each run meets, kept move by move, lets a move skip the search for a run it leaves alone; it must equal a recount, exactly.</summary>
    [Theory]
    [InlineData(0.4)]
    [InlineData(0.0)]
    public void Bodies_met_by_each_run_match_a_full_recount(double slack)
    {
        var (problem, state) = RandomWalk(slack);
        var kept = Enumerable.Range(0, problem.Leads.Length).Select(state.RunMeets).ToArray();
        state.Recompute();
        var recounted = Enumerable.Range(0, problem.Leads.Length).Select(state.RunMeets).ToArray();
        Assert.Equal(recounted, kept);
        Assert.True(kept.Any(n => n > 0), "some run should pass under a body, or the check proves little");
    }

    /// <summary>
    /// A move is measured in stages, and the annealer rejects it at the first stage whose lower bound is already over the
    /// draw's threshold (the legaliser, at the first whose bound of the violation change rules it out). That decides exactly as measuring it whole only if no bound is ever above the whole change, to the
    /// bit; and the violation of lead runs and crossings the bounds rest on, and each lead's count of leads it comes too near
    /// (a lead whose old path came near none is not searched), kept move by move, must match a recount.
    /// </summary>
    [Theory]
    [InlineData(0.4, 10.0)]
    [InlineData(0.0, 1e6)]
    public void Each_stage_bounds_the_whole_change_from_below(double slack, double penalty)
    {
        var problem = ProblemBuilder.Build(TestCircuits.Random(11, 14), PlacerSettings.Default, CostWeights.Default);
        var state = new AnnealState(problem);
        var annealer = new Annealer(state, 5);
        annealer.Start(StartKind.Spring, 0);
        annealer.Run(PlacerSettings.Default.MovesFactor, null); // a settled layout, where the bounds have work to do
        state.Slack = slack;
        state.Penalty = penalty;
        state.Recompute();
        var rng = new Random(3);
        var movable = problem.Items.Where(i => !i.Fixed).Select(i => i.Index).ToArray();
        var (rejectable, broken) = (0, 0);
        for (var k = 0; k < 3000; k++)
        {
            OpenRandomMove(state, rng, movable, shift: 2, turnEveryTime: false);
            var bounds = new double[3];
            var violationBounds = new double[3];
            (bounds[0], violationBounds[0]) = (state.EvaluateNets(), state.ViolationBound);
            (bounds[1], violationBounds[1]) = (state.EvaluatePairs(), state.ViolationBound);
            (bounds[2], violationBounds[2]) = (state.EvaluateRunsStage(), state.ViolationBound);
            state.EvaluateCrossings();
            var whole = state.DeltaCost + state.Penalty * state.DeltaViolation;
            foreach (var bound in bounds) Assert.True(bound <= whole, $"move {k}: a stage's bound {bound} is above the whole change {whole}");
            // the legaliser's searches stop on the violation alone (EvaluateWithin)
            foreach (var bound in violationBounds) Assert.True(bound <= state.DeltaViolation, $"move {k}: a stage's violation bound {bound} is above the whole violation change {state.DeltaViolation}");
            if (bounds.Any(b => b > 0)) rejectable++;
            if (state.LeadPathViolation.Runs + state.LeadPathViolation.Crossings > 0) broken++;
            // keep downhill moves and some uphill ones, so the walk settles near legal and still breaks rules now and then
            if (whole <= 0 || rng.Next(40) == 0) state.Commit();
            else state.Rollback();
        }
        var kept = state.LeadPathViolation;
        var keptCounts = Enumerable.Range(0, problem.Leads.Length).Select(state.CrossCount).ToArray();
        state.Recompute();
        Assert.Equal(state.LeadPathViolation.Runs, kept.Runs, 6);
        Assert.Equal(state.LeadPathViolation.Crossings, kept.Crossings, 6);
        // a move skips the search of a lead's old path when it came too near no lead, so that count must be exact
        Assert.Equal(Enumerable.Range(0, problem.Leads.Length).Select(state.CrossCount).ToArray(), keptCounts);
        Assert.True(keptCounts.Any(n => n > 0), "no lead path crossed another at the end of the walk: the count check proves little");
        Assert.True(rejectable is > 300 and < 2700, $"{rejectable} of 3000 moves could be rejected before the last stage: the check proves little");
        Assert.True(broken > 100, $"lead paths broke a rule after only {broken} moves of 3000: the bounds never had violation to allow for, so the check proves little");
    }

    /// <summary>
    /// The crossing searches read only the lead paths the grid files near a path, out to the most any pair can need; they must
    /// find every pair that comes too near. Against a sum over every pair of leads, on many crowded layouts.
    /// </summary>
    [Fact]
    public void Crossing_searches_find_every_pair_that_comes_too_near()
    {
        // large enough that a scattered lead's path spans more grid cells than a search reads as a box (BucketGrid.AlongSegment)
        var problem = ProblemBuilder.Build(TestCircuits.Random(11, 150), PlacerSettings.Default, CostWeights.Default);
        var state = new AnnealState(problem);
        var broken = 0;
        for (var seed = 0; seed < 30; seed++)
        {
            new Annealer(state, seed).Scatter();
            state.Slack = seed % 2 == 0 ? 0 : 0.4;
            state.Recompute();
            var everyPair = state.CrossingByEveryPair();
            // summed in another order: equal to rounding, far below any pair's share
            Assert.True(Math.Abs(everyPair - state.CrossingViolation) <= 1e-9 * Math.Max(1, everyPair), $"layout {seed}: every pair gives {everyPair} mm, the searches {state.CrossingViolation} mm");
            if (everyPair > 0) broken++;
        }
        Assert.True(broken > 20, $"leads crossed on only {broken} of 30 layouts: the check proves little");
    }

    /// <summary>Opens a random move: an item shifted by up to <paramref name="shift"/> mm each way (a part turned every time, or one time in three), and one move in four a second item set beside it.</summary>
    private static void OpenRandomMove(AnnealState state, Random rng, int[] movable, double shift, bool turnEveryTime)
    {
        var a = movable[rng.Next(movable.Length)];
        var b = rng.Next(4) == 0 ? movable[rng.Next(movable.Length)] : -1;
        if (b == a) b = -1;
        state.Begin(a, b);
        state.X[a] += rng.NextDouble() * 2 * shift - shift;
        state.Y[a] += rng.NextDouble() * 2 * shift - shift;
        if (state.Problem.Items[a].IsPart && (turnEveryTime || rng.Next(3) == 0)) state.Rot[a] = rng.Next(4);
        if (b >= 0) (state.X[b], state.Y[b]) = (state.X[a] + 1, state.Y[a] - 1);
    }

    private static (PlacementProblem Problem, AnnealState State) RandomWalk(double slack)
    {
        var problem = ProblemBuilder.Build(TestCircuits.Random(11, 14), PlacerSettings.Default, CostWeights.Default);
        var state = new AnnealState(problem);
        new Annealer(state, 5).Scatter();
        state.Slack = slack;
        state.Penalty = 10;
        state.Recompute();
        var rng = new Random(7);
        var movable = problem.Items.Where(i => !i.Fixed).Select(i => i.Index).ToArray();
        for (var k = 0; k < 3000; k++)
        {
            OpenRandomMove(state, rng, movable, shift: 4, turnEveryTime: true);
            state.Evaluate();
            if (rng.Next(2) == 0) state.Commit();
            else state.Rollback();
        }
        return (problem, state);
    }
}
