using PadPlan.Gate;
using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Rules;

/// <summary>
/// A footprint the import only guessed (here a diode whose type number it does not know, put on the small-signal DO-35)
/// stays a warning of the check, the proof step a builder runs, until the part is put on a footprint on purpose: the plan's
/// body, lead spacing and rating may not be the part's. Naming the footprint with `swap` (even the same one) confirms it.
/// </summary>
public class FootprintAssumedTests
{
    private static List<Finding> Assumed(Project project) =>
        Checker.Check(project with { Layout = Layout.Empty }).Findings.Where(f => f.RuleId == RuleIds.FootprintAssumed).ToList();

    [Fact]
    public void A_guessed_footprint_is_a_warning_until_swap_names_one()
    {
        var project = ImportFixture.Import("test\nV1 a 0 DC 5\nR1 a k 1k\nD1 k 0 DMYSTERY\n.model DMYSTERY D(IS=1n)\n.end\n").Project;
        var f = Assert.Single(Assumed(project));
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Equal(["D1"], f.Items);
        Assert.Contains("D1 (DMYSTERY) is on diode-glass-do35 because the import could not tell its package", f.Message);
        Assert.Contains("padplan swap PROJECT D1 --footprint NAME", f.Hint);

        var confirmed = PartSwap.Apply(project, new SwapRequest("D1", "diode-glass-do35"), null);
        Assert.Empty(Assumed(confirmed));
    }

    [Fact]
    public void A_known_type_raises_nothing()
    {
        var project = ImportFixture.Import("test\nV1 a 0 DC 5\nR1 a k 1k\nD1 k 0 D1N4148\n.model D1N4148 D(IS=1n)\n.end\n").Project;
        Assert.Empty(Assumed(project));
    }
}
