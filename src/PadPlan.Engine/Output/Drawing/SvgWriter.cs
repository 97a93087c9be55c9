using System.Globalization;
using System.Text;
using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>Writes a page as SVG at true size: the root's width and height in mm and a viewBox in mm, so one user unit is one millimetre.</summary>
public static class SvgWriter
{
    /// <summary>The first two lines of every sheet: the XML declaration and the comment that marks the file as PadPlan's, so a later run knows it may replace it.</summary>
    public const string Prologue = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<!-- a PadPlan sheet -->\n";

    private static readonly byte[] PrologueBytes = new UTF8Encoding(false).GetBytes(Prologue);

    /// <summary>True when a file's first bytes are the prologue PadPlan writes.</summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) => head.StartsWith(PrologueBytes);

    public static string Write(DrawingPage page)
    {
        var sb = new StringBuilder();
        sb.Append(Prologue);
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{N(page.Width)}mm\" height=\"{N(page.Height)}mm\" viewBox=\"0 0 {N(page.Width)} {N(page.Height)}\" font-family=\"{FontAssets.SvgFamily}\">\n");
        sb.Append("<title>").Append(Escape(page.Title)).Append("</title>\n");
        sb.Append($"<rect x=\"0\" y=\"0\" width=\"{N(page.Width)}\" height=\"{N(page.Height)}\" fill=\"#ffffff\"/>\n");
        var clips = 0;
        WriteShapes(sb, page.Shapes, ref clips);
        sb.Append("</svg>\n");
        return sb.ToString();
    }

    public static byte[] WriteBytes(DrawingPage page) => new UTF8Encoding(false).GetBytes(Write(page));

    private static void WriteShapes(StringBuilder sb, IEnumerable<Shape> shapes, ref int clips)
    {
        foreach (var shape in shapes)
        {
            switch (shape)
            {
                case LineShape l:
                    sb.Append($"<line x1=\"{N(l.From.X)}\" y1=\"{N(l.From.Y)}\" x2=\"{N(l.To.X)}\" y2=\"{N(l.To.Y)}\"").Append(Paint(l.Stroke, null)).Append("/>\n");
                    break;
                case PolyShape p:
                    sb.Append(p.Closed ? "<polygon" : "<polyline").Append(" points=\"")
                      .Append(string.Join(" ", p.Points.Select(pt => $"{N(pt.X)},{N(pt.Y)}"))).Append('"')
                      .Append(Paint(p.Stroke, p.Fill)).Append(TagText(p.Tag)).Append("/>\n");
                    break;
                case RectShape r:
                    sb.Append($"<rect x=\"{N(r.Box.Left)}\" y=\"{N(r.Box.Top)}\" width=\"{N(r.Box.Width)}\" height=\"{N(r.Box.Height)}\"");
                    if (r.CornerRadius > 0) sb.Append($" rx=\"{N(r.CornerRadius)}\"");
                    sb.Append(Paint(r.Stroke, r.Fill)).Append(TagText(r.Tag)).Append("/>\n");
                    break;
                case CircleShape c:
                    sb.Append($"<circle cx=\"{N(c.Center.X)}\" cy=\"{N(c.Center.Y)}\" r=\"{N(c.Radius)}\"").Append(Paint(c.Stroke, c.Fill)).Append(TagText(c.Tag)).Append("/>\n");
                    break;
                case TextShape t:
                    WriteText(sb, t);
                    break;
                case ClipGroup g:
                    var id = $"clip{++clips}";
                    sb.Append($"<clipPath id=\"{id}\"><rect x=\"{N(g.Clip.Left)}\" y=\"{N(g.Clip.Top)}\" width=\"{N(g.Clip.Width)}\" height=\"{N(g.Clip.Height)}\"/></clipPath>\n");
                    sb.Append($"<g clip-path=\"url(#{id})\">\n");
                    WriteShapes(sb, g.Shapes, ref clips);
                    sb.Append("</g>\n");
                    break;
                default:
                    throw new NotSupportedException($"SVG writer: no rule for {shape.GetType().Name}.");
            }
        }
    }

    private static void WriteText(StringBuilder sb, TextShape t)
    {
        if (t.Text.Length == 0) return;
        sb.Append($"<text x=\"{N(t.At.X)}\" y=\"{N(t.At.Y)}\" font-size=\"{N(t.Size)}\"");
        if (t.Anchor != TextAnchor.Start) sb.Append(t.Anchor == TextAnchor.Middle ? " text-anchor=\"middle\"" : " text-anchor=\"end\"");
        if (t.Weight == FontWeight.Bold) sb.Append(" font-weight=\"bold\"");
        if (t.Colour != Ink.Black) sb.Append($" fill=\"{t.Colour.ToHex()}\"");
        if (t.Angle != 0) sb.Append($" transform=\"rotate({N(t.Angle)} {N(t.At.X)} {N(t.At.Y)})\"");
        sb.Append(TagText(t.Tag));
        sb.Append(" xml:space=\"preserve\">").Append(Escape(t.Text)).Append("</text>\n");
    }

    /// <summary>The shape's tag as data attributes (HTML's data-* convention, which SVG 2 adopts), or nothing.</summary>
    private static string TagText(ShapeTag? tag)
    {
        if (tag is null) return "";
        var sb = new StringBuilder($" data-kind=\"{Escape(tag.Kind)}\"");
        if (tag.Id is { } id) sb.Append($" data-id=\"{Escape(id)}\"");
        if (tag.Names is { Count: > 0 } names) sb.Append($" data-names=\"{Escape(string.Join(" ", names))}\"");
        return sb.ToString();
    }

    private static string Paint(Stroke? stroke, Ink? fill)
    {
        var sb = new StringBuilder();
        sb.Append(fill is { } f ? $" fill=\"{f.ToHex()}\"" : " fill=\"none\"");
        if (stroke is null) return sb.ToString();
        sb.Append($" stroke=\"{stroke.Ink.ToHex()}\" stroke-width=\"{N(stroke.Width)}\"");
        if (stroke.Dash.Count > 0) sb.Append($" stroke-dasharray=\"{string.Join(" ", stroke.Dash.Select(N))}\"");
        return sb.ToString();
    }

    /// <summary>Numbers in mm to 0.001 mm, invariant culture, no exponent: the same text on every machine.</summary>
    internal static string N(double v)
    {
        var rounded = Math.Round(v, 3, MidpointRounding.AwayFromZero);
        if (rounded == 0) rounded = 0; // no "-0"
        return rounded.ToString("0.###", CultureInfo.InvariantCulture);
    }

    /// <summary>Escapes text for XML character data and attributes, and drops characters XML 1.0 cannot hold, so names such as "&lt;in&amp;out&gt;" cannot break the file.</summary>
    public static string Escape(string text)
    {
        var sb = new StringBuilder(text.Length);
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                case '"': sb.Append("&quot;"); break;
                case '\'': sb.Append("&apos;"); break;
                default:
                    if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
                    {
                        sb.Append(c).Append(text[++i]);
                    }
                    else if (IsXmlChar(c))
                    {
                        sb.Append(c);
                    }
                    break;
            }
        }
        return sb.ToString();
    }

    private static bool IsXmlChar(char c) =>
        c is '\t' or '\n' or '\r' || (c >= 0x20 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD);
}
