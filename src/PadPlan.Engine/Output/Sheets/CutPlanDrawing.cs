using PadPlan.Materials;
using PadPlan.Materials.Cutting;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>One piece as drawn on its stock: its outline on the page and where its id is written (or its key number, "#3", when the id does not fit; the key below the drawing names it).</summary>
internal sealed record DrawnPiece(string Id, Box Outline, string Text, Box Label);

/// <summary>One cut as drawn: its line on the page and the numbered bubble that gives its place in the cut order, on the line or joined to it by a leader at Anchor.</summary>
internal sealed record DrawnCut(int Number, Point From, Point To, Box Label, Point Anchor);

/// <summary>A stock piece drawn to scale: the scale denominator (1 is true size), its outline, pieces, cuts and every shape.</summary>
internal sealed record CutPlanFigure(StockPiece Stock, int ScaleDenominator, Box Outline, ValueList<DrawnPiece> Pieces, ValueList<DrawnCut> Cuts, ValueList<Box> Discs, double Height, ValueList<Shape> Shapes)
{
    public double Scale => 1.0 / ScaleDenominator;
}

/// <summary>
/// Draws each stock piece of the cutting plan to scale, after the cutting-plan table: the stock outline, every piece as
/// a grey rectangle with its id, the discs to punch as circles, and the cuts as dashed lines numbered in the order to
/// make them (the order comes from <see cref="CutOrder"/>; this only draws). True size when the stock fits the page,
/// else the first round scale that does, stated in the caption. Greyscale only: pieces are shaded, cuts dashed.
/// </summary>
internal static class CutPlanDrawing
{
    /// <summary>Round scales tried in turn (1 : n); common drawing-office scales, no source.</summary>
    private static readonly int[] Scales = [1, 2, 5, 10, 20, 50, 100];
    private const double CaptionSize = SheetStyle.TextNormal;
    private const double CaptionHeight = CaptionSize * SheetStyle.LineGap + 1.5;
    private const double LabelMax = SheetStyle.TextSmall;
    /// <summary>Smallest piece id drawn (mm em size), about 3.4 pt: still readable on a laser print. Common practice, no source.</summary>
    private const double LabelMin = 1.2;
    private const double BubbleRadius = 1.5;
    /// <summary>Least clear space between a cut's number and any other label or number (mm).</summary>
    private const double Gap = 0.4;
    private const double BubbleText = 1.8;
    /// <summary>Longest leader from a crowded cut to its number (mm).</summary>
    public const double MaxLeader = 24;
    private static readonly Stroke CutLine = Stroke.Dashed(Ink.Black, 0.3, 1.6, 0.8);

    public static void Draw(ReportFlow flow, CutList list)
    {
        var used = list.Plan.Used.ToList();
        if (used.Count == 0) return;
        var room = flow.Body;
        // keep the heading and legend on the page of the first drawing
        var legendHeight = TextMetrics.Wrap(Legend, SheetStyle.TextSmall, room.Width).Count * SheetStyle.TextSmall * SheetStyle.LineGap;
        if (!flow.Fits(SheetStyle.TextLarge * 1.6 + legendHeight + 2 + FigureHeight(list, used[0], room))) flow.NewPage();
        flow.Heading("Cutting plan drawn on the stock", SheetStyle.TextLarge);
        flow.Paragraph(Legend, SheetStyle.TextSmall, ink: SheetStyle.Mid);
        flow.Space(2);
        foreach (var stock in used)
        {
            var top = flow.Take(FigureHeight(list, stock, room));
            foreach (var shape in Figure(list, stock, new Point(room.Left, top), ScaleFor(stock, room), room.Width).Shapes) flow.Page.Add(shape);
        }
    }

    private static int ScaleFor(StockPiece stock, Box room) => ScaleFor(stock, room.Width, room.Height - CaptionHeight - 2);

