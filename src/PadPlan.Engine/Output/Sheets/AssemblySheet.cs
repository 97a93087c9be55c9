using System.Globalization;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The view to build from, on one page at the largest standard scale that fits (1 : 1 up to 5 : 1; a board larger than
/// the page is reduced instead): part outlines over pads tinted by net, every lead from the body to where it lands (a dot
/// on a pad, the plane symbol for ground), pin names and polarity marks, and beside the drawing a parts table (values,
/// pin-1 and polarity notes, key numbers) and a legend. Labels adapt to the room rather than the scale growing: a
/// reference inside its body, else beside it or on a leader, else a key number; pad ids and net names where room is
/// left. What still finds no clear place is shown again on a detail page at double scale (at most one per 50 parts).
/// </summary>
internal static class AssemblySheet
{
    /// <summary>The standard enlargements, largest first (ISO 5455 lists 2 : 1 and 5 : 1; 3 : 2, 5 : 2, 3 : 1 and 4 : 1 are the usual steps between).</summary>
    internal static readonly double[] StandardScales = [5, 4, 3, 2.5, 2, 1.5, 1];
    /// <summary>Reductions for a board larger than the page (ISO 5455: 1 : 2, 1 : 5, 1 : 10, with 1 : 2.5 and 1 : 4 between).</summary>
    private static readonly double[] Reductions = [0.5, 0.4, 0.25, 0.2, 0.1];
    private const double LegendRow = 3.8;
    private const double LegendColumn = 46;
    /// <summary>Room round the board for labels that stand outside its edge (page mm).</summary>
    private const double Room = 6;
    /// <summary>Gap between the drawing and the parts table (page mm).</summary>
    private const double Gutter = 3;
    /// <summary>Most parts per detail page: a board needing detail gets at most one such page per 50 parts.</summary>
    public const int PartsPerDetailPage = 50;
    private static readonly Ink BodyFill = Ink.Grey(0.95);

    /// <summary>The chosen view: the page, where the drawing, the parts table's columns and the legend go, the scale and the scene (in page mm).</summary>
    internal sealed record Plan(PageFrame Frame, Box Drawing, ValueList<Box> TableColumns, Box Legend, double Scale, BoardScene Scene, PartsKey Key, ValueList<Detail> Details)
    {
        /// <summary>Labels still without a clear place on the main view (shown on the detail pages instead).</summary>
        public int Unresolved => Scene.Unresolved;
    }

    /// <summary>One detail page: a region of the board (board mm) drawn at double the main scale.</summary>
    internal sealed record Detail(Box Region, double Scale, BoardScene Scene, Box Area);

    public static IReadOnlyList<SheetDraft> Build(Project project, SheetOptions options)
    {
        var plan = Choose(project, options);
        var palette = new NetPalette(project);
        var drafts = new List<SheetDraft>();
        var page = new PageBuilder();
        var inner = new PageBuilder();
        DrawScene(inner, project, plan.Scene, palette, new Point(0, 0));
        page.Clipped(plan.Drawing, inner);
        PartsKey.Draw(page, plan.Key, plan.TableColumns);
        DrawLegend(page, plan.Legend, project, plan.Scene, palette, plan.Key.Keyed > 0, plan.Scene.Labels.Count(l => l.Role is LabelRole.PadId) < plan.Scene.Pads.Count);
        var caption = $"Assembly view, scale {ScaleText(plan.Scale)} (not for measuring)";
        drafts.Add(new SheetDraft(SheetKind.Assembly, plan.Frame, caption, page.Shapes(), plan.Scene.View));
        for (var i = 0; i < plan.Details.Count; i++)
        {
            var detail = plan.Details[i];
            var detailPage = new PageBuilder();
            var detailInner = new PageBuilder();
            DrawScene(detailInner, project, detail.Scene, palette, new Point(0, 0), detail.Area);
            detailPage.Clipped(detail.Area, detailInner);
            DrawLegend(detailPage, plan.Legend, project, detail.Scene, palette, false, false);
            var detailCaption = $"Assembly detail {i + 1} of {plan.Details.Count}, scale {ScaleText(detail.Scale)} (not for measuring)";
            drafts.Add(new SheetDraft(SheetKind.Assembly, plan.Frame, detailCaption, detailPage.Shapes(), detail.Scene.View));
        }
        return drafts;
    }

    /// <summary>
    /// The largest standard scale at which the board, its label room, the parts table and the legend all fit one page,
    /// landscape or portrait (landscape on a tie); then the scene at that scale, and detail pages for what found no room.
    /// </summary>
    internal static Plan Choose(Project project, SheetOptions options)
    {
        var (width, height) = (project.Board.Width!.Value, project.Board.Height!.Value);
        var entries = LegendEntryCount(project);
        var key = PartsKey.Of(project);
        (PageFrame Frame, Box Drawing, ValueList<Box> Columns, Box Legend, double Scale)? chosen = null;
        foreach (var scale in StandardScales.Where(s => s <= options.MaxAssemblyScale + 1e-9).Concat(Reductions))
        {
            foreach (var landscape in new[] { true, false })
            {
                var frame = new PageFrame(options.Paper, landscape);
                if (Arrange(frame, entries, key, width * scale + 2 * Room, height * scale + 2 * Room) is { } fit)
                {
                    chosen = (frame, fit.Drawing, fit.Columns, fit.Legend, scale);
                    break;
                }
            }
            if (chosen is not null) break;
        }
        if (chosen is null)
        {
            // even the smallest reduction leaves no room for the whole parts table: shrink the board to what is left
            var frame = new PageFrame(options.Paper, true);
            var legend = LegendBox(frame, entries);
            var area = new Box(frame.Body.Left, frame.Body.Top, frame.Body.Right, legend.Top - 2);
            var scale = Math.Min((area.Width * 0.5 - 2 * Room) / width, (area.Height - 2 * Room) / height);
            var drawing = Box.Of(area.Left, area.Top, width * scale + 2 * Room, height * scale + 2 * Room);
            chosen = (frame, drawing, TableSlots(area, drawing, key).ToValueList(), legend, scale);
        }
        var (f, draw, columns, legendBox, s) = chosen.Value;
        var scene = Scene(project, s, new Point(draw.Left + Room, draw.Top + Room));
        var details = scene.Unresolved > 0 ? Details(project, f, legendBox, scene, s) : ValueList<Detail>.Empty;
        return new Plan(f, draw, columns, legendBox, s, scene, key.WithKeys(scene), details);
    }

    /// <summary>The drawing at the top left of the body, the parts table in columns right of it and then below it, the legend along the foot; null when the table does not fit.</summary>
    private static (Box Drawing, ValueList<Box> Columns, Box Legend)? Arrange(PageFrame frame, int entries, PartsKey key, double drawWidth, double drawHeight)
    {
        var legend = LegendBox(frame, entries);
        var area = new Box(frame.Body.Left, frame.Body.Top, frame.Body.Right, legend.Top - 2);
        if (drawWidth > area.Width + 1e-9 || drawHeight > area.Height + 1e-9) return null;
        var drawing = Box.Of(area.Left, area.Top, drawWidth, drawHeight);
        var slots = TableSlots(area, drawing, key);
        return slots.Sum(b => key.RowsIn(b.Height)) >= key.Rows.Count ? (drawing, slots.ToValueList(), legend) : null;
    }

    /// <summary>Columns for the parts table: as many as fit right of the drawing, then under it.</summary>
    private static List<Box> TableSlots(Box area, Box drawing, PartsKey key)
    {
        var slots = new List<Box>();
        var w = key.ColumnWidth;
        for (var x = drawing.Right + Gutter; x + w <= area.Right + 1e-9; x += w + Gutter) slots.Add(Box.Of(x, area.Top, w, area.Height));
        if (area.Bottom - drawing.Bottom - Gutter >= key.RowsHeight(3))
            for (var x = area.Left; x + w <= drawing.Right + 1e-9; x += w + Gutter) slots.Add(new Box(x, drawing.Bottom + Gutter, x + w, area.Bottom));
        return slots;
    }

    private static Box LegendBox(PageFrame frame, int entries)
    {
        var body = frame.Body;
        var columns = Math.Max(1, (int)Math.Floor(body.Width / LegendColumn));
        var legendHeight = 6 + Math.Ceiling(entries / (double)columns) * LegendRow;
        return body with { Top = body.Bottom - legendHeight };
    }

    private static BoardScene Scene(Project project, double scale, Point origin) => BoardScene.Build(project, new BoardView(origin, scale), Room - 1);

    /// <summary>
    /// Detail pages at double scale: a window the size of the page body centred on the first object whose label found no
    /// room on the main view (in reading order), then on the first one that window left out, and so on, at most one page
    /// per 50 parts.
    /// </summary>
    private static ValueList<Detail> Details(Project project, PageFrame frame, Box legend, BoardScene main, double scale)
    {
        var detailScale = scale * 2;
        var area = frame.Body with { Bottom = legend.Top - 2 };
        var (boardWidth, boardHeight) = (project.Board.Width!.Value, project.Board.Height!.Value);
        var (w, h) = (Math.Min(boardWidth, (area.Width - 2 * Room) / detailScale), Math.Min(boardHeight, (area.Height - 2 * Room) / detailScale));
        var crowded = main.Labels.Where(l => !l.Clear).Select(l => main.View.ToBoard(l.LeaderTo ?? l.Box.Center))
            .OrderBy(p => p.Y).ThenBy(p => p.X).ToList();
        var limit = (int)Math.Ceiling(project.Parts.Count / (double)PartsPerDetailPage);
        var details = new List<Detail>();
        while (crowded.Count > 0 && details.Count < limit)
        {
            var c = crowded[0];
            var left = Math.Clamp(c.X - w / 2, 0, boardWidth - w);
            var top = Math.Clamp(c.Y - h / 2, 0, boardHeight - h);
            var region = Box.Of(left, top, w, h);
            crowded.RemoveAll(p => region.Inflate(-1).Contains(Box.Around(p, 0, 0)) || p == c);
            var origin = new Point(area.Left + Room - left * detailScale, area.Top + Room - top * detailScale);
            var scene = BoardScene.Build(project, new BoardView(origin, detailScale), Room - 1);
            details.Add(new Detail(region, detailScale, scene, area));
        }
        return details.ToValueList();
    }

    /// <summary>"5 : 1", "5 : 2", "3 : 2", "1 : 2": whole numbers on both sides, as drawing scales are written (ISO 5455).</summary>
    internal static string ScaleText(double scale) => scale >= 1
        ? Math.Abs(scale - Math.Round(scale)) < 1e-9 ? string.Create(CultureInfo.InvariantCulture, $"{scale:0} : 1")
            : Math.Abs(scale * 2 - Math.Round(scale * 2)) < 1e-9 ? string.Create(CultureInfo.InvariantCulture, $"{scale * 2:0} : 2")
            : string.Create(CultureInfo.InvariantCulture, $"{scale:0.##} : 1")
        : string.Create(CultureInfo.InvariantCulture, $"1 : {1 / scale:0.##}");

    /// <summary>Draws the scene; on a detail page (keep given) only labels wholly inside the kept box, on the main view only labels that found a clear place.</summary>
    private static void DrawScene(PageBuilder page, Project project, BoardScene scene, NetPalette palette, Point shift, Box? keep = null)
    {
        Point P(Point p) => p + shift;
        var view = new BoardView(scene.View.Origin + shift, scene.View.Scale);
        var layout = project.Layout ?? Layout.Empty;
        page.Rect(scene.Board.Offset(shift), SheetStyle.Heavy, null, view.Length(project.Board.CornerRadius));
        foreach (var keepout in project.Board.Keepouts) Marks.Keepout(page, keepout, view);

        // bodies first as a pale fill, so pads, leads and labels stay visible through them; outlines come on top
        foreach (var part in scene.Parts) page.Poly(part.Outline.Select(P), true, null, BodyFill).Tag(ShapeTag.Body(part.Ref));
        foreach (var pad in scene.Pads)
        {
            var ink = palette.InkOf(pad.Net);
            var box = pad.Box.Offset(shift);
            if (pad.Round) page.Circle(box.Center, box.Width / 2, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
            else page.Rect(box, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
            page.Tag(ShapeTag.Pad(pad.Id));
        }
        foreach (var jumper in layout.Jumpers) DrawJumper(page, layout, jumper, view, palette);
        foreach (var lead in scene.Leads)
            page.Line(P(lead.Exit), P(lead.Landing), palette.StrokeOf(lead.OnPlane ? null : lead.Net, 0.5));
        foreach (var lead in scene.Leads)
        {
            if (lead.OnPlane) Marks.Ground(page, P(lead.Landing), BoardScene.PlaneSymbol, SheetStyle.Thin, Ink.White);
            else page.Circle(P(lead.Landing), BoardScene.DotRadius, null, palette.InkOf(lead.Net));
        }
        foreach (var part in scene.Parts) page.Poly(part.Outline.Select(P), true, SheetStyle.Normal);
        foreach (var mark in scene.Marks)
            page.Poly(mark.Shape.Select(P), mark.Filled, mark.Filled ? null : SheetStyle.Normal, mark.Filled ? Ink.Black : Ink.White);
        var leadPads = scene.Leads.ToDictionary(l => l.Name, l => l.Pad);
        foreach (var label in scene.Labels)
            if (keep is { } k ? k.Contains(label.Box.Offset(shift)) : label.Clear) DrawLabel(page, label, palette, shift, leadPads);
    }

    private static void DrawLabel(PageBuilder page, SceneLabel label, NetPalette palette, Point shift, IReadOnlyDictionary<string, string?> leadPads)
    {
        var box = label.Box.Offset(shift);
        if (label.LeaderFrom is { } a && label.LeaderTo is { } b)
        {
            page.Line(a + shift, b + shift, SheetStyle.Fine);
            page.Circle(b + shift, 0.3, null, Ink.Black);
        }
        switch (label.Role)
        {
            case LabelRole.PinName:
                Label.Draw(page, box, label.Text, BoardScene.PinSize, FontWeight.Bold);
                page.Tag(ShapeTag.Label(label.TargetId[..label.TargetId.LastIndexOf('.')], leadPads.GetValueOrDefault(label.TargetId)));
                break;
            case LabelRole.PadId:
                Label.Draw(page, box, label.Text, SheetStyle.TextTiny, ink: SheetStyle.Mid);
                page.Tag(ShapeTag.Label(label.TargetId));
                break;
            case LabelRole.NetName:
                Label.Draw(page, box, label.Text, SheetStyle.TextSmall, FontWeight.Bold, palette.InkOf(label.Text));
                page.Tag(ShapeTag.Label(label.TargetId));
                break;
            case LabelRole.PartName:
                Label.Draw(page, box, label.Text, Label.SizeFor(box.Height), FontWeight.Bold);
                page.Tag(ShapeTag.Label(label.TargetId));
                break;
            case LabelRole.PartKey:
                Label.Draw(page, box, label.Text, Label.SizeFor(box.Height), FontWeight.Bold, KeyInk);
                page.Tag(ShapeTag.Label(label.TargetId));
                break;
        }
    }

    /// <summary>Key numbers print in dark blue so they do not read as pad or pin numbers.</summary>
    private static readonly Ink KeyInk = new(26, 51, 140);

    private static void DrawJumper(PageBuilder page, Layout layout, Jumper jumper, BoardView view, NetPalette palette)
    {
        var islands = layout.Islands().ToList();
        var from = islands.FirstOrDefault(i => i.Id == jumper.From);
        var to = islands.FirstOrDefault(i => i.Id == jumper.To);
        if (from is null || to is null) return;
        var points = new[] { from.Center }.Concat(jumper.Path).Append(to.Center).Select(view.ToPage);
        page.Poly(points, false, palette.StrokeOf(from.Net, 0.7));
    }

    /// <summary>Symbol entries the legend can hold (the five always shown, up to three marks, the key number and the pad-id note).</summary>
    private const int SymbolEntries = 10;
    /// <summary>Most nets the legend lists one by one; beyond that it says where the net names are instead.</summary>
    private const int MaxLegendNets = 28;

    private static int LegendEntryCount(Project project) => SymbolEntries + NetsListed(new NetPalette(project));

    private static int NetsListed(NetPalette palette) => palette.Nets.Count <= MaxLegendNets ? palette.Nets.Count : 1;

    /// <summary>Every symbol the view can show, then each net with its colour, line pattern and voltage (estimates marked as such).</summary>
    private static void DrawLegend(PageBuilder page, Box area, Project project, BoardScene scene, NetPalette palette, bool keyed, bool padsUnnamed)
    {
        page.Line(new Point(area.Left, area.Top), new Point(area.Right, area.Top), SheetStyle.Rule);
        page.Text("Legend", new Point(area.Left, area.Top + 4), SheetStyle.TextNormal, weight: FontWeight.Bold);
        var columns = Math.Max(1, (int)Math.Floor(area.Width / LegendColumn));
        var kinds = scene.Marks.Select(m => m.Kind).ToHashSet();
        var entries = new List<(Action<Point> Symbol, string Text)>
        {
            (p => { page.Rect(Box.Around(p, 7, 3), SheetStyle.Normal, BodyFill); }, "Part body, seen from above"),
            (p => { page.Line(p - new Point(3.5, 0), p + new Point(2.4, 0), Stroke.Solid(SheetStyle.Mid, 0.5)); page.Circle(p + new Point(2.4, 0), BoardScene.DotRadius, null, SheetStyle.Mid); }, "Lead: solder where the dot is"),
            (p => { page.Line(p - new Point(3.5, 0), p + new Point(1.5, 0), Stroke.Solid(Ink.Black, 0.5)); Marks.Ground(page, p + new Point(2.4, 0), BoardScene.PlaneSymbol, SheetStyle.Thin, Ink.White); }, "Ground lead: solder to the plane"),
            (p => page.Text("E B C", p + new Point(0, 0.6), BoardScene.PinSize, TextAnchor.Middle, FontWeight.Bold), "Pin name at its lead"),
            (p => { page.Line(p - new Point(3.5, 1.5), p, SheetStyle.Fine); page.Circle(p, 0.3, null, Ink.Black); }, "Leader: the label belongs here"),
        };
        if (kinds.Contains(MarkKind.Band)) entries.Add((p => { page.Rect(Box.Around(p, 7, 3), SheetStyle.Normal, BodyFill); page.Rect(Box.Around(p + new Point(2, 0), 1.2, 3), null, Ink.Black); }, "Band: the cathode (K) end"));
        if (kinds.Contains(MarkKind.Notch) || kinds.Contains(MarkKind.Dot)) entries.Add((p => { page.Rect(Box.Around(p, 7, 3), SheetStyle.Normal, BodyFill); page.Circle(p + new Point(-2.2, 0.5), 0.4, null, Ink.Black); }, "Notch or dot: the pin 1 end"));
        if (kinds.Contains(MarkKind.Winding)) entries.Add((p => page.Circle(p, 0.45, null, Ink.Black), "Dot: where a winding starts"));
        if (keyed) entries.Add((p => page.Text(BoardScene.KeyPrefix + "12", p + new Point(0, 0.7), BoardScene.KeySize, TextAnchor.Middle, FontWeight.Bold, KeyInk), "Key number: see the parts table"));
        if (padsUnnamed) entries.Add((p => page.Circle(p + new Point(2.4, 0), 1.3, SheetStyle.Thin, Ink.White), "Pad ids: all on the template"));
        if (NetsListed(palette) < palette.Nets.Count)
            entries.Add((p => page.Circle(p + new Point(2.4, 0), 1.3, SheetStyle.Thin, SheetStyle.Shade), $"{palette.Nets.Count} nets: see the leads table"));
        foreach (var net in NetsListed(palette) < palette.Nets.Count ? [] : palette.Nets)
        {
            var name = net;
            var facts = project.FindNet(net);
            entries.Add((p =>
            {
                page.Line(p - new Point(3.5, 0), p + new Point(1, 0), palette.StrokeOf(name, 0.5));
                page.Circle(p + new Point(2.4, 0), 1.3, Stroke.Solid(palette.InkOf(name), 0.45), palette.InkOf(name).Tint(0.82));
            }, name + VoltageText(facts)));
        }
        var top = area.Top + 6;
        for (var i = 0; i < entries.Count; i++)
        {
            var x = area.Left + (i % columns) * LegendColumn;
            var y = top + (i / columns) * LegendRow + LegendRow / 2;
            entries[i].Symbol(new Point(x + 4, y));
            page.Text(TextMetrics.Fit(entries[i].Text, SheetStyle.TextSmall, LegendColumn - 11), new Point(x + 9.5, y + SheetStyle.TextSmall * 0.36), SheetStyle.TextSmall);
        }
    }

    /// <summary>" (12 V)" for a stated voltage, " (≈ 8.2 V est.)" for one the importer estimated, "" when none is known.</summary>
    internal static string VoltageText(Net? net) => net?.Voltage is not { } v ? ""
        : net.VoltageEstimated ? string.Create(CultureInfo.InvariantCulture, $" (\u2248 {v:0.#} V est.)")
        : string.Create(CultureInfo.InvariantCulture, $" ({v:0.#} V)");
}
