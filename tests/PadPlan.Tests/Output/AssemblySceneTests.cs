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

    [Fact]
    public void A_dense_200_part_board_gets_clear_labels_at_a_larger_scale()
    {
        var project = SyntheticBoard.Build(200);
        var plan = Audit(project);
        // every tile of the view is a page of the book
        var book = SheetBook.Build(project, SheetFixtures.Options(), null, []);
        Assert.Equal(plan.Tiles.Tiles.Count, book.Sheets.Count(s => s.Kind == SheetKind.Assembly));
    }

    /// <summary>Chooses the view, prints what the audit finds and asserts it finds nothing; then checks leads and marks.</summary>
    private AssemblySheet.Plan Audit(Project project)
    {
        var plan = AssemblySheet.Choose(project, SheetFixtures.Options());
        var problems = SceneAudit.Problems(plan.Scene);
        foreach (var p in problems.Take(40)) output.WriteLine(p);
        output.WriteLine($"scale {plan.Scale}, {plan.Tiles.Tiles.Count} page(s), {plan.Scene.Labels.Count} labels, unresolved {plan.Scene.Unresolved}");
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
