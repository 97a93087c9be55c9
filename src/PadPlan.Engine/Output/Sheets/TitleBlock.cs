using System.Globalization;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The box along the bottom of every sheet: project, what the sheet is, board size, paper, date, sheet n of m. A plan that
/// fails its check has its stop mark (<see cref="SheetBook.NotReady"/>) on the first line, in bold, and the project and
/// sheet on the second.
/// </summary>
internal static class TitleBlock
{
    private const double CellWidth = 27;

    public static void Draw(PageBuilder page, PageFrame frame, Project project, string caption, DateOnly date, int number, int total, string? stop = null)
    {
        var box = frame.TitleBox;
        page.Rect(box, SheetStyle.Normal);
        var cells = new (string Label, string Value)[]
        {
            ("Board", BoardSize(project.Board)),
            ("Paper", frame.PaperText),
            ("Date", date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)),
            ("Sheet", $"{number} of {total}"),
        };
        var x = box.Right - CellWidth * cells.Length;
        var nameWidth = x - box.Left - 4;
        var (first, second) = stop is null ? (project.Name, caption) : (stop, $"{project.Name} · {caption}");
        var firstSize = stop is null ? SheetStyle.TextLarge : SheetStyle.TextNormal;
        page.Text(TextMetrics.Fit(first, firstSize, nameWidth, FontWeight.Bold), new Point(box.Left + 2, box.Top + 5.4), firstSize, weight: FontWeight.Bold);
        page.Text(TextMetrics.Fit(second, SheetStyle.TextNormal, nameWidth), new Point(box.Left + 2, box.Top + 10.6), SheetStyle.TextNormal);
        foreach (var (label, value) in cells)
        {
            page.Line(new Point(x, box.Top), new Point(x, box.Bottom), SheetStyle.Thin);
            page.Text(label, new Point(x + 1.5, box.Top + 3.6), SheetStyle.TextTiny, ink: SheetStyle.Mid);
            page.Text(TextMetrics.Fit(value, SheetStyle.TextNormal, CellWidth - 3), new Point(x + 1.5, box.Top + 9.6), SheetStyle.TextNormal);
            x += CellWidth;
        }
    }

    public static string BoardSize(Board board) => board.Width is { } w && board.Height is { } h
        ? FormattableString.Invariant($"{w:0.#} × {h:0.#} mm")
        : "size not set";
}
