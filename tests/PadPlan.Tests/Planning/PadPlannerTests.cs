using Xunit;
using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Tests.Planning;

public class PadPlannerTests
{
    // DOMAIN 2 lead-capacity table (common practice, no source): 3.2 mm takes 2, 4.8 mm takes 3, 6.4 mm takes 4;
    // the smallest punch that covers the net wins (punch steps 1/8, 5/32, 3/16, 1/4 in).
    [Theory]
    [InlineData(1, 3.18)]
    [InlineData(2, 3.18)]
    [InlineData(3, 4.76)]
    [InlineData(4, 6.35)]
    public void Few_leads_get_the_smallest_round_pad_that_holds_them(int leads, double diameter)
    {
        var pad = Assert.Single(PadPlanner.PlanNet(new Net("N"), leads, Toolkit.Default, RuleSettings.Default));
        Assert.Equal(PlannedShape.Round, pad.Shape);
        Assert.Equal(diameter, pad.Width);
        Assert.True(pad.Capacity >= leads);
    }

    // Rectangles take one lead per 2.54 mm each way (common practice, no source): five leads need a 3 x 12.7 mm bar,
    // the smallest area of the toolkit's strip widths that holds them.
    [Fact]
    public void Many_leads_get_a_rectangle()
    {
        var pad = Assert.Single(PadPlanner.PlanNet(new Net("N"), 5, Toolkit.Default, RuleSettings.Default));
        Assert.Equal((PlannedShape.Rect, 3.0, 12.7, 5), (pad.Shape, pad.Width, pad.Height, pad.Capacity));
    }

    [Fact]
    public void More_leads_than_any_pad_holds_split_over_pads_that_together_hold_them()
    {
        var pads = PadPlanner.PlanNet(new Net("N"), 50, Toolkit.Default, RuleSettings.Default);
        Assert.True(pads.Count >= 2);
        Assert.True(pads.Sum(p => p.Capacity) >= 50);
    }

    /// <summary>After a failed try found a net's leads in groups too far apart for one pad, each group gets a pad (joined by wire links: common practice, no source).</summary>
    [Fact]
    public void A_net_found_in_groups_gets_a_pad_for_each_group_that_together_hold_its_leads()
    {
        var pads = PadPlanner.PlanNet(new Net("N"), 4, Toolkit.Default, RuleSettings.Default, atLeast: 2);
        Assert.Equal(2, pads.Count);
        Assert.True(pads.Sum(p => p.Capacity) >= 4);
        Assert.Equal(3, PadPlanner.PlanNet(new Net("N"), 3, Toolkit.Default, RuleSettings.Default, atLeast: 5).Count); // one per lead at most
    }

    [Fact]
    public void Without_wire_links_a_net_keeps_one_pad_however_its_leads_lie() =>
        Assert.Single(PadPlanner.PlanNet(new Net("N"), 4, Toolkit.Default, RuleSettings.Default with { AllowJumpers = false }, atLeast: 2));

    [Fact]
    public void No_leads_no_pad() => Assert.Empty(PadPlanner.PlanNet(new Net("N"), 0, Toolkit.Default, RuleSettings.Default));
}
