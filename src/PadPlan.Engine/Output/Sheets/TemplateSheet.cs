using PadPlan.Output;
using System.Globalization;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The pad template at exactly 1:1: board outline with corner marks, every pad outline with its centre and id, strip
/// scores, ground landings, keep-outs and faint part outlines; check bars, legend and notes below. A board larger than
/// the paper is tiled over several pages with overlap and alignment marks.
/// </summary>
internal static class TemplateSheet
{
    /// <summary>Room around the board for corner marks and size figures (mm).</summary>
    private const double CornerRoom = 9;
    private const double FooterHeight = 40;
    private const double MarkGap = 1.5;
    private const double MarkLength = 5;
    private const double IdSize = 1.8;
    private const double SegmentIdSize = 1.5;
    /// <summary>Smallest pad-id lettering, for a pad in a crowd (page mm; 4 pt, still legible on a laser print).</summary>
    private const double MinIdSize = 1.4;
    /// <summary>How far a score mark runs past each side of a strip, so it can still be seen with the strip laid on it.</summary>
    private const double ScoreOverhang = 1.5;

    public static IReadOnlyList<SheetDraft> Build(Project project, SheetOptions options)
    {
        var (width, height) = (project.Board.Width!.Value, project.Board.Height!.Value);
        var plan = TilePlan.For(width, height, landscape => WindowSize(new PageFrame(options.Paper, landscape)), options.TileOverlap);
        var frame = new PageFrame(options.Paper, plan.Landscape);
        var window = Window(frame);
        var marks = plan.IsTiled ? AlignmentMarks(plan) : [];
        var drafts = new List<SheetDraft>();
        foreach (var tile in plan.Tiles)
        {
            var origin = plan.IsTiled
                ? new Point(window.Left - tile.Region.Left, window.Top - tile.Region.Top)
                : new Point(window.Left + (window.Width - width) / 2, window.Top);
            var view = new BoardView(origin, 1);
            var page = new PageBuilder();
            var boardBox = view.ToPage(new Box(0, 0, width, height));
            var clip = view.ToPage(tile.Region);
            clip = new Box(
                tile.Column == 0 ? clip.Left - CornerRoom : clip.Left,
                tile.Row == 0 ? clip.Top - CornerRoom : clip.Top,
                tile.Column == plan.Columns - 1 ? clip.Right + CornerRoom : clip.Right,
                tile.Row == plan.Rows - 1 ? clip.Bottom + CornerRoom : clip.Bottom);
            var inner = new PageBuilder();
            DrawBoard(inner, project, view, boardBox);
            foreach (var (at, name) in marks)
            {
                var p = view.ToPage(at);
                Marks.Alignment(inner, p);
                inner.Text(name, p + new Point(2.6, -2.6), SheetStyle.TextSmall, weight: FontWeight.Bold);
            }
            if (plan.IsTiled) DrawSeams(inner, plan, tile, view);
            page.Clipped(clip, inner);
            var caption = "Pad template, 1:1" + (plan.IsTiled ? $" — part {SheetNumber(plan, tile.Row, tile.Column)} of {plan.Tiles.Count} (row {tile.Row + 1}, column {tile.Column + 1})" : "");
            var bar = DrawFooter(page, project, frame, plan, tile);
            drafts.Add(new SheetDraft(SheetKind.Template, frame, caption, page.Shapes(), view, bar));
        }
        return drafts;
    }

    /// <summary>The page area the board may take: the body less the footer and the room for corner marks.</summary>
    private static Box Window(PageFrame frame)
    {
        var body = frame.Body;
        return new Box(body.Left + CornerRoom, body.Top + CornerRoom, body.Right - CornerRoom, body.Bottom - FooterHeight - CornerRoom);
    }

    private static (double, double) WindowSize(PageFrame frame)
    {
        var w = Window(frame);
        return (w.Width, w.Height);
    }