    // The height a stock's figure takes, ids in the side column included, with a gap below.
    private static double FigureHeight(CutList list, StockPiece stock, Box room) =>
        Figure(list, stock, new Point(room.Left, room.Top), ScaleFor(stock, room), room.Width).Height + 4;

    private const string Legend = "Grey: a piece, its id inside. Dashed line: a cut, right across the part of the board it divides; the number in its circle is the order to make it. Circle on a piece: a disc to punch. Drawn 1 : 1 where the stock fits the page; otherwise at the scale stated, and then not for measuring: the template's check bar is the only measuring aid.";

    /// <summary>The largest round scale (1 : 1 first) at which the stock fits the given width and height of page (mm).</summary>
    public static int ScaleFor(StockPiece stock, double width, double height) =>
        Scales.FirstOrDefault(d => stock.Width / d <= width + 1e-9 && stock.Height / d <= height + 1e-9, Scales[^1]);

    /// <summary>The figure of one stock piece with its caption's top-left corner at a point, at 1 : denominator.</summary>
    public static CutPlanFigure Figure(CutList list, StockPiece stock, Point at, int denominator, double width)
    {
        var plan = list.Plan;
        var f = 1.0 / denominator;
        var page = new PageBuilder();
        var cuts = plan.CutsOn(stock);
        var caption = $"{stock.Id}: {Mm.Size(stock.Width, stock.Height)} mm, {Mm.Of(stock.Thickness)} mm board, {plan.On(stock).Count()} pieces, {cuts.Count} cuts. "
            + (denominator == 1 ? "Scale 1 : 1 (true size at 100 % print)" : $"scale 1 : {denominator} (not for measuring)");
        page.Text(TextMetrics.Fit(caption, CaptionSize, width, FontWeight.Bold), new Point(at.X, SheetStyle.BaselineBelow(at.Y, CaptionSize)), CaptionSize, weight: FontWeight.Bold);
        var origin = new Point(at.X, at.Y + CaptionHeight);
        Point P(double x, double y) => new(origin.X + x * f, origin.Y + y * f);
        var outline = new Box(origin.X, origin.Y, origin.X + stock.Width * f, origin.Y + stock.Height * f);

        var pieces = new List<DrawnPiece>();
        var discs = new List<Box>();
        var labels = new List<Box>();
        var text = new PageBuilder();
        var crowded = new List<(string Id, string Key, Box Outline)>();
        var keys = new List<(string Key, string Id)>();
        foreach (var placed in plan.On(stock))
        {
            var a = P(placed.X, placed.Y);
            var box = Box.Of(a.X, a.Y, placed.Width * f, placed.Height * f);
            page.Rect(box, SheetStyle.Thin, SheetStyle.Shade);
            foreach (var disc in DiscsOf(list, placed))
            {
                var c = P(disc.X, disc.Y);
                var r = disc.Radius * f;
                page.Circle(c, r, SheetStyle.Fine, Ink.White);
                discs.Add(Box.Around(c, 2 * r, 2 * r));
            }
            if (PieceLabel(text, placed.Piece.Id, placed.Piece.Id, box) is { } label)
            {
                labels.Add(label.Label);
                pieces.Add(label);
                continue;
            }
            // too small for its whole id: a key number, inside the piece if it fits there, else beside the stock
            var key = $"#{keys.Count + 1}";
            keys.Add((key, placed.Piece.Id));
            if (PieceLabel(text, placed.Piece.Id, key, box) is { } keyed)
            {
                labels.Add(keyed.Label);
                pieces.Add(keyed);
            }
            else
            {
                crowded.Add((placed.Piece.Id, key, box));
            }
        }
        page.Rect(outline, SheetStyle.Heavy);
        pieces.AddRange(Callouts(text, crowded, outline, at.X + width));
        labels.AddRange(pieces.Skip(pieces.Count - crowded.Count).Select(p => p.Label));

        var drawn = new List<DrawnCut>();
        foreach (var cut in cuts)
        {
            var from = P(cut.Start.X, cut.Start.Y);
            var to = P(cut.End.X, cut.End.Y);
            page.Line(from, to, CutLine);
            var (bubble, anchor) = BubbleAt(from, to, labels, pieces.Select(p => p.Outline).ToList());
            labels.Add(bubble);
            if (bubble.DistanceTo(anchor) > 1e-9) text.Line(anchor, new DiscZone(bubble.Center, BubbleRadius).Nearest(anchor), SheetStyle.Fine);
            text.Circle(bubble.Center, BubbleRadius, SheetStyle.Thin, Ink.White);
            text.Text(cut.Number.ToString(System.Globalization.CultureInfo.InvariantCulture), new Point(bubble.Center.X, bubble.Center.Y + BubbleText * TextMetrics.CapHeight / 2), BubbleText, TextAnchor.Middle, FontWeight.Bold);
            drawn.Add(new DrawnCut(cut.Number, from, to, bubble, anchor));
        }
        foreach (var shape in text.Shapes()) page.Add(shape);
        var bottom = pieces.Select(p => p.Label.Bottom).Append(outline.Bottom).Max();
        if (keys.Count > 0)
        {
            var line = "Key: " + string.Join(", ", keys.Select(k => $"{k.Key} = {k.Id}"));
            foreach (var row in TextMetrics.Wrap(line, SheetStyle.TextSmall, width))
            {
                bottom += SheetStyle.TextSmall * SheetStyle.LineGap;
                page.Text(row, new Point(at.X, bottom - SheetStyle.TextSmall * 0.3), SheetStyle.TextSmall);
            }
        }
        return new CutPlanFigure(stock, denominator, outline, pieces.ToValueList(), drawn.ToValueList(), discs.ToValueList(), bottom - at.Y, page.Shapes());
    }

