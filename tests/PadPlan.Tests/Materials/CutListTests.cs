using PadPlan.Model;
using PadPlan.Materials;
using PadPlan.Output.Tables;
using PadPlan.Materials.Cutting;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Materials;

public sealed class CutListTests
{
    [Fact]
    public void Counts_equal_the_layouts_pads_for_the_tiny_buffer()
    {
        var project = ProjectFile.Read(TestPaths.TinyBuffer);
        var list = CutListBuilder.Build(project.Layout!, CutOptions.Default);
        var rounds = project.Layout!.Pads.OfType<RoundPad>().ToList();
        Assert.Equal(rounds.Count, list.Rounds.Sum(g => g.Count));
        foreach (var g in list.Rounds)
            Assert.Equal(rounds.Where(p => Math.Abs(p.Diameter - g.Diameter) < 0.01).Select(p => p.Id).Order(), g.Pads.Order());
        Assert.Equal(project.Layout.Islands().Count(), list.IslandCount);
        Assert.True(list.Plan.Complete);
        Assert.Null(PlanGeometry.Problem(list.Plan));
    }

    [Fact]
    public void Counts_equal_the_pads_of_a_layout_with_strips_rects_and_two_thicknesses()
    {
        var layout = Circuits.MixedLayout();
        var list = CutListBuilder.Build(layout, CutOptions.Default);
        Assert.Equal(15, layout.Islands().Count());
        Assert.Equal(15, list.IslandCount);
        // Grouped by punch and by thickness: 4.76 on 1.6 (P1 P2), 3.97 on 1.6 (P3), 4.76 on 0.8 (P4 P5).
        Assert.Equal(
            [(4.76, 0.8, "P4 P5"), (3.97, 1.6, "P3"), (4.76, 1.6, "P1 P2")],
            list.Rounds.Select(g => (g.Diameter, g.Thickness, string.Join(" ", g.Pads))));
        // Every pad and segment appears exactly once across rounds and pieces.
        var ids = list.Rounds.SelectMany(g => g.Pads).Concat(list.Pieces.SelectMany(p => p.Pads)).Order().ToList();
        Assert.Equal(layout.Islands().Select(i => i.Id).Order(), ids);
        // Default stock: one offcut per thickness, and the plan is sound.
        Assert.Equal(2, list.Plan.Stock.Count);
        Assert.True(list.Plan.Complete);
        Assert.Null(PlanGeometry.Problem(list.Plan));
    }

    // A DIP row strip: four 2.54 mm segments (JEDEC MS-001 pitch) give a 10.16 mm strip scored at 2.54, 5.08, 7.62 mm.
    [Fact]
    public void A_scored_strip_gives_its_length_and_score_positions()
    {
        var list = CutListBuilder.Build(Circuits.MixedLayout(), CutOptions.Default);
        var strip = list.Pieces.Single(p => p.Id == "SA");
        Assert.Equal(CutPieceKind.Strip, strip.Kind);
        Assert.Equal(10.16, strip.Width, 9);
        Assert.Equal(3, strip.Height);
        Assert.Equal([2.54, 5.08, 7.62], strip.Positions.Select(x => Math.Round(x, 9)));
    }

    // Punching strip rule (common practice, no source): width d + 1 mm, one disc every d + 1 mm.
    // Two 4.76 mm discs: 11.52 x 5.76 mm, punched at 2.88 and 8.64 mm.
    [Fact]
    public void Round_pads_become_punching_strips_of_disc_plus_margin()
    {
        var list = CutListBuilder.Build(Circuits.MixedLayout(), CutOptions.Default);
        var strip = list.PunchStrips.Single(p => p.Pads.SequenceEqual(["P1", "P2"]));
        Assert.Equal(11.52, strip.Width, 9);
        Assert.Equal(5.76, strip.Height, 9);
        Assert.Equal([2.88, 8.64], strip.Positions.Select(x => Math.Round(x, 9)));
    }

    [Fact]
    public void Many_discs_are_split_into_strips_no_longer_than_the_stock()
    {
        var group = new PunchGroup(4.76, 1.6, Enumerable.Range(1, 25).Select(i => $"P{i}").ToValueList());
        // 50 mm stock holds floor(50 / 5.76) = 8 discs per strip: 25 discs need 4 strips (8 + 8 + 8 + 1).
        var strips = CutListBuilder.PunchStrips(group, [new StockPiece("S1", 50, 30, 1.6)], 1.0).ToList();
        Assert.Equal([8, 8, 8, 1], strips.Select(s => s.Pads.Count));
        Assert.All(strips, s => Assert.True(s.Width <= 50));
    }

    [Fact]
    public void Too_small_stock_and_missing_thickness_are_said_plainly()
    {
        var options = new CutOptions(ValueList.Of(new StockPiece("S1", 8, 8, 1.6)));
        var list = CutListBuilder.Build(Circuits.MixedLayout(), options);
        Assert.False(list.Plan.Complete);
        var text = TableText.ToText(CutListTables.Plan(list));
        Assert.Contains("DOES NOT FIT: SA", text);
        Assert.Contains("the stock is too small", text);
        Assert.Contains("no stock of that thickness", text);
        Assert.Contains("WxHx0.8", text);
    }

    [Fact]
    public void The_tables_carry_the_glass_fibre_caution_and_utilisation()
    {
        var list = CutListBuilder.Build(Circuits.MixedLayout(), CutOptions.Default);
        var tables = CutListTables.From(list);
        Assert.Equal(3, tables.Count);
        var plan = TableText.ToText(tables[2]);
        Assert.Contains("glass-fibre dust", plan);
        Assert.Contains("dust mask", plan);
        Assert.Contains("Utilisation", plan);
        Assert.Equal(list.Plan.Placed.Count, tables[2].Rows.Count);
    }

    [Theory]
    [InlineData("100x160", 100, 160, 1.6)]
    [InlineData("60 x 40 x 0.8", 60, 40, 0.8)]
    [InlineData("75.5X50mm", 75.5, 50, 1.6)]
    public void Stock_sizes_parse(string text, double w, double h, double t)
    {
        var s = StockText.Parse(text, "S1", 1.6);
        Assert.Equal((w, h, t), (s.Width, s.Height, s.Thickness));
    }

    [Theory]
    [InlineData("100by160", "100x160")]
    [InlineData("100", "100x160")]
    [InlineData("-5x10", "100x160")]
    [InlineData("", "100x160")]
    [InlineData("0x50", "more than 0 mm")]
    public void Bad_stock_text_says_what_to_type(string text, string hint)
    {
        var e = Assert.Throws<FormatException>(() => StockText.Parse(text, "S1", 1.6));
        Assert.Contains(hint, e.Message);
    }
}