    private static void DrawBoard(PageBuilder page, Project project, BoardView view, Box boardBox)
    {
        var layout = project.Layout ?? Layout.Empty;
        foreach (var keepout in project.Board.Keepouts) Marks.Keepout(page, keepout, view);
        DrawFaintParts(page, project, view);
        page.Rect(boardBox, SheetStyle.Normal, null, project.Board.CornerRadius);
        DrawCornerMarks(page, boardBox);
        DrawSizeFigures(page, boardBox, project.Board);

        var placer = new LabelPlacer(boardBox.Inflate(-0.3));
        foreach (var island in layout.Islands())
        {
            var zone = IslandZone(island, view);
            placer.Obstacle(new BoxZone(zone.Bounds.Inflate(0.3)), island.Id, stopsLeaders: true);
            placer.Target(LabelTarget.Pad, island.Id, zone);
        }
        foreach (var keepout in project.Board.Keepouts) placer.Block(view.ToPage(Marks.BoundsOf(keepout)));
        foreach (var landing in GroundLandings(layout)) placer.Block(Box.Around(view.ToPage(landing), Marks.GroundSize, Marks.GroundSize).Inflate(0.2));
        foreach (var (_, footprint, placement) in PlacedParts(project))
        {
            var outline = new PolygonZone(Marks.BodyOf(footprint, placement).Select(view.ToPage).ToList());
            placer.Obstacle(new BoxZone(outline.Bounds), placement.Ref);
            placer.Target(LabelTarget.Part, placement.Ref, outline);
        }

        foreach (var pad in layout.Pads)
        {
            switch (pad)
            {
                case RoundPad r:
                    page.Circle(view.ToPage(r.Center), r.Diameter / 2, SheetStyle.Thin).Tag(ShapeTag.Pad(r.Id));
                    break;
                case RectPad r:
                    page.Rect(view.ToPage(Box.Around(r.Center, r.Width, r.Height)), SheetStyle.Thin).Tag(ShapeTag.Pad(r.Id));
                    break;
                case StripPad s:
                    DrawStrip(page, s, view, placer);
                    break;
            }
        }
        foreach (var island in layout.Islands()) CentreMark(page, island, view);
        foreach (var landing in GroundLandings(layout)) Marks.Ground(page, view.ToPage(landing), Marks.GroundSize, SheetStyle.Fine);

        foreach (var pad in layout.Pads.Where(p => p is not StripPad))
        {
            var island = pad.Islands()[0];
            // the same rules as on the assembly view: clear of everything else, nearer its own pad than any other, else on a
            // leader that crosses no other pad; outside every part body. Where even that finds no room, smaller lettering.
            LabelPlacer.Request Ask(double size)
            {
                var (w, h) = Label.Size(pad.Id, size, FontWeight.Bold);
                return new LabelPlacer.Request(island.Id, LabelTarget.Pad, island.Id, IslandZone(island, view), w, h);
            }
            var size = IdSize;
            var placed = placer.TryPlace(Ask(IdSize));
            if (placed is null) { size = MinIdSize; placed = placer.TryPlace(Ask(size)) ?? placer.Place(Ask(size) with { LeaderMayCross = true }); }
            if (placed.LeaderFrom is { } a && placed.LeaderTo is { } b) page.Line(a, b, SheetStyle.Hair);
            Label.Draw(page, placed.Box, pad.Id, size, FontWeight.Bold);
            page.Tag(ShapeTag.Label(pad.Id));
        }
        foreach (var strip in layout.Pads.OfType<StripPad>()) LabelSegments(page, layout, strip, view, placer);
        LabelKeepouts(page, project, view, placer);
        LabelParts(page, project, view, placer);
    }

    private static IEnumerable<Point> GroundLandings(Layout layout) =>
        layout.Placements.SelectMany(p => p.Leads).Where(l => l.OnPlane).Select(l => l.At);

    internal static Box IslandBox(Island island) => Box.Around(island.Center, island.Width, island.Height);

    private static Zone IslandZone(Island island, BoardView view)
    {
        var box = view.ToPage(IslandBox(island));
        return island.Shape == IslandShape.Round ? new DiscZone(box.Center, box.Width / 2) : new BoxZone(box);
    }

