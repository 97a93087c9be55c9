using PadPlan.Materials;
using PadPlan.Model;

namespace PadPlan.Output.Tables;

/// <summary>The build order as a report table, with its notes and cautions.</summary>
public static class BuildOrderTable
{
    public static ReportTable Table(Project project)
    {
        var inputs = project.Nets.Where(n => n.Role == SignalRole.Input).Select(n => n.Name).ToList();
        var outputs = project.Nets.Where(n => n.Role == SignalRole.Output).Select(n => n.Name).ToList();
        var notes = new List<string>
        {
            inputs.Count > 0
                ? $"Steps follow the signal path from the input ({string.Join(", ", inputs)}){(outputs.Count > 0 ? $" to the output ({string.Join(", ", outputs)})" : "")}; within a stage, low parts before tall ones."
                : $"No net is marked as input, so the steps go across the board from left to right in {BuildOrder.ColumnWidth:0} mm columns; low parts before tall ones.",
            "Ground leads go straight to the plane, as short as the part allows.",
            "Caution: " + Cautions.Glue,
            "Caution: " + Cautions.Flux,
        };
        var unplaced = project.Parts.Where(p => project.Layout?.Placements.All(x => x.Ref != p.Ref) ?? true).Select(p => p.Ref).ToList();
        if (unplaced.Count > 0) notes.Insert(0, $"Not placed, so not in these steps: {string.Join(", ", unplaced)}.");
        if (Cautions.HighVoltageWarning(project) is { } hv) notes.Add("Caution: " + hv);
        // "Done" is left empty: a tick box on the printed sheet, a column to fill in on the text and CSV forms
        return ReportTable.Create("Build order", ["Step", "Do", "What", "Where", "Note", "Done"],
            BuildOrder.Steps(project).Select(s => new[] { s.Number.ToString(), s.Action, s.What, s.Where, s.Note, "" }), notes);
    }
}
