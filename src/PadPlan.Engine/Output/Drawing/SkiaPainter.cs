using SkiaSharp;

namespace PadPlan.Output.Drawing;

/// <summary>Paints a page on a Skia canvas whose units are already page millimetres (the PDF and PNG back ends set the scale).</summary>
internal static class SkiaPainter
{
    public static void Paint(SKCanvas canvas, DrawingPage page)
    {
        using var white = new SKPaint { Color = SKColors.White, Style = SKPaintStyle.Fill };
        canvas.DrawRect(0, 0, (float)page.Width, (float)page.Height, white);
        PaintShapes(canvas, page.Shapes);
    }

    private static void PaintShapes(SKCanvas canvas, IEnumerable<Shape> shapes)
    {
        foreach (var shape in shapes)
        {
            switch (shape)
            {
                case LineShape l:
                    using (var paint = StrokePaint(l.Stroke))
                        canvas.DrawLine(F(l.From.X), F(l.From.Y), F(l.To.X), F(l.To.Y), paint);
                    break;
                case PolyShape p:
                    using (var builder = new SKPathBuilder())
                    {
                        builder.MoveTo(F(p.Points[0].X), F(p.Points[0].Y));
                        for (var i = 1; i < p.Points.Count; i++) builder.LineTo(F(p.Points[i].X), F(p.Points[i].Y));
                        if (p.Closed) builder.Close();
                        using var path = builder.Detach();
                        FillAndStroke(p.Fill, p.Stroke, paint => canvas.DrawPath(path, paint));
                    }
                    break;
                case RectShape r:
                    var rect = Rect(r.Box);
                    FillAndStroke(r.Fill, r.Stroke, paint =>
                    {
                        if (r.CornerRadius > 0) canvas.DrawRoundRect(rect, F(r.CornerRadius), F(r.CornerRadius), paint);
                        else canvas.DrawRect(rect, paint);
                    });
                    break;
                case CircleShape c:
                    FillAndStroke(c.Fill, c.Stroke, paint => canvas.DrawCircle(F(c.Center.X), F(c.Center.Y), F(c.Radius), paint));
                    break;
                case TextShape t:
                    PaintText(canvas, t);
                    break;
                case ClipGroup g:
                    canvas.Save();
                    canvas.ClipRect(Rect(g.Clip), SKClipOperation.Intersect, antialias: true);
                    PaintShapes(canvas, g.Shapes);
                    canvas.Restore();
                    break;
                default:
                    throw new NotSupportedException($"Skia painter: no rule for {shape.GetType().Name}.");
            }
        }
    }

    private static void PaintText(SKCanvas canvas, TextShape t)
    {
        if (t.Text.Length == 0) return;
        using var font = FontAssets.Font(t.Weight, t.Size);
        using var paint = new SKPaint { Color = Colour(t.Colour), IsAntialias = true, Style = SKPaintStyle.Fill };
        var align = t.Anchor switch
        {
            TextAnchor.Middle => SKTextAlign.Center,
            TextAnchor.End => SKTextAlign.Right,
            _ => SKTextAlign.Left,
        };
        canvas.Save();
        canvas.Translate(F(t.At.X), F(t.At.Y));
        if (t.Angle != 0) canvas.RotateDegrees(F(t.Angle));
        canvas.DrawText(t.Text, 0, 0, align, font, paint);
        canvas.Restore();
    }

    private static void FillAndStroke(Ink? fill, Stroke? stroke, Action<SKPaint> draw)
    {
        if (fill is { } f)
        {
            using var paint = new SKPaint { Color = Colour(f), IsAntialias = true, Style = SKPaintStyle.Fill };
            draw(paint);
        }
        if (stroke is not null)
        {
            using var paint = StrokePaint(stroke);
            draw(paint);
        }
    }

    private static SKPaint StrokePaint(Stroke stroke)
    {
        var paint = new SKPaint
        {
            Color = Colour(stroke.Ink),
            IsAntialias = true,
            Style = SKPaintStyle.Stroke,
            StrokeWidth = F(stroke.Width),
            StrokeCap = SKStrokeCap.Butt,
            StrokeJoin = SKStrokeJoin.Miter,
            StrokeMiter = 4,
        };
        if (stroke.Dash.Count > 0) paint.PathEffect = SKPathEffect.CreateDash(stroke.Dash.Select(F).ToArray(), 0);
        return paint;
    }

    private static SKRect Rect(Box box) => new(F(box.Left), F(box.Top), F(box.Right), F(box.Bottom));
    private static SKColor Colour(Ink ink) => new(ink.R, ink.G, ink.B);
    private static float F(double v) => (float)v;
}