    private static void CentreMark(PageBuilder page, Island island, BoardView view)
    {
        var arm = Math.Min(1.0, Math.Min(island.Width, island.Height) * 0.3);
        page.Cross(view.ToPage(island.Center), arm, SheetStyle.Hair);
    }

    private static void DrawStrip(PageBuilder page, StripPad strip, BoardView view, LabelPlacer placer)
    {
        var islands = strip.Islands();
        var whole = islands.Select(IslandBox).Aggregate((a, b) => a.Union(b));
        page.Rect(view.ToPage(whole), SheetStyle.Thin).Tag(ShapeTag.Pad(strip.Id));
        var along = 0.0;
        for (var i = 0; i < strip.Segments.Count - 1; i++)
        {
            along += strip.Segments[i].Length;
            var score = strip.Vertical
                ? Box.Around(new Point(strip.Start.X, strip.Start.Y + along), strip.Width + 2 * ScoreOverhang, strip.ScoreWidth)
                : Box.Around(new Point(strip.Start.X + along, strip.Start.Y), strip.ScoreWidth, strip.Width + 2 * ScoreOverhang);
            var onPage = view.ToPage(score);
            page.Rect(onPage, null, SheetStyle.Mid);
            placer.Block(onPage);
        }
    }

    /// <summary>Segment ids beside the strip, turned across it for horizontal strips so that 2.54 mm pitch still has room; the strip's own id at its start.</summary>
    private static IEnumerable<string> LandedOn(Layout layout, IEnumerable<string> islands)
    {
        var ids = islands.ToHashSet();
        return layout.Placements.Where(p => p.Leads.Any(l => l.Pad is { } pad && ids.Contains(pad))).Select(p => p.Ref);
    }

    private static void LabelSegments(PageBuilder page, Layout layout, StripPad strip, BoardView view, LabelPlacer placer)
    {
        var islands = strip.Islands();
        var whole = view.ToPage(islands.Select(IslandBox).Aggregate((a, b) => a.Union(b)));
        // a segment's id may stand inside the body of a part whose lead lands on that segment (a DIP over its own strips:
        // "U1-2" names U1's pin 2), never inside another part's body
        var landed = LandedOn(layout, islands.Select(i => i.Id)).Distinct().ToList();
        foreach (var island in islands)
        {
            var box = view.ToPage(IslandBox(island));
            var (w, h) = Label.Size(island.Id, SegmentIdSize, upward: !strip.Vertical);
            // inside its own segment where it fits (turned across a horizontal strip), else beside it on a leader
            var inside = Box.Around(box.Center, w, h);
            var own = LandedOn(layout, [island.Id]).ToList();
            var request = new LabelPlacer.Request(island.Id, LabelTarget.Pad, island.Id, new BoxZone(box), w, h,
                box.Inflate(-0.1).Contains(inside) ? [inside] : [], LeaderFrom: 0, AlsoOwns: own);
            var placed = placer.TryPlace(request) ?? placer.Place(request with { LeaderMayCross = true });
            if (placed.LeaderFrom is { } a && placed.LeaderTo is { } b) page.Line(a, b, SheetStyle.Hair);
            Label.Draw(page, placed.Box, island.Id, SegmentIdSize, upward: !strip.Vertical);
            page.Tag(ShapeTag.Label([island.Id, strip.Id, .. own]));
        }
        var (sw, sh) = Label.Size(strip.Id, IdSize, FontWeight.Bold);
        IReadOnlyList<Box> ends = strip.Vertical
            ? [Box.Of(whole.Center.X - sw / 2, whole.Top - 0.4 - sh, sw, sh), Box.Of(whole.Center.X - sw / 2, whole.Bottom + 0.4, sw, sh)]
            : [Box.Of(whole.Left - 0.6 - sw, whole.Center.Y - sh / 2, sw, sh), Box.Of(whole.Right + 0.6, whole.Center.Y - sh / 2, sw, sh)];
        var stripRequest = new LabelPlacer.Request(strip.Id, LabelTarget.Other, strip.Id, new BoxZone(whole), sw, sh, ends, AlsoOwns: landed);
        var stripPlaced = placer.TryPlace(stripRequest) ?? placer.Place(stripRequest with { LeaderMayCross = true });
        if (stripPlaced.LeaderFrom is { } sa && stripPlaced.LeaderTo is { } sb) page.Line(sa, sb, SheetStyle.Hair);
        Label.Draw(page, stripPlaced.Box, strip.Id, IdSize, FontWeight.Bold);
        page.Tag(ShapeTag.Label([strip.Id, .. landed]));
    }