    // Ids of pieces too small to hold them at the drawing's scale: in a column right of the stock (below it when the
    // page has no room at the side), in the pieces' order down the page, each on a leader to its piece's centre.
    private static IEnumerable<DrawnPiece> Callouts(PageBuilder page, List<(string Id, string Key, Box Outline)> crowded, Box stock, double right)
    {
        var size = SheetStyle.TextSmall;
        var step = size * SheetStyle.LineGap;
        var widest = crowded.Select(c => TextMetrics.Width(c.Key, size)).DefaultIfEmpty(0).Max();
        var beside = stock.Right + 4 + widest <= right;
        var x = beside ? stock.Right + 4 : stock.Left + 4;
        var y = beside ? stock.Top : stock.Bottom + 2;
        foreach (var (id, key, box) in crowded.OrderBy(c => c.Outline.Center.Y).ThenBy(c => c.Outline.Center.X))
        {
            if (beside) y = Math.Max(y, box.Center.Y - step / 2);
            var width = TextMetrics.Width(key, size);
            var label = new Box(x, y, x + width, y + step);
            page.Line(box.Center, new Point(x - 0.5, y + step / 2), SheetStyle.Hair);
            page.Circle(box.Center, 0.25, null, Ink.Black);
            page.Text(key, new Point(x, y + step / 2 + size * TextMetrics.CapHeight / 2), size);
            yield return new DrawnPiece(id, box, key, label);
            y += step;
        }
    }

