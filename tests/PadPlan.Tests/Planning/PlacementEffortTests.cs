using PadPlan.Model;
using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>Effort in proportion to the circuit: small boards run few moves, large ones still legalise at quick effort, and the result hardly depends on the seed.</summary>
public class PlacementEffortTests
{
    [Fact]
    public void Quick_effort_legalises_a_500_part_circuit()
    {
        var result = Placer.Place(TestCircuits.Chain(5, 500), new PlacerSettings(Seed: 1, Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        Assert.Empty(CheckerVerdict.Check(result.Project!));
    }

    /// <summary>
    /// The benchmark's own 500-part circuit (ICs on scored strips, RF nets with 5 mm leads, a supply net over every IC, unused
    /// IC pins on their own strip segments), at quick effort: legal, and the independent checker finds nothing, lead-crossing
    /// included. The automatic board may grow on the way (PlacerLimits.AutoGrowTries); how often is a benchmark figure
    /// (docs/benchmarks.md), not a test's. Before the height rules, seed 1 placed it after two growths; with them it found no
    /// legal layout (the test was skipped) until parts wired to both rows of one DIP got pads of their own from the start
    /// (AcrossRows): it now places on its first region, after one replanning (docs/benchmarks.md, "Parts wired to both rows").
    /// </summary>
    [Fact]
    public void Quick_effort_legalises_the_benchmark_500_part_circuit_and_the_checker_agrees()
    {
        var result = Placer.Place(PadPlan.Bench.SyntheticCircuit.Make(500, 1500), new PlacerSettings(Seed: 1, Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
        var findings = CheckerVerdict.Check(result.Project!);
        Assert.True(findings.Count == 0, string.Join("\n", findings));
    }

    [Fact]
    public void A_10_part_board_runs_far_fewer_moves_than_a_50_part_one()
    {
        // VPR (Betz and Rose, 1997): moves per temperature grow as N^(4/3), so 5x the parts is about 8.5x the moves per temperature.
        // Compared per run: small circuits get more runs, each of them cheap.
        var small = Placer.Place(TestCircuits.Chain(3, 10), PlacerSettings.Default);
        var large = Placer.Place(TestCircuits.Chain(3, 50), PlacerSettings.Default);
        Assert.True(small.Succeeded && large.Succeeded);
        var (perSmall, perLarge) = (small.Summary!.Moves / small.Summary.Runs, large.Summary!.Moves / large.Summary.Runs);
        Assert.True(perSmall * 3 < perLarge, $"10 parts: {perSmall} moves per run, 50 parts: {perLarge}");
    }

    /// <summary>The benchmark keeps the tight figures (total lead within 10 %, longest lead within 25 % over 10 seeds); CI asks for a generous bound only, so a slow machine or a small change cannot make it flaky.</summary>
    [Theory]
    [InlineData("tiny-buffer")]
    [InlineData("valve-stage")]
    [InlineData("xtal-osc-40m")]
    public void Lead_length_is_steady_from_seed_to_seed(string example)
    {
        var project = ExampleProjects.Unplaced(example);
        var totals = new List<double>();
        var longest = new List<double>();
        for (var seed = 1; seed <= 10; seed++)
        {
            var result = Placer.Place(project, new PlacerSettings(Seed: seed));
            Assert.True(result.Succeeded, result.Failure?.Message);
            totals.Add(result.Summary!.TotalLead);
            longest.Add(result.Summary.LongestLead);
        }
        // common practice, no source: the target is 10 % (measured, and missed, in docs/benchmarks.md). CI allows 1.3x between best
        // and worst seed for the total lead and 4x for the longest lead. Measured with the final descent (2026-12-05, seeds 1-10):
        // total lead 1.15x (tiny buffer), 1.18x (valve stage), 1.18x (crystal oscillator; 1.74x before the refining runs, 1.20x
        // before the descent); longest lead up to 2.7x. After the one-pass crossing term (11:35 UTC): 1.13x, 1.19x, 1.22x; longest
        // lead 1.4x, 1.7x and 3.6x (crystal oscillator, 3.3-11.8 mm). So the bound catches a return of the old spread, not the target.
        Assert.True(totals.Max() <= 1.3 * totals.Min(), $"total lead {string.Join(", ", totals.Select(t => t.ToString("0.0")))}");
        Assert.True(longest.Max() <= 4.0 * longest.Min(), $"longest lead {string.Join(", ", longest.Select(t => t.ToString("0.0")))}");
    }
}
