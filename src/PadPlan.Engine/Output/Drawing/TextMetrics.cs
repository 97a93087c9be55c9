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

    /// <summary>The text, shortened with an ellipsis if needed so that it fits a width. Linear in the text length.</summary>
    public static string Fit(string text, double size, double maxWidth, FontWeight weight = FontWeight.Regular)
    {
        var advances = Advances(text, size, weight);
        if (advances.Sum() <= maxWidth) return text;
        var room = maxWidth - Width("…", size, weight);
        var n = 0;
        for (var used = 0.0; n < text.Length && used + advances[n] <= room; n++) used += advances[n];
        if (n < text.Length && char.IsLowSurrogate(text[n])) n--; // never split a surrogate pair
        var kept = text[..Math.Max(0, n)].TrimEnd();
        return kept.Length == 0 ? "…" : kept + "…";
    }

    /// <summary>
    /// Breaks text into lines no wider than maxWidth, at spaces where possible and inside over-long words otherwise.
    /// Linear in the text length: widths come from per-character advances, which add up because the sheets draw without
    /// kerning (Skia's MeasureText sums glyph advances).
    /// </summary>
    public static IReadOnlyList<string> Wrap(string text, double size, double maxWidth, FontWeight weight = FontWeight.Regular)
    {
        var lines = new List<string>();
        var space = Width(" ", size, weight);
        foreach (var paragraph in text.ReplaceLineEndings("\n").Split('\n'))
        {
            var advances = Advances(paragraph, size, weight);
            var line = new System.Text.StringBuilder();
            var lineWidth = 0.0;
            var i = 0;
            while (i < paragraph.Length)
            {
                if (paragraph[i] == ' ') { i++; continue; }
                var end = paragraph.IndexOf(' ', i);
                if (end < 0) end = paragraph.Length;
                var wordWidth = 0.0;
                for (var k = i; k < end; k++) wordWidth += advances[k];
                var joined = line.Length == 0 ? wordWidth : lineWidth + space + wordWidth;
                if (joined <= maxWidth)
                {
                    if (line.Length > 0) line.Append(' ');
                    line.Append(paragraph, i, end - i);
                    lineWidth = joined;
                    i = end;
                    continue;
                }
                if (line.Length > 0) lines.Add(line.ToString());
                line.Clear();
                lineWidth = 0;
                // an over-long word: cut it into pieces that fit, at least one character each
                var start = i;
                for (var k = i; k < end; k++)
                {
                    if (lineWidth + advances[k] > maxWidth && k > start && !char.IsLowSurrogate(paragraph[k]))
                    {
                        lines.Add(paragraph[start..k]);
                        start = k;
                        lineWidth = 0;
                    }
                    lineWidth += advances[k];
                }
                line.Append(paragraph, start, end - start);
                i = end;
            }
            lines.Add(line.ToString());
        }
        return lines;
    }

    /// <summary>The advance of each character of the text (mm); the second half of a surrogate pair gets 0.</summary>
    private static double[] Advances(string text, double size, FontWeight weight)
    {
        var advances = new double[text.Length];
        var cache = weight == FontWeight.Bold ? BoldAdvances : RegularAdvances;
        for (var i = 0; i < text.Length; i++)
        {
            var length = char.IsHighSurrogate(text[i]) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]) ? 2 : 1;
            var glyph = text.Substring(i, length);
            double unit;
            lock (Gate)
            {
                if (!cache.TryGetValue(glyph, out unit))
                {
                    unit = (weight == FontWeight.Bold ? Bold.Value : Regular.Value).MeasureText(glyph) / ReferenceSize;
                    if (cache.Count < 4096) cache[glyph] = unit;
                }
            }
            advances[i] = unit * size;
            i += length - 1;
        }
        return advances;
    }

    private static readonly Dictionary<string, double> RegularAdvances = new(StringComparer.Ordinal);
    private static readonly Dictionary<string, double> BoldAdvances = new(StringComparer.Ordinal);
}
