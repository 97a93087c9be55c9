using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>Collects the shapes of one page (or one clipped group) in drawing order; a short-lived helper inside the sheet builders.</summary>
public sealed class PageBuilder
{
    private readonly List<Shape> _shapes = [];

    public int Count => _shapes.Count;

    /// <summary>Marks the shape added last with what it stands for (see <see cref="ShapeTag"/>).</summary>
    public PageBuilder Tag(ShapeTag? tag)
    {
        if (tag is not null && _shapes.Count > 0) _shapes[^1] = _shapes[^1] with { Tag = tag };
        return this;
    }

    public PageBuilder Add(Shape shape)
    {
        _shapes.Add(shape);
        return this;
    }

    public PageBuilder Line(Point from, Point to, Stroke stroke) => Add(new LineShape(from, to, stroke));

    public PageBuilder Rect(Box box, Stroke? stroke, Ink? fill = null, double cornerRadius = 0) => Add(new RectShape(box, stroke, fill, cornerRadius));

    public PageBuilder Circle(Point center, double radius, Stroke? stroke, Ink? fill = null) => Add(new CircleShape(center, radius, stroke, fill));

    public PageBuilder Poly(IEnumerable<Point> points, bool closed, Stroke? stroke, Ink? fill = null) => Add(new PolyShape(points.ToValueList(), closed, stroke, fill));

    public PageBuilder Text(string text, Point at, double size, TextAnchor anchor = TextAnchor.Start, FontWeight weight = FontWeight.Regular, Ink? ink = null, double angle = 0) =>
        Add(new TextShape(text, at, size, anchor, weight, ink, angle));

    /// <summary>A cross of two lines through a point: centre marks and alignment marks.</summary>
    public PageBuilder Cross(Point center, double arm, Stroke stroke) =>
        Line(new Point(center.X - arm, center.Y), new Point(center.X + arm, center.Y), stroke)
            .Line(new Point(center.X, center.Y - arm), new Point(center.X, center.Y + arm), stroke);

    public PageBuilder Clipped(Box clip, PageBuilder inner) => inner.Count == 0 ? this : Add(new ClipGroup(clip, inner.Shapes()));

    public ValueList<Shape> Shapes() => _shapes.ToValueList();

    public DrawingPage ToPage(double width, double height, string title) => new(width, height, title, Shapes());
}
