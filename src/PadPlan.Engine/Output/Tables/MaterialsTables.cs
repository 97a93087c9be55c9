using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Materials.Cutting;

namespace PadPlan.Output.Tables;

/// <summary>Every materials table of a placed project: cut list, BOM, build order and test plan, each by name and all in the order a builder uses them.</summary>
public sealed record MaterialsTables(IReadOnlyList<ReportTable> CutList, ReportTable Bom, ReportTable BuildOrder, IReadOnlyList<ReportTable> TestPlan)
{
    public IReadOnlyList<ReportTable> All => [.. CutList, Bom, BuildOrder, .. TestPlan];

    public static MaterialsTables Of(Project project, CutOptions? cut = null)
    {
        var layout = project.Layout ?? throw new ArgumentException($"project {project.Name} has no layout yet; run 'padplan place' first.", nameof(project));
        return new MaterialsTables(
            CutListTables.From(CutListBuilder.Build(layout, cut ?? CutOptions.Default)),
            BomTable.From(project),
            BuildOrderTable.Table(project),
            TestPlanTables.Tables(project));
    }
}
