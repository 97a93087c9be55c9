using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Output.Sheets;
using PadPlan.Planning;
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
        var project = ExampleProjects.Placed(name);
        var plan = AssemblySheet.Choose(project, SheetFixtures.Options());
        var problems = SceneAudit.Problems(plan.Scene);
        foreach (var p in problems.Take(40)) output.WriteLine(p);
        output.WriteLine($"scale {plan.Scale}, {plan.Tiles.Tiles.Count} page(s), {plan.Scene.Labels.Count} labels, unresolved {plan.Scene.Unresolved}");
        Assert.Empty(problems);
    }
}
