using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Planning.Cutting;

namespace PadPlan.Output.Materials;

/// <summary>Every materials table of a placed project in the order a builder uses them: cut list, BOM, build order, test plan.</summary>
public static class MaterialsTables
{
    public static IReadOnlyList<ReportTable> All(Project project, CutOptions? cut = null)
    {
        var layout = project.Layout ?? throw new ArgumentException($"project {project.Name} has no layout yet; run 'padplan place' first.", nameof(project));
        return
        [
            .. CutListTables.From(CutListBuilder.Build(layout, cut ?? CutOptions.Default)),
            BomTable.From(project),
            BuildOrder.Table(project),
            .. TestPlan.Tables(project),
        ];
    }
}
