using PadPlan.Model;
using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>The analytic (spring) start: solved, not merely relaxed, so a long signal chain comes out in order along x.</summary>
public class SpringLayoutTests
{
    /// <summary>
    /// A plain chain (input landing, resistors joined end to end, output landing), its parts listed in shuffled order so the
    /// netlist order tells nothing. With the input anchored to the left edge and the output to the right, the least-squares
    /// spring positions are a discrete harmonic function on the chain, which by the discrete maximum principle (Doyle and
    /// Snell, "Random Walks and Electric Networks", 1984, from memory) runs monotonically from one anchor to the other. The
    /// spread keeps that order in its columns, so a part's column follows its place in the chain. 200 relaxation sweeps,
    /// the old solve, left the middle of such a chain at its random start (rank correlation near 0).
    /// </summary>
    [Theory]
    [InlineData(3, 60)]
    [InlineData(5, 150)]
    public void A_long_chain_starts_in_order_from_input_to_output(int seed, int length)
    {
        var parts = new List<Part> { TestCircuits.Part("J1", "landing-1", ("1", "N0")) };
        for (var k = 1; k <= length; k++) parts.Add(TestCircuits.Part($"R{k}", "res-axial-250mw", ("1", $"N{k - 1}"), ("2", $"N{k}")));
        parts.Add(TestCircuits.Part("J2", "landing-1", ("1", $"N{length}")));
        var nets = Enumerable.Range(0, length + 1).Select(k => new Net($"N{k}", Role: k == 0 ? SignalRole.Input : k == length ? SignalRole.Output : SignalRole.None));
        var rng = new Random(seed);
        var shuffled = (List<Part>)[.. parts.Select(p => (p, rng.Next())).OrderBy(t => t.Item2).Select(t => t.p)];
        var problem = ProblemBuilder.Build(TestCircuits.Project("chain", Board.Auto, nets, shuffled), PlacerSettings.Default, CostWeights.Default);
        var state = new AnnealState(problem);
        new Annealer(state, seed).SpringStart();
        var chainIndex = parts.Select((p, k) => (p.Ref, k)).ToDictionary(t => t.Ref, t => (double)t.k);
        var partItems = problem.Items.Where(i => i.IsPart).ToArray();
        var rho = Pearson(Ranks(partItems.Select(i => chainIndex[i.Part!.Ref])), Ranks(partItems.Select(i => state.X[i.Index])));
        // Spearman's rank correlation; 1 would be every column strictly in chain order (parts of one column share an x).
        Assert.True(rho > 0.95, $"rank correlation of chain position and start x: {rho:0.000}");
    }

    private static double[] Ranks(IEnumerable<double> values)
    {
        var v = values.ToArray();
        var sorted = v.Select((x, i) => (x, i)).OrderBy(p => p.x).ToArray();
        var ranks = new double[v.Length];
        for (var a = 0; a < sorted.Length;)
        {
            var b = a;
            while (b + 1 < sorted.Length && sorted[b + 1].x == sorted[a].x) b++;
            for (var k = a; k <= b; k++) ranks[sorted[k].i] = (a + b) / 2.0; // ties share their average rank
            a = b + 1;
        }
        return ranks;
    }

    private static double Pearson(double[] a, double[] b)
    {
        double ma = a.Average(), mb = b.Average(), ab = 0, aa = 0, bb = 0;
        for (var i = 0; i < a.Length; i++) { ab += (a[i] - ma) * (b[i] - mb); aa += (a[i] - ma) * (a[i] - ma); bb += (b[i] - mb) * (b[i] - mb); }
        return ab / Math.Sqrt(aa * bb);
    }
}
