using SkiaSharp;

namespace PadPlan.Output.Drawing;

/// <summary>Writes pages as one PDF through Skia's document API: each page at its paper size in points (1 mm = 72/25.4 pt, ISO 32000-1 8.3.2.1), text kept as selectable text with the font subset embedded.</summary>
public static class PdfWriter
{
    public const double PointsPerMm = 72.0 / 25.4;

    /// <summary>The program named as Creator and Producer in the document information.</summary>
    public const string Program = "PadPlan";

    /// <summary>
    /// True when a file's first bytes are a PDF whose document information names PadPlan as its producer. The Producer
    /// key of the information dictionary is ISO 32000-1:2008, 14.3.3 (Table 317). That Skia writes the dictionary as the
    /// first object, inside the first bytes, is what its output shows, not a promise of Skia's: if that changes, PadPlan's
    /// own PDF is refused (the safe side) and PdfMarkTests fails.
    /// </summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) => head.StartsWith("%PDF-"u8) && head.IndexOf(ProducerLine) >= 0;

    private static readonly byte[] ProducerLine = System.Text.Encoding.ASCII.GetBytes($"\n/Producer ({Program})\n");

    /// <summary>Title and date go into the document information; the fixed date keeps the bytes the same from run to run.</summary>
    public static byte[] Write(IReadOnlyList<DrawingPage> pages, string title, DateOnly date)
    {
        if (pages.Count == 0) throw new ArgumentException("a PDF needs at least one page.", nameof(pages));
        var stamp = date.ToDateTime(TimeOnly.MinValue, DateTimeKind.Utc);
        var metadata = new SKDocumentPdfMetadata
        {
            Title = title,
            Creator = Program,
            Producer = Program,
            Creation = stamp,
            Modified = stamp,
            // Skia rounds the page to whole pixels at this resolution: 254 dpi is 10 pixels per mm, so every paper size in whole mm stays exact.
            RasterDpi = 254,
            EncodingQuality = 101,
            PdfA = false,
        };
        using var stream = new MemoryStream();
        using (var document = SKDocument.CreatePdf(stream, metadata))
        {
            foreach (var page in pages)
            {
                var canvas = document.BeginPage((float)(page.Width * PointsPerMm), (float)(page.Height * PointsPerMm));
                canvas.Scale((float)PointsPerMm);
                SkiaPainter.Paint(canvas, page);
                document.EndPage();
            }
            document.Close();
        }
        return stream.ToArray();
    }
}
