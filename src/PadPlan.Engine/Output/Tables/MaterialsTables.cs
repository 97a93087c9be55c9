using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Materials.Cutting;

namespace PadPlan.Output.Tables;

/// <summary>Every materials table of a placed project: cut list, BOM, build order and test plan, each by name and all in the order a builder uses them.</summary>
/// <remarks>Cutting is the cut list the tables come from, which the report pages also draw.</remarks>
public sealed record MaterialsTables(IReadOnlyList<ReportTable> CutList, ReportTable Bom, ReportTable BuildOrder, IReadOnlyList<ReportTable> TestPlan, CutList? Cutting = null)
{
    public IReadOnlyList<ReportTable> All => [.. CutList, Bom, BuildOrder, .. TestPlan];

    public static MaterialsTables Of(Project project, CutOptions? cut = null, PadPlan.Simulation.SimulationResult? simulation = null)
    {
        var layout = project.Layout ?? throw new ArgumentException($"project {project.Name} has no layout yet; run 'padplan place' first.", nameof(project));
        var cutting = CutListBuilder.Build(layout, cut ?? CutOptions.Default);
        return new MaterialsTables(
            CutListTables.From(cutting),
            BomTable.From(project),
            BuildOrderTable.Table(project),
            TestPlanTables.Tables(project, simulation: simulation),
            cutting);
    }
}
