using PadPlan.Model;

namespace PadPlan.Output.Tables;

/// <summary>A titled table of text cells: the common shape of the cut list, BOM, build order, test plan and check summary, printed as text, CSV or onto the report pages.</summary>
public sealed record ReportTable(string Title, ValueList<string> Columns, ValueList<ValueList<string>> Rows, ValueList<string>? Notes = null)
{
    public ValueList<string> Notes { get; } = Notes ?? ValueList<string>.Empty;

    public static ReportTable Create(string title, IEnumerable<string> columns, IEnumerable<IEnumerable<string>> rows, IEnumerable<string>? notes = null)
    {
        var cols = columns.ToValueList();
        var body = rows.Select(r => r.ToValueList()).ToValueList();
        foreach (var row in body)
            if (row.Count != cols.Count) throw new ArgumentException($"table '{title}': a row has {row.Count} cells for {cols.Count} columns.");
        return new ReportTable(title, cols, body, notes?.ToValueList());
    }
}
