using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Sizing and drawing of one-line labels by their box, level or turned to read upward.</summary>
internal static class Label
{
    /// <summary>Share of the em size below the baseline that the box keeps for descenders.</summary>
    private const double Descent = 0.24;

    /// <summary>The box (width, height) a label takes; turned labels swap the two.</summary>
    public static (double Width, double Height) Size(string text, double size, FontWeight weight = FontWeight.Regular, bool upward = false)
    {
        var w = TextMetrics.Width(text, size, weight) + size * 0.1;
        var h = size * 1.0;
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
