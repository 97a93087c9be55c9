using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>`--runs-study CASE N`: N single annealing runs of one steadiness case from each start (spring, scatter), each legalised but not polished, with their temperatures, moves, cost and total lead (and what a run the legaliser cannot finish still breaks): how far apart the local minima of single runs lie.</summary>
internal static class RunsStudy
{
    public static void Run(Project project, int n, PlacerSettings settings)
    {
        var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
        foreach (var kind in new[] { StartKind.Spring, StartKind.Scatter })
        {
            var costs = new List<double>();
            for (var k = 0; k < n; k++)
            {
                var state = new AnnealState(problem);
                var a = new Annealer(state, 7919L + k);
                a.Start(kind, k);
                a.Run(settings.MovesFactor, null);
                var legal = Legaliser.Finish(state);
                var broken = legal ? "" : FormattableString.Invariant($" (broken by {state.Violation:0.00} mm: {string.Join("; ", state.Problems().Take(2))})");
                Console.WriteLine(FormattableString.Invariant($"{kind} {k}: temps {a.Stats.Temperatures} moves {a.Stats.TotalTried} legal {legal} cost {state.Cost:0.0} lead {state.LeadTotal():0.0}{broken}"));
                costs.Add(state.Cost);
            }
            var sp = Spread.Of(costs);
            Console.WriteLine(FormattableString.Invariant($"{kind}: cost {sp}"));
        }
    }
}
