using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>The measured check bars: 50 mm and 2 in, solid black so that a ruler laid on them reads their ends clearly.</summary>
internal static class CheckBar
{
    public const double MetricLength = 50;
    public const double InchLength = 2 * 25.4;
    public const double BarHeight = 1.2;
    /// <summary>Height both bars with their ticks and figures take.</summary>
    public const double Height = 17;

    public const string Instruction = "Print at actual size (100 %, not \"fit to page\") and measure the bar before cutting: it must be 50 mm, the lower one 2 in. If not, the template is not true to size.";

    /// <summary>Draws both bars from the top-left corner; returns the box of the 50 mm bar.</summary>
    public static Box Draw(PageBuilder page, Point topLeft)
    {
        var metric = Bar(page, topLeft, MetricLength, Enumerable.Range(0, 11).Select(i => (i * 5.0, i % 2 == 0, i % 2 == 0 ? (i * 5).ToString(System.Globalization.CultureInfo.InvariantCulture) : "")), "mm");
        var inchTicks = new[] { (0.0, true, "0"), (6.35, false, ""), (12.7, true, "½"), (19.05, false, ""), (25.4, true, "1"), (31.75, false, ""), (38.1, true, "1½"), (44.45, false, ""), (50.8, true, "2") };
        Bar(page, topLeft + new Point(0, 8.6), InchLength, inchTicks, "in");
        return metric;
    }

    private static Box Bar(PageBuilder page, Point topLeft, double length, IEnumerable<(double At, bool Major, string Figure)> ticks, string unit)
    {
        var bar = Box.Of(topLeft.X, topLeft.Y, length, BarHeight);
        page.Rect(bar, null, Ink.Black);
        foreach (var (at, major, figure) in ticks)
        {
            var x = bar.Left + at;
            page.Line(new Point(x, bar.Bottom), new Point(x, bar.Bottom + (major ? 1.8 : 1.0)), SheetStyle.Fine);
            if (figure.Length > 0) page.Text(figure, new Point(x, bar.Bottom + 4.1), SheetStyle.TextSmall, TextAnchor.Middle);
        }
        page.Text(unit, new Point(bar.Right + 2.2, bar.Bottom + 0.4), SheetStyle.TextNormal, weight: FontWeight.Bold);
        return bar;
    }
}
