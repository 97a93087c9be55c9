using PadPlan.Model;

namespace PadPlan.Output.Tables;

/// <summary>The import summary as a table: every source and what it became, every subcircuit call with its footprint and pinout, every assumed value and every element left off.</summary>
public static class ImportSummaryTable
{
    public const string Title = "Import summary";

    /// <summary>The table, or null when the project records no import summary (it was not imported, or nothing needed saying).</summary>
    public static ReportTable? For(Project project) =>
        project.Imported is { Summary.Count: > 0 } record
            ? ReportTable.Create(Title, ["Topic", "Item", "What it became"], record.Summary.Select(l => new[] { l.Topic, l.Item, l.Became }),
                ["Check each line against the circuit you mean to build; a parts map (--parts) changes footprints, pinouts and values."])
            : null;
}