    private static void LabelKeepouts(PageBuilder page, Project project, BoardView view, LabelPlacer placer)
    {
        foreach (var keepout in project.Board.Keepouts)
        {
            var (w, h) = Label.Size(keepout.Id, SheetStyle.TextTiny);
            var box = placer.Place(LabelPlacer.Around(view.ToPage(Marks.BoundsOf(keepout)), w, h, 0.3));
            Label.Draw(page, box, keepout.Id, SheetStyle.TextTiny, ink: SheetStyle.Mid);
        }
    }

    private static void DrawFaintParts(PageBuilder page, Project project, BoardView view)
    {
        foreach (var (_, footprint, placement) in PlacedParts(project))
            page.Poly(Marks.BodyOf(footprint, placement).Select(view.ToPage), true, SheetStyle.FaintLine).Tag(ShapeTag.Body(placement.Ref));
    }

    /// <summary>Faint part references, for orientation only: inside or beside the body where a clear place is left, else none (the assembly view names every part).</summary>
    private static void LabelParts(PageBuilder page, Project project, BoardView view, LabelPlacer placer)
    {
        foreach (var (part, footprint, placement) in PlacedParts(project))
        {
            var outline = Marks.BodyOf(footprint, placement).Select(view.ToPage).ToList();
            var body = Marks.BoundsOf(outline);
            var (w, h) = Label.Size(part.Ref, IdSize);
            var inside = Box.Around(body.Center, w, h);
            var request = new LabelPlacer.Request(part.Ref, LabelTarget.Part, part.Ref, new PolygonZone(outline), w, h, body.Contains(inside) ? [inside] : []);
            if (placer.TryPlace(request) is not { } placed) continue;
            if (placed.LeaderFrom is { } a && placed.LeaderTo is { } b) page.Line(a, b, SheetStyle.FaintLine);
            Label.Draw(page, placed.Box, part.Ref, IdSize, ink: SheetStyle.Faint);
            page.Tag(ShapeTag.Label(part.Ref));
        }
    }

    /// <summary>Placed parts whose part and footprint the project holds, in layout order.</summary>
    internal static IEnumerable<(Part Part, Footprint Footprint, Placement Placement)> PlacedParts(Project project)
    {
        foreach (var placement in (project.Layout ?? Layout.Empty).Placements)
        {
            var part = project.FindPart(placement.Ref);
            var footprint = part is null ? null : project.FindFootprint(part.Footprint);
            if (part is not null && footprint is not null) yield return (part, footprint, placement);
        }
    }

    /// <summary>Corner marks: the board edges carried on past each corner after a small gap, so the outline can be lined up with the board's edges.</summary>
    private static void DrawCornerMarks(PageBuilder page, Box board)
    {
        foreach (var (x, dx) in new[] { (board.Left, -1.0), (board.Right, 1.0) })
            foreach (var (y, dy) in new[] { (board.Top, -1.0), (board.Bottom, 1.0) })
            {
                page.Line(new Point(x + dx * MarkGap, y), new Point(x + dx * (MarkGap + MarkLength), y), SheetStyle.Fine);
                page.Line(new Point(x, y + dy * MarkGap), new Point(x, y + dy * (MarkGap + MarkLength)), SheetStyle.Fine);
            }
    }

    private static void DrawSizeFigures(PageBuilder page, Box board, Board spec)
    {
        var size = SheetStyle.TextSmall;
        page.Text(Mm(spec.Width!.Value), new Point(board.Center.X, board.Top - 1.6), size, TextAnchor.Middle);
        page.Text(Mm(spec.Height!.Value), new Point(board.Left - 1.6, board.Center.Y), size, TextAnchor.Middle, angle: -90);
    }

