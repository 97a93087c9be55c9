using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>The small symbols shared by the sheets and their legends.</summary>
internal static class Marks
{
    public const double GroundSize = 1.8;

    /// <summary>Ground landing: a square with both diagonals, where a lead is soldered straight to the plane.</summary>
    public static void Ground(PageBuilder page, Point center, double size, Stroke stroke, Ink? fill = null)
    {
        var box = Box.Around(center, size, size);
        page.Rect(box, stroke, fill);
        page.Line(new Point(box.Left, box.Top), new Point(box.Right, box.Bottom), stroke);
        page.Line(new Point(box.Left, box.Bottom), new Point(box.Right, box.Top), stroke);
    }

    /// <summary>Alignment mark for tiled templates: a ring with a cross through it.</summary>
    public static void Alignment(PageBuilder page, Point center)
    {
        page.Circle(center, 2.2, SheetStyle.Fine);
        page.Cross(center, 3.6, SheetStyle.Fine);
    }

    /// <summary>Keep-out: dashed outline and diagonal hatching.</summary>
    public static void Keepout(PageBuilder page, Keepout keepout, BoardView view)
    {
        var outline = Stroke.Dashed(SheetStyle.Mid, 0.25, 1.2, 0.6);
        switch (keepout)
        {
            case CircleKeepout c:
                var center = view.ToPage(c.Center);
                var r = view.Length(c.Diameter / 2);
                foreach (var (a, b) in Hatch.Circle(center, r, 1.2)) page.Line(a, b, SheetStyle.FaintLine);
                page.Circle(center, r, outline);
                break;
            case RectKeepout k:
                var box = view.ToPage(Box.Around(k.Center, k.Width, k.Height));
                foreach (var (a, b) in Hatch.Rect(box, 1.2)) page.Line(a, b, SheetStyle.FaintLine);
                page.Rect(box, outline);
                break;
        }
    }

    /// <summary>The board-mm box a keep-out covers.</summary>
    public static Box BoundsOf(Keepout keepout) => keepout switch
    {
        CircleKeepout c => Box.Around(c.Center, c.Diameter, c.Diameter),
        RectKeepout r => Box.Around(r.Center, r.Width, r.Height),
        _ => throw new NotSupportedException(keepout.GetType().Name),
    };

    /// <summary>A part's body outline in board mm.</summary>
    public static IReadOnlyList<Point> BodyOf(Footprint footprint, Placement placement) =>
        footprint.Body.Select(placement.ToBoard).ToList();

    public static Box BoundsOf(IEnumerable<Point> points)
    {
        var list = points.ToList();
        return new Box(list.Min(p => p.X), list.Min(p => p.Y), list.Max(p => p.X), list.Max(p => p.Y));
    }
}
