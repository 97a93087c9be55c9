using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>Diagonal hatching (rising to the right at 45 degrees) for keep-outs, cut exactly to a circle or rectangle.</summary>
internal static class Hatch
{
    private static readonly Point Normal = new(Math.Sqrt(0.5), Math.Sqrt(0.5));
    private static readonly Point Along = new(Math.Sqrt(0.5), -Math.Sqrt(0.5));

    public static IEnumerable<(Point From, Point To)> Circle(Point center, double radius, double spacing)
    {
        var c = Dot(center, Normal);
        for (var d = Math.Ceiling((c - radius) / spacing) * spacing; d < c + radius; d += spacing)
        {
            var off = d - c;
            var half = Math.Sqrt(Math.Max(0, radius * radius - off * off));
            if (half < 1e-6) continue;
            var mid = center + Normal * off;
            yield return (mid - Along * half, mid + Along * half);
        }
    }

    public static IEnumerable<(Point From, Point To)> Rect(Box box, double spacing)
    {
        // lines x + y = k * spacing * sqrt(2), from the lower-left edge to the upper-right edge
        var step = spacing * Math.Sqrt(2);
        var lo = box.Left + box.Top;
        var hi = box.Right + box.Bottom;
        for (var k = Math.Floor(lo / step) * step + step; k < hi; k += step)
        {
            // entry: on the left edge or the bottom edge; exit: on the top edge or the right edge
            var from = k - box.Left <= box.Bottom ? new Point(box.Left, k - box.Left) : new Point(k - box.Bottom, box.Bottom);
            var to = k - box.Top <= box.Right ? new Point(k - box.Top, box.Top) : new Point(box.Right, k - box.Right);
            if (from.DistanceTo(to) > 1e-6) yield return (from, to);
        }
    }

    private static double Dot(Point a, Point b) => a.X * b.X + a.Y * b.Y;
}
