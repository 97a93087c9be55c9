using System.Text;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): netlists had no size or part limit (a 1M-resistor deck imported with exit 0 into a 558 MB
/// project every other command refused; 20,000 parts imported), and chained K lines merged in quadratic time. Import
/// now applies the project's limits, cheapest first, and merges K lines by union-find.
/// </summary>
public sealed class Regression_NetlistWithoutLimits
{
    [Fact]
    public void A_20000_part_deck_is_refused_at_the_first_line_over_the_limit()
    {
        var deck = new StringBuilder("big deck\n");
        for (var i = 0; i < 20_000; i++) deck.Append($"R{i} n{i} n{i + 1} 1k\n");
        var result = Import(deck.ToString(), "big.cir");
        Assert.Equal(2, result.ExitCode);
        // line 10,002: the title, then 10,000 element lines allowed
        Assert.Contains("big.cir:10002: the netlist has more than 10000 element lines", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_netlist_of_501_parts_is_refused_naming_the_limit_of_500()
    {
        var ppn = new StringBuilder("title many\n");
        for (var i = 0; i < 501; i++) ppn.Append($"R{i} 1k 1=N{i} 2=GND\n");
        var result = Import(ppn.ToString(), "many.ppn");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("many.ppn:502: the netlist has more than 500 parts", result.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_line_longer_than_2000_characters_is_refused_whole_with_its_line()
    {
        var result = Import($"t\nR1 a 0 1k\nR2 a 0 {new string('9', 2001)}\n", "long.cir");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("long.cir:3: this line has 2008 characters", result.Err, StringComparison.Ordinal);
        var joined = Import("t\nR1 a 0 1k\n" + string.Concat(Enumerable.Repeat("+ x=1\n", 500)), "joined.cir");
        Assert.Equal(2, joined.ExitCode);
        Assert.Contains("with its '+' continuation lines", joined.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Forty_thousand_chained_K_lines_merge_into_one_core()
    {
        // 40,000 chained K lines took 54 s in the quadratic merge; the merge alone is tested here, below the parser's limits
        const int windings = 40_001;
        var parts = Enumerable.Range(0, windings)
            .Select(i => new NetlistPart($"L{i}", PartKind.Inductor, "1u", null, null, null, null,
                new[] { new NetlistPin("1", $"n{i}"), new NetlistPin("2", "0") }.ToValueList(), Positional: true, i + 2))
            .ToList();
        var couplings = Enumerable.Range(0, windings - 1)
            .Select(i => new WindingCoupling($"K{i}", new[] { $"L{i + 1}", $"L{i}" }.ToValueList(), 0.9, windings + i + 2))
            .ToList();
        var merged = WindingMerger.Merge(parts, couplings, "chain.cir");
        var core = Assert.Single(merged);
        Assert.Equal(2 * windings, core.Pins.Count);
        Assert.Equal("n0", core.Pins[0].Net); // windings in netlist order: L0 first
        Assert.Equal("K0", core.Model);
    }

    private static CliRunner.Result Import(string text, string name)
    {
        var dir = TestPaths.NewTempDir();
        var file = Path.Combine(dir, name);
        File.WriteAllText(file, text);
        var result = CliRunner.Run("import", file, "-o", Path.Combine(dir, "out.padplan.json"), "-q");
        Assert.False(File.Exists(Path.Combine(dir, "out.padplan.json")));
        return result;
    }
}