    // The text (the piece's id, or its key number) inside its piece: across it if there is room, else along a tall narrow
    // piece, at a smaller size if the whole text then fits; a white ground under it keeps it readable over disc outlines.
    // The box reserved is the font's whole ascent and descent, as a browser lays the text out. Null when even the
    // smallest readable size does not fit inside the piece: never cut short.
    private static DrawnPiece? PieceLabel(PageBuilder page, string id, string shown, Box box)
    {
        const double inset = 0.3;
        var upright = box.Height > box.Width * 1.5;
        var across = upright ? box.Width : box.Height;
        var along = (upright ? box.Height : box.Width) - 2 * inset;
        var size = Math.Clamp(across / Label.Height - 0.1, LabelMin, LabelMax);
        while (size > LabelMin && TextMetrics.Width(shown, size) > along) size = Math.Max(LabelMin, size - 0.1);
        if (TextMetrics.Width(shown, size) > along) return null;
        var width = TextMetrics.Width(shown, size);
        var high = size * TextMetrics.CapHeight;
        // from the baseline: ascent 0.93 em above, descent 0.24 em below (DejaVu Sans hhea)
        var (above, below) = (size * 0.93 - high / 2, size * 0.24 + high / 2);
        var c = box.Center;
        var label = upright
            ? new Box(c.X - above, c.Y - width / 2, c.X + below, c.Y + width / 2)
            : new Box(c.X - width / 2, c.Y - above, c.X + width / 2, c.Y + below);
        if (!box.Contains(label)) return null;
        page.Rect(label, null, Ink.White);
        if (upright) page.Text(shown, new Point(c.X + high / 2, c.Y), size, TextAnchor.Middle, ink: Ink.Black, angle: -90);
        else page.Text(shown, new Point(c.X, c.Y + high / 2), size, TextAnchor.Middle);
        return new DrawnPiece(id, box, shown, label);
    }

    // A bubble on the cut line, at spots every half millimetre from its ends inward: the first that covers no label,
    // earlier bubble or piece, then the first that covers no label or bubble; where the line is too crowded, beside it
    // on a leader, the shortest that finds room; else the least covered spot on the line.
    private static (Box Bubble, Point Anchor) BubbleAt(Point from, Point to, IReadOnlyList<Box> taken, IReadOnlyList<Box> pieces)
    {
        var length = from.DistanceTo(to);
        var along = new List<double>();
        for (var d = 0.0; d <= length / 2 + 1e-9; d += 0.5)
        {
            along.Add(d);
            if (length - d > d + 1e-9) along.Add(length - d);
        }
        var dir = length > 0 ? (to - from) * (1 / length) : new Point(1, 0);
        var spots = along.Select(d => from + dir * d).ToList();
        Box Around(Point c) => Box.Around(c, 2 * BubbleRadius, 2 * BubbleRadius);
        // a gap round every label and earlier bubble, so that numbers and ids never touch
        bool Free(Box b) => !taken.Any(t => t.Overlaps(b.Inflate(Gap)));
        foreach (var c in spots)
            if (Free(Around(c)) && !pieces.Any(p => p.Overlaps(Around(c)))) return (Around(c), c);
        foreach (var c in spots)
            if (Free(Around(c))) return (Around(c), c);
        var normal = new Point(-dir.Y, dir.X);
        for (var offset = 2 * BubbleRadius; offset <= MaxLeader; offset += BubbleRadius)
            foreach (var side in new[] { 1.0, -1.0 })
                foreach (var c in spots)
                    if (Free(Around(c + normal * (side * offset)))) return (Around(c + normal * (side * offset)), c);
        var least = spots.MinBy(c => taken.Sum(t => t.OverlapArea(Around(c))));
        return (Around(least), least);
    }

    private readonly record struct Disc(double X, double Y, double Radius);

    // Punching strips carry their disc centres along their length; the disc size comes from the punch group.
    private static IEnumerable<Disc> DiscsOf(CutList list, PlacedPiece placed)
    {
        if (placed.Piece.Kind != CutPieceKind.PunchStrip || placed.Piece.Pads.Count == 0) yield break;
        var group = list.Rounds.FirstOrDefault(g => g.Pads.Contains(placed.Piece.Pads[0]));
        if (group is null) yield break;
        foreach (var along in placed.Piece.Positions)
            yield return placed.Turned
                ? new Disc(placed.X + placed.Width / 2, placed.Y + along, group.Diameter / 2)
                : new Disc(placed.X + along, placed.Y + placed.Height / 2, group.Diameter / 2);
    }
}