    private static string Mm(double v) => v.ToString("0.##", CultureInfo.InvariantCulture) + " mm";

    /// <summary>Alignment marks in the middle of each overlap band, one per neighbouring tile pair, named A, B, C ...</summary>
    private static IReadOnlyList<(Point At, string Name)> AlignmentMarks(TilePlan plan)
    {
        var marks = new List<(Point, string)>();
        string Next() => MarkName(marks.Count);
        for (var r = 0; r < plan.Rows; r++)
            for (var c = 0; c + 1 < plan.Columns; c++)
            {
                var (a, b) = (plan.At(r, c).Region, plan.At(r, c + 1).Region);
                marks.Add((new Point((a.Right + b.Left) / 2, a.Center.Y), Next()));
            }
        for (var r = 0; r + 1 < plan.Rows; r++)
            for (var c = 0; c < plan.Columns; c++)
            {
                var (a, b) = (plan.At(r, c).Region, plan.At(r + 1, c).Region);
                marks.Add((new Point(a.Center.X, (a.Bottom + b.Top) / 2), Next()));
            }
        return marks;
    }

    private static string MarkName(int i) => i < 26 ? ((char)('A' + i)).ToString() : $"{(char)('A' + i / 26 - 1)}{(char)('A' + i % 26)}";

    /// <summary>Dashed seams where this tile meets the neighbour before it: trim along a seam and lay this sheet over that one.</summary>
    private static void DrawSeams(PageBuilder page, TilePlan plan, Tile tile, BoardView view)
    {
        var seam = Stroke.Dashed(Ink.Black, 0.4, 3, 1.5);
        var region = view.ToPage(tile.Region);
        var size = SheetStyle.TextSmall;
        if (tile.Column > 0)
        {
            page.Line(new Point(region.Left, region.Top), new Point(region.Left, region.Bottom), seam);
            page.Text($"Trim along this line and lay over sheet {SheetNumber(plan, tile.Row, tile.Column - 1)}", new Point(region.Left + 1 + size, region.Center.Y), size, TextAnchor.Middle, ink: SheetStyle.Mid, angle: -90);
        }
        if (tile.Row > 0)
        {
            page.Line(new Point(region.Left, region.Top), new Point(region.Right, region.Top), seam);
            page.Text($"Trim along this line and lay over sheet {SheetNumber(plan, tile.Row - 1, tile.Column)}", new Point(region.Center.X, region.Top + 1 + size), size, TextAnchor.Middle, ink: SheetStyle.Mid);
        }
    }

    /// <summary>Template pages come first in the book, in row order, so a tile's sheet number is its place in the grid.</summary>
    private static int SheetNumber(TilePlan plan, int row, int column) => row * plan.Columns + column + 1;

    /// <summary>Check bars, legend, tile map and the notes; returns the box of the 50 mm bar.</summary>
    private static Box DrawFooter(PageBuilder page, Project project, PageFrame frame, TilePlan plan, Tile tile)
    {
        var body = frame.Body;
        var top = body.Bottom - FooterHeight;
        page.Line(new Point(body.Left, top), new Point(body.Right, top), SheetStyle.Rule);
        var bar = CheckBar.Draw(page, new Point(body.Left + 1, top + 3));

        var mapWidth = plan.IsTiled ? 34.0 : 0;
        var legendLeft = body.Left + 66;
        DrawLegend(page, new Box(legendLeft, top + 2.5, body.Right - mapWidth, top + 2.5 + CheckBar.Height + 4.5), plan.IsTiled);
        if (plan.IsTiled) DrawTileMap(page, new Box(body.Right - mapWidth + 4, top + 2.5, body.Right, top + 2.5 + CheckBar.Height), plan, tile);

        var y = top + CheckBar.Height + 9;
        foreach (var line in TextMetrics.Wrap(CheckBar.Instruction, SheetStyle.TextSmall, body.Width, FontWeight.Bold))
        {
            page.Text(line, new Point(body.Left, y), SheetStyle.TextSmall, weight: FontWeight.Bold);
            y += SheetStyle.TextSmall * SheetStyle.LineGap;
        }
        foreach (var line in TextMetrics.Wrap(Cautions.TemplateLine(project), SheetStyle.TextSmall, body.Width))
        {
            page.Text(line, new Point(body.Left, y), SheetStyle.TextSmall);
            y += SheetStyle.TextSmall * SheetStyle.LineGap;
        }
        return bar;
    }

