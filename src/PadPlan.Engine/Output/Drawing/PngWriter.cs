using SkiaSharp;

namespace PadPlan.Output.Drawing;

/// <summary>Renders a page as a PNG preview at a chosen resolution (dots per inch, 25.4 mm to the inch), recorded in the file's pHYs chunk so that it prints at true size, and marked as PadPlan's (<see cref="PngSoftware"/>).</summary>
public static class PngWriter
{
    public const double MinDpi = 20;
    public const double MaxDpi = 1200;

    public static byte[] Write(DrawingPage page, double dpi)
    {
        if (!(dpi >= MinDpi && dpi <= MaxDpi)) throw new ArgumentOutOfRangeException(nameof(dpi), dpi, $"resolution must be {MinDpi} to {MaxDpi} dpi.");
        var scale = dpi / 25.4;
        var width = (int)Math.Round(page.Width * scale);
        var height = (int)Math.Round(page.Height * scale);
        using var bitmap = new SKBitmap(new SKImageInfo(width, height, SKColorType.Rgba8888, SKAlphaType.Premul));
        using (var canvas = new SKCanvas(bitmap))
        {
            canvas.Clear(SKColors.White);
            canvas.Scale((float)scale);
            SkiaPainter.Paint(canvas, page);
        }
        using var image = SKImage.FromBitmap(bitmap);
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return PngSoftware.Marked(PngResolution.WithDpi(data.ToArray(), dpi));
    }
}
