using System.Globalization;
using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>
/// `--cost-breakdown CASE N`: one steadiness case placed with seeds 1 to N, and the placer's cost of each written layout taken
/// apart term by term. Each term is the cost less the cost with that term's weight at zero (or, for the RF and long-lead
/// surcharges, at no surcharge), so the terms overlap a little where an RF lead is also a long one. What the search trades
/// total lead against, and how much of the cost that is.
/// </summary>
internal static class CostBreakdown
{
    private static readonly (string Name, Func<CostWeights, CostWeights> Without)[] Terms =
    [
        ("jumpers", w => w with { Jumper = 0 }),
        ("RF surcharge", w => w with { RfFactor = 1, RfLongestLead = 0 }),
        ("long-lead surcharge", w => w with { LongLead = double.PositiveInfinity }),
        ("ground leads", w => w with { GroundLead = 0 }),
        ("pull to the middle", w => w with { Gravity = 0 }),
        ("input/output pull", w => w with { Flow = 0 }),
        ("landings to the edge", w => w with { LandingEdge = 0 }),
        ("bodies over pads", w => w with { FlatBodyOverPad = 0, UprightBodyOverPad = 0 }),
    ];

    public static void Run(Project project, string name, int seeds, PlacerSettings settings)
    {
        Console.WriteLine($"{name}, effort {settings.Effort}: the placer's cost of each layout and its terms");
        Console.WriteLine();
        Console.WriteLine("| seed | total lead (mm) | cost | " + string.Join(" | ", Terms.Select(t => t.Name)) + " |");
        Console.WriteLine("|---|---|---|" + string.Concat(Terms.Select(_ => "---|")));
        for (var seed = 1; seed <= seeds; seed++)
        {
            var placed = Placer.Place(project, settings with { Seed = seed });
            if (!placed.Succeeded) { Console.WriteLine($"| {seed} | failed: {placed.Failure!.Message} |"); continue; }
            var layout = placed.Project!;
            var weights = CostWeights.Default;
            var total = CostOf(layout, weights);
            var terms = Terms.Select(t => total - CostOf(layout, t.Without(weights)));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"| {seed} | {placed.Summary!.TotalLead:0.0} | {total:0.0} | {string.Join(" | ", terms.Select(v => v.ToString("0.0", CultureInfo.InvariantCulture)))} |"));
        }
    }

    /// <summary>The cost of a placed project's layout as it stands, under the given weights: every part and pad held where it is written.</summary>
    private static double CostOf(Project placed, CostWeights weights)
    {
        var state = new AnnealState(ProblemBuilder.Build(placed, new PlacerSettings(KeepExisting: true), weights));
        state.Recompute();
        return state.Cost;
    }
}
