using PadPlan.Model;

namespace PadPlan.Output.Tables;

/// <summary>A titled table of text cells: the common shape of the cut list, BOM, build order, test plan and check summary, printed as text, CSV or onto the report pages.</summary>
public sealed record ReportTable(string Title, ValueList<string> Columns, ValueList<ValueList<string>> Rows, ValueList<string>? Notes = null)
{
    public ValueList<string> Notes { get; } = Notes ?? ValueList<string>.Empty;

    public static ReportTable Create(string title, IEnumerable<string> columns, IEnumerable<IEnumerable<string>> rows, IEnumerable<string>? notes = null)
    {
        // user text (part values, names) reaches the terminal and CSV through here: made visible once, for every form
        var cols = columns.Select(c => VisibleText.Of(c)).ToValueList();
        var body = rows.Select(r => r.Select(c => VisibleText.Of(c)).ToValueList()).ToValueList();
        foreach (var row in body)
            if (row.Count != cols.Count) throw new ArgumentException($"table '{title}': a row has {row.Count} cells for {cols.Count} columns.");
        return new ReportTable(VisibleText.Of(title), cols, body, notes?.Select(n => VisibleText.Of(n, keepLineBreaks: true)).ToValueList());
    }
}
