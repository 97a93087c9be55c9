using SkiaSharp;

namespace PadPlan.Tests.Output;

/// <summary>Reads lengths off a rendered page: runs of dark pixels along a row or column.</summary>
public sealed class RenderedImage(SKBitmap bitmap) : IDisposable
{
    public SKBitmap Bitmap { get; } = bitmap;

    public static RenderedImage FromPng(byte[] png) => new(SKBitmap.Decode(png) ?? throw new InvalidOperationException("not a PNG"));

    /// <summary>A pixel counts as ink when its grey value is below half (anti-aliased edges count half on each side, on average).</summary>
    public bool Dark(int x, int y)
    {
        var c = Bitmap.GetPixel(x, y);
        return (c.Red + c.Green + c.Blue) / 3.0 < 128 && c.Alpha > 128;
    }

    /// <summary>The dark runs along row y, as (start, end-exclusive) pixel columns.</summary>
    public List<(int Start, int End)> RowRuns(int y) => Runs(Bitmap.Width, x => Dark(x, y));

    public List<(int Start, int End)> ColumnRuns(int x) => Runs(Bitmap.Height, y => Dark(x, y));

    private static List<(int, int)> Runs(int length, Func<int, bool> dark)
    {
        var runs = new List<(int, int)>();
        var start = -1;
        for (var i = 0; i <= length; i++)
        {
            var d = i < length && dark(i);
            if (d && start < 0) start = i;
            if (!d && start >= 0)
            {
                runs.Add((start, i));
                start = -1;
            }
        }
        return runs;
    }

    public void Dispose() => Bitmap.Dispose();
}