    private static void DrawLegend(PageBuilder page, Box area, bool tiled)
    {
        var entries = new List<(Action<Point> Symbol, string Text)>
        {
            (p => { page.Circle(p, 1.3, SheetStyle.Thin); page.Cross(p, 0.8, SheetStyle.Hair); }, "Pad: cut or punch to the outline; + is its centre"),
            (p => { page.Rect(Box.Around(p, 5, 2.2), SheetStyle.Thin); page.Rect(Box.Around(p, 0.6, 3.6), null, SheetStyle.Mid); }, "Strip: score across at each grey band"),
            (p => Marks.Ground(page, p, Marks.GroundSize, SheetStyle.Fine), "Ground landing: solder the lead to the plane"),
            (p => { var b = Box.Around(p, 4.4, 2.6); foreach (var (a, c) in Hatch.Rect(b, 0.8)) page.Line(a, c, SheetStyle.FaintLine); page.Rect(b, Stroke.Dashed(SheetStyle.Mid, 0.25, 1.2, 0.6)); }, "Keep-out: no pad, part or ground lead"),
            (p => page.Rect(Box.Around(p, 4.4, 2.2), SheetStyle.FaintLine), "Faint: part bodies, for orientation only"),
            (p => page.Line(p + new Point(-2.2, 0.9), p + new Point(1.2, -0.6), SheetStyle.Hair), "Thin line from an id: the id names the pad or segment at its far end"),
        };
        if (tiled) entries.Add((p => { page.Circle(p, 1.3, SheetStyle.Fine); page.Cross(p, 2.0, SheetStyle.Fine); }, "Alignment: lay sheets so the marks meet"));
        const double rowHeight = 3.5;
        var rows = Math.Max(1, (int)Math.Floor(area.Height / rowHeight));
        var columns = (int)Math.Ceiling(entries.Count / (double)rows);
        var columnWidth = area.Width / columns;
        for (var i = 0; i < entries.Count; i++)
        {
            var x = area.Left + (i / rows) * columnWidth;
            var y = area.Top + (i % rows) * rowHeight + rowHeight / 2;
            entries[i].Symbol(new Point(x + 3, y));
            page.Text(TextMetrics.Fit(entries[i].Text, SheetStyle.TextSmall, columnWidth - 8), new Point(x + 7, y + SheetStyle.TextSmall * 0.36), SheetStyle.TextSmall);
        }
    }

    private static void DrawTileMap(PageBuilder page, Box area, TilePlan plan, Tile current)
    {
        page.Text("Sheet layout", new Point(area.Left, area.Top + 1.6), SheetStyle.TextTiny, ink: SheetStyle.Mid);
        var cell = Math.Min(6, Math.Min(area.Width / plan.Columns, (area.Height - 3) / plan.Rows));
        foreach (var tile in plan.Tiles)
        {
            var box = Box.Of(area.Left + tile.Column * cell, area.Top + 3 + tile.Row * cell, cell, cell);
            page.Rect(box, SheetStyle.Fine, tile == current ? SheetStyle.Shade : null);
            var number = SheetNumber(plan, tile.Row, tile.Column).ToString(CultureInfo.InvariantCulture);
            page.Text(number, new Point(box.Center.X, box.Center.Y + cell * 0.18), Math.Min(SheetStyle.TextSmall, cell * 0.5), TextAnchor.Middle, tile == current ? FontWeight.Bold : FontWeight.Regular);
        }
    }
}
