using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Sizing and drawing of one-line labels by their box, level or turned to read upward.</summary>
internal static class Label
{
    /// <summary>Share of the em size below the baseline that the box keeps for descenders.</summary>
    private const double Descent = 0.24;

    /// <summary>
    /// Height of a label's box as a share of the em size: the font's ascent plus descent (DejaVu Sans: 1901 + 483 units
    /// of 2048, from its hhea table), which is the box a browser lays the text in and reports from getBBox().
    /// </summary>
    public const double Height = 1.17;

    /// <summary>The em size whose label box is this high (the inverse of <see cref="Size"/>'s height).</summary>
    public static double SizeFor(double boxHeight) => boxHeight / Height;

    /// <summary>The box (width, height) a label takes; turned labels swap the two.</summary>
    public static (double Width, double Height) Size(string text, double size, FontWeight weight = FontWeight.Regular, bool upward = false)
    {
        var w = TextMetrics.Width(text, size, weight) + size * 0.1;
        var h = size * Height;
        return upward ? (h, w) : (w, h);
    }

    /// <summary>Draws a label inside its box; upward labels read from bottom to top.</summary>
    public static void Draw(PageBuilder page, Box box, string text, double size, FontWeight weight = FontWeight.Regular, Ink? ink = null, bool upward = false)
    {
        if (upward)
            page.Text(text, new Point(box.Right - size * Descent, box.Center.Y), size, TextAnchor.Middle, weight, ink, -90);
        else
            page.Text(text, new Point(box.Center.X, box.Bottom - size * Descent), size, TextAnchor.Middle, weight, ink);
    }
}
