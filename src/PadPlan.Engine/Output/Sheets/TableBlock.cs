using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Tables;

namespace PadPlan.Output.Sheets;

/// <summary>Draws a report table into the flow: columns sized to their text and shrunk to the page width (never narrower than the longest word, so ids such as rule names do not break), cells wrapped, header repeated on each new page, and a tick box in each empty "Done" cell.</summary>
internal static class TableBlock
{
    private const double Size = SheetStyle.TextSmall;
    private const double Pad = 1.2;
    private const double MinColumn = 12;
    /// <summary>The column whose empty cells get a tick box to mark a step or test done.</summary>
    public const string DoneColumn = "Done";
    private const double TickBox = 3.0;
    /// <summary>A hair of extra width, so text measured to exactly a column's width is not wrapped by rounding.</summary>
    private const double Slack = 0.05;

    public static void Draw(ReportFlow flow, ReportTable table)
    {
        flow.Heading(table.Title, SheetStyle.TextLarge);
        if (table.Columns.Count == 0) return;
        var widths = ColumnWidths(table, flow.Body.Width);
        var header = Lines(table.Columns, widths, FontWeight.Bold);
        var done = table.Columns.ToList().IndexOf(DoneColumn);
        DrawRow(flow, header, widths, FontWeight.Bold, SheetStyle.Shade);
        if (table.Rows.Count == 0) flow.Paragraph("(none)", Size, ink: SheetStyle.Mid);
        foreach (var row in table.Rows)
        {
            var lines = Lines(row, widths, FontWeight.Regular);
            if (!flow.Fits(RowHeight(lines)))
            {
                flow.NewPage();
                flow.Heading(table.Title + " (continued)", SheetStyle.TextLarge);
                DrawRow(flow, header, widths, FontWeight.Bold, SheetStyle.Shade);
            }
            DrawRow(flow, lines, widths, FontWeight.Regular, null, done >= 0 && row[done].Length == 0 ? done : -1);
        }
        flow.Space(1.5);
        foreach (var note in table.Notes) flow.Paragraph(note, Size, ink: SheetStyle.Mid);
        flow.Space(4);
    }

    /// <summary>Each column as wide as its widest cell; if together too wide, the widest columns give way first, down to a minimum.</summary>
    internal static double[] ColumnWidths(ReportTable table, double available)
    {
        var widths = table.Columns.Select((c, i) =>
            Math.Max(TextMetrics.Width(c, Size, FontWeight.Bold), table.Rows.Select(r => TextMetrics.Width(r[i], Size)).DefaultIfEmpty(0).Max()) + 2 * Pad + Slack).ToArray();
        var total = widths.Sum();
        if (total <= available) return widths;
        // no column narrower than its longest word, where the page allows it, so no word is split
        var words = table.Columns.Select((c, i) => Math.Min(widths[i], LongestWord(table, i) + 2 * Pad + Slack)).ToArray();
        var floor = words.Sum() <= available ? words : widths.Select(_ => 0.0).ToArray();
        // lower a common cap until everything fits: columns narrower than the cap keep their width
        double lo = MinColumn, hi = widths.Max();
        for (var i = 0; i < 40; i++)
        {
            var cap = (lo + hi) / 2;
            if (widths.Select((w, c) => Math.Max(floor[c], Math.Min(w, cap))).Sum() > available) hi = cap;
            else lo = cap;
        }
        return widths.Select((w, c) => Math.Max(floor[c], Math.Min(w, lo))).ToArray();
    }

    private static double LongestWord(ReportTable table, int column) =>
        table.Rows.Select(r => r[column]).Prepend(table.Columns[column])
            .SelectMany(cell => cell.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            .Select(word => TextMetrics.Width(word, Size, FontWeight.Bold)).DefaultIfEmpty(0).Max();

    private static IReadOnlyList<string>[] Lines(IReadOnlyList<string> cells, double[] widths, FontWeight weight) =>
        cells.Select((c, i) => TextMetrics.Wrap(c, Size, widths[i] - 2 * Pad, weight)).ToArray();

    private static double RowHeight(IReadOnlyList<string>[] lines) => lines.Max(l => l.Count) * Size * SheetStyle.LineGap + Pad;

    private static void DrawRow(ReportFlow flow, IReadOnlyList<string>[] lines, double[] widths, FontWeight weight, Ink? shade, int tick = -1)
    {
        var height = RowHeight(lines);
        var top = flow.Take(height);
        var page = flow.Page;
        var left = flow.Body.Left;
        var right = left + widths.Sum();
        if (shade is { } s) page.Rect(new Box(left, top, right, top + height), null, s);
        var x = left;
        for (var c = 0; c < lines.Length; c++)
        {
            if (c == tick) page.Rect(Box.Of(x + Pad, top + Pad / 2, TickBox, TickBox), SheetStyle.Thin);
            for (var l = 0; l < lines[c].Count; l++)
                page.Text(lines[c][l], new Point(x + Pad, SheetStyle.BaselineBelow(top + Pad / 2 + l * Size * SheetStyle.LineGap, Size)), Size, weight: weight);
            x += widths[c];
        }
        page.Line(new Point(left, top + height), new Point(right, top + height), shade is null ? SheetStyle.Rule : SheetStyle.Fine);
    }
}
