namespace PadPlan.Output.Drawing;

/// <summary>Text widths in mm with the shipped font, and the line-fitting the sheets need (wrap, shorten).</summary>
public static class TextMetrics
{
    /// <summary>Measured at a large size and scaled, so small sizes lose no precision.</summary>
    private const double ReferenceSize = 100;

    private static readonly Lazy<SkiaSharp.SKFont> Regular = new(() => FontAssets.Font(FontWeight.Regular, ReferenceSize));
    private static readonly Lazy<SkiaSharp.SKFont> Bold = new(() => FontAssets.Font(FontWeight.Bold, ReferenceSize));
    private static readonly object Gate = new();

    /// <summary>Advance width of one line of text at an em size (both mm).</summary>
    public static double Width(string text, double size, FontWeight weight = FontWeight.Regular)
    {
        if (text.Length == 0) return 0;
        var font = weight == FontWeight.Bold ? Bold.Value : Regular.Value;
        lock (Gate) return font.MeasureText(text) * size / ReferenceSize;
    }

    /// <summary>Height above the baseline of capital letters, as a share of the em size (DejaVu Sans: 0.729).</summary>
    public const double CapHeight = 0.73;

    /// <summary>The text, shortened with an ellipsis if needed so that it fits a width.</summary>
    public static string Fit(string text, double size, double maxWidth, FontWeight weight = FontWeight.Regular)
    {
        if (Width(text, size, weight) <= maxWidth) return text;
        for (var n = text.Length - 1; n > 0; n--)
        {
            var shorter = text[..n].TrimEnd() + "…";
            if (Width(shorter, size, weight) <= maxWidth) return shorter;
        }
        return "…";
    }

    /// <summary>Breaks text into lines no wider than maxWidth, at spaces where possible and inside over-long words otherwise.</summary>
    public static IReadOnlyList<string> Wrap(string text, double size, double maxWidth, FontWeight weight = FontWeight.Regular)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.ReplaceLineEndings("\n").Split('\n'))
        {
            var line = "";
            foreach (var word in paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                var joined = line.Length == 0 ? word : line + " " + word;
                if (Width(joined, size, weight) <= maxWidth)
                {
                    line = joined;
                    continue;
                }
                if (line.Length > 0) lines.Add(line);
                line = word;
                while (Width(line, size, weight) > maxWidth && line.Length > 1)
                {
                    var cut = line.Length - 1;
                    while (cut > 1 && Width(line[..cut], size, weight) > maxWidth) cut--;
                    lines.Add(line[..cut]);
                    line = line[cut..];
                }
            }
            lines.Add(line);
        }
        return lines;
    }
}
