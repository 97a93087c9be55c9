using PadPlan.Model;
using PadPlan.Output.Sheets;
using Xunit;
using Xunit.Abstractions;

namespace PadPlan.Tests.Output;

/// <summary>The assembly view's drawing model, checked on every example and on a dense synthetic board: labels clear and near their own objects, a drawn lead for every lead, a pin mark on every polarised or multi-pin part.</summary>
public class AssemblySceneTests(ITestOutputHelper output)
{
    public static TheoryData<string> Examples => new() { "xtal-osc-40m", "cw-filter", "jfet-preamp", "valve-stage", "tiny-buffer" };

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_views_have_no_label_problems_and_show_every_lead_and_mark(string name)
    {
        Audit(ExampleProjects.Placed(name));
    }

    [Theory]
    [InlineData("cw-filter", 0)]
    [InlineData("synthetic-50", 50)]
    public void A_41_part_and_a_50_part_board_print_on_one_A4_page_at_a_standard_scale_without_detail_pages(string name, int parts)
    {
        var project = parts > 0 ? SyntheticBoard.Compact(parts) : ExampleProjects.Placed(name);
        var plan = Audit(project);
        // the promise: one A4 page at 5 : 1 or less, scale one of 1, 3/2, 2, 5/2, 3, 4, 5 (ISO 5455 and its usual steps)
        Assert.Contains(plan.Scale, AssemblySheet.StandardScales);
        Assert.True(plan.Scale <= 5);
        Assert.Empty(plan.Details);
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, []);
        Assert.Equal(1, book.Sheets.Count(s => s.Kind == SheetKind.Assembly));
    }

    [Theory]
    [InlineData(100)]
    [InlineData(150)]
    public void Boards_of_100_and_150_parts_within_160_by_100_mm_get_one_overview_page_and_at_most_one_detail_page_per_50_parts(int parts)
    {
        var project = SyntheticBoard.Compact(parts);
        Assert.True(project.Board.Width <= 160 && project.Board.Height <= 100, $"{project.Board.Width} x {project.Board.Height}");
        var plan = Audit(project);
        Assert.Contains(plan.Scale, AssemblySheet.StandardScales);
        Assert.True(plan.Details.Count <= (parts + 49) / 50);
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, []);
        Assert.Equal(1 + plan.Details.Count, book.Sheets.Count(s => s.Kind == SheetKind.Assembly));
    }

    [Fact]
    public void A_reference_with_no_room_becomes_a_key_number_listed_in_the_parts_table()
    {
        var plan = AssemblySheet.Choose(SyntheticBoard.Compact(150), SheetFixtures.Options());
        var keyed = plan.Scene.Labels.Where(l => l.Role == LabelRole.PartKey).ToList();
        output.WriteLine($"{keyed.Count} key numbers");
        foreach (var label in keyed) Assert.Contains(plan.Key.Rows, r => r.Ref == label.TargetId && r.Key == label.Text);
        Assert.Equal(keyed.Count, plan.Key.Keyed);
        // every part is in the table once, in natural order
        Assert.Equal(plan.Scene.Parts.Select(p => p.Ref).Order(PadPlan.Model.NaturalOrder.Comparer), plan.Key.Rows.Select(r => r.Ref));
        // a reference printed on the view is at least 2 mm high on paper (the floor)
        foreach (var label in plan.Scene.Labels.Where(l => l.Role == LabelRole.PartName)) Assert.True(label.Box.Height >= 2 * 1.17 - 1e-9);
    }

    /// <summary>Chooses the view, prints what the audit finds and asserts it finds nothing; then checks leads and marks.</summary>
    private AssemblySheet.Plan Audit(Project project)
    {
        var plan = AssemblySheet.Choose(project, SheetFixtures.Options());
        var problems = SceneAudit.Problems(plan.Scene);
        foreach (var p in problems.Take(40)) output.WriteLine(p);
        output.WriteLine($"scale {plan.Scale}, {plan.Frame.PaperText}, {plan.Details.Count} detail page(s), {plan.Scene.Labels.Count} labels, keys {plan.Key.Keyed}, unresolved {plan.Scene.Unresolved}: "
            + string.Join(", ", plan.Scene.Labels.Where(l => !l.Clear).Select(l => $"{l.Role} {l.Text} of {l.TargetId}")));
        Assert.Empty(problems);
        AssertEveryLeadDrawnAndEveryPartMarked(project, plan.Scene);
        return plan;
    }

    /// <summary>A drawn lead from exit to landing for every lead the layout lands; a pin name or mark on every polarised or multi-pin part.</summary>
    private static void AssertEveryLeadDrawnAndEveryPartMarked(Project project, BoardScene scene)
    {
        foreach (var placement in project.Layout!.Placements)
        {
            var part = project.FindPart(placement.Ref)!;
            var footprint = project.FootprintOf(part);
            var pins = footprint.PinNames(part.Variant);
            foreach (var landing in placement.Leads)
            {
                var lead = Assert.Single(scene.Leads, l => l.Ref == part.Ref && string.Equals(l.Pin, landing.Pin, StringComparison.OrdinalIgnoreCase));
                Assert.Equal(scene.View.ToPage(landing.At), lead.Landing);
                Assert.Equal(landing.Pad, lead.Pad);
            }
            var polarised = pins.Any(p => p is "+" or "-" or "A" or "K") || footprint.Marks.Count > 0;
            if (!polarised && footprint.Leads.Count < 3) continue;
            var named = scene.Labels.Where(l => l.Role == LabelRole.PinName && l.TargetId.StartsWith(part.Ref + ".", StringComparison.Ordinal)).ToList();
            Assert.True(named.Count == placement.Leads.Count, $"{part.Ref}: {named.Count} pin names for {placement.Leads.Count} leads");
            foreach (var mark in footprint.Marks.Where(m => m.Kind != MarkKind.Plus))
                Assert.Contains(scene.Marks, m => m.Ref == part.Ref && m.Kind == mark.Kind && m.Lead == mark.Lead);
        }
    }
}
