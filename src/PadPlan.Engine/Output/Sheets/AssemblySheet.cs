using System.Globalization;
using PadPlan.Model;
using PadPlan.Simulation;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The view to build from, enlarged to fill the page for small boards: part outlines over pads tinted by net, every
/// lead from the body to where it lands (a dot on a pad, the plane symbol for ground), pin names and polarity marks,
/// labels placed clear of each other, and a legend. When the labels do not fit at the page's scale, the view is
/// enlarged further and spread over several pages (tiles) rather than letting labels overlap.
/// </summary>
internal static class AssemblySheet
{
    /// <summary>Enlargements offered, so the printed scale is a round figure.</summary>
    private static readonly double[] Scales = [0.25, 0.4, 0.5, 0.6, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12];
    /// <summary>Largest enlargement used to make room for labels on a crowded board.</summary>
    private const double MaxCrowdedScale = 12;
    private const double LegendRow = 4.2;
    private const double LegendColumn = 46;
    /// <summary>Room round the board for labels that stand outside its edge (page mm).</summary>
    private const double Room = 8;
    private static readonly Ink BodyFill = Ink.Grey(0.95);

    /// <summary>The chosen view: its scale, the scene (in view mm, board at Room from the top-left) and the tiles it is printed on.</summary>
    internal sealed record Plan(PageFrame Frame, Box Area, Box Legend, double Scale, BoardScene Scene, TilePlan Tiles);

    public static IReadOnlyList<SheetDraft> Build(Project project, SheetOptions options)
    {
        var plan = Choose(project, options);
        var palette = new NetPalette(project);
        var drafts = new List<SheetDraft>();
        foreach (var tile in plan.Tiles.Tiles)
        {
            var shift = plan.Tiles.IsTiled
                ? new Point(plan.Area.Left - tile.Region.Left, plan.Area.Top - tile.Region.Top)
                : new Point(plan.Area.Left + (plan.Area.Width - tile.Region.Width) / 2, plan.Area.Top + (plan.Area.Height - tile.Region.Height) / 2);
            var page = new PageBuilder();
            var inner = new PageBuilder();
            DrawScene(inner, project, plan.Scene, palette, shift);
            page.Clipped(plan.Tiles.IsTiled ? plan.Area : plan.Area.Inflate(Room), inner);
            DrawLegend(page, plan.Legend, project, plan.Scene, palette, options.Simulation);
            var caption = $"Assembly view, scale {ScaleText(plan.Scale)} (not for measuring)"
                + (plan.Tiles.IsTiled ? $" — part {tile.Row * plan.Tiles.Columns + tile.Column + 1} of {plan.Tiles.Tiles.Count} (row {tile.Row + 1}, column {tile.Column + 1})" : "");
            var view = new BoardView(plan.Scene.View.Origin + shift, plan.Scale);
            drafts.Add(new SheetDraft(SheetKind.Assembly, plan.Frame, caption, page.Shapes(), view));
        }
        return drafts;
    }

    /// <summary>
    /// The largest round scale at which the board fits one page, if every label finds a clear place there; otherwise the
    /// next larger scales in turn, tiled over as many pages as they need, until the labels fit (or, failing that, the
    /// smallest scale that leaves fewest labels without a clear place).
    /// </summary>
    internal static Plan Choose(Project project, SheetOptions options)
    {
        var (width, height) = (project.Board.Width!.Value, project.Board.Height!.Value);
        var entries = LegendEntryCount(project);
        var fits = new[] { false, true }
            .Select(landscape => Fit(new PageFrame(options.Paper, landscape), entries, width, height, options.MaxAssemblyScale))
            .OrderByDescending(f => f.Scale).ThenBy(f => f.Frame.Landscape != width > height).ToList();
        var first = fits[0];
        var scene = Scene(project, first.Scale);
        var single = new TilePlan(first.Frame.Landscape, 1, 1, ValueList.Of(new Tile(0, 0, new Box(0, 0, width * first.Scale + 2 * Room, height * first.Scale + 2 * Room))));
        var plan = new Plan(first.Frame, first.Area, first.Legend, first.Scale, scene, single);
        var best = plan;
        foreach (var scale in Scales.Where(s => s > first.Scale + 1e-9 && s <= MaxCrowdedScale + 1e-9))
        {
            if (best.Scene.Unresolved == 0) break;
            var larger = Scene(project, scale);
            if (larger.Unresolved >= best.Scene.Unresolved) continue;
            var tiles = TilePlan.For(width * scale + 2 * Room, height * scale + 2 * Room,
                landscape => { var f = fits.First(x => x.Frame.Landscape == landscape); return (f.Area.Width, f.Area.Height); }, Room * 2);
            var fit = fits.First(f => f.Frame.Landscape == tiles.Landscape);
            best = new Plan(fit.Frame, fit.Area, fit.Legend, scale, larger, tiles);
        }
        return best;
    }

    private static BoardScene Scene(Project project, double scale) => BoardScene.Build(project, new BoardView(new Point(Room, Room), scale), Room - 1);

    private static (PageFrame Frame, Box Area, double Scale, Box Legend) Fit(PageFrame frame, int entries, double width, double height, double maxScale)
    {
        var body = frame.Body;
        var columns = Math.Max(1, (int)Math.Floor(body.Width / LegendColumn));
        var legendHeight = 6 + Math.Ceiling(entries / (double)columns) * LegendRow;
        var legend = body with { Top = body.Bottom - legendHeight };
        var area = new Box(body.Left, body.Top, body.Right, legend.Top - 2);
        var fit = Math.Min((area.Width - 2 * Room) / width, (area.Height - 2 * Room) / height);
        var scale = Scales.LastOrDefault(s => s <= fit + 1e-9 && s <= maxScale + 1e-9);
        if (scale == 0) scale = Math.Min(fit, maxScale);
        return (frame, area, scale, legend);
    }

    internal static string ScaleText(double scale) => scale >= 1
        ? string.Create(CultureInfo.InvariantCulture, $"{scale:0.##} : 1")
        : string.Create(CultureInfo.InvariantCulture, $"1 : {1 / scale:0.##}");

    private static void DrawScene(PageBuilder page, Project project, BoardScene scene, NetPalette palette, Point shift)
    {
        Point P(Point p) => p + shift;
        var view = new BoardView(scene.View.Origin + shift, scene.View.Scale);
        var layout = project.Layout ?? Layout.Empty;
        page.Rect(scene.Board.Offset(shift), SheetStyle.Heavy, null, view.Length(project.Board.CornerRadius));
        foreach (var keepout in project.Board.Keepouts) Marks.Keepout(page, keepout, view);

        // bodies first as a pale fill, so pads, leads and labels stay visible through them; outlines come on top
        foreach (var part in scene.Parts) page.Poly(part.Outline.Select(P), true, null, BodyFill);
        foreach (var pad in scene.Pads)
        {
            var ink = palette.InkOf(pad.Net);
            var box = pad.Box.Offset(shift);
            if (pad.Round) page.Circle(box.Center, box.Width / 2, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
            else page.Rect(box, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
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
        foreach (var label in scene.Labels) DrawLabel(page, label, palette, shift);
    }

    private static void DrawLabel(PageBuilder page, SceneLabel label, NetPalette palette, Point shift)
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
                break;
            case LabelRole.PadId:
                Label.Draw(page, box, label.Text, SheetStyle.TextTiny, ink: SheetStyle.Mid);
                break;
            case LabelRole.NetName:
                Label.Draw(page, box, label.Text, SheetStyle.TextSmall, FontWeight.Bold, palette.InkOf(label.Text));
                break;
            case LabelRole.PartName:
                page.Text(label.Text, new Point(box.Center.X, box.Top + SheetStyle.TextNormal * 0.8), SheetStyle.TextNormal, TextAnchor.Middle, FontWeight.Bold);
                if (label.Second is { } value) page.Text(value, new Point(box.Center.X, box.Bottom - SheetStyle.TextSmall * 0.22), SheetStyle.TextSmall, TextAnchor.Middle);
                break;
        }
    }

    private static void DrawJumper(PageBuilder page, Layout layout, Jumper jumper, BoardView view, NetPalette palette)
    {
        var islands = layout.Islands().ToList();
        var from = islands.FirstOrDefault(i => i.Id == jumper.From);
        var to = islands.FirstOrDefault(i => i.Id == jumper.To);
        if (from is null || to is null) return;
        var points = new[] { from.Center }.Concat(jumper.Path).Append(to.Center).Select(view.ToPage);
        page.Poly(points, false, palette.StrokeOf(from.Net, 0.7));
    }

    /// <summary>Symbol entries the legend can hold (the five always shown and up to three marks).</summary>
    private const int SymbolEntries = 8;
    /// <summary>Most nets the legend lists one by one; beyond that it says where the net names are instead.</summary>
    private const int MaxLegendNets = 28;

    private static int LegendEntryCount(Project project) => SymbolEntries + NetsListed(new NetPalette(project));

    private static int NetsListed(NetPalette palette) => palette.Nets.Count <= MaxLegendNets ? palette.Nets.Count : 1;

    /// <summary>Every symbol the view can show, then each net with its colour, line pattern and voltage (estimates marked as such).</summary>
    private static void DrawLegend(PageBuilder page, Box area, Project project, BoardScene scene, NetPalette palette, SimulationResult? simulation)
    {
        page.Line(new Point(area.Left, area.Top), new Point(area.Right, area.Top), SheetStyle.Rule);
        page.Text("Legend", new Point(area.Left, area.Top + 4), SheetStyle.TextNormal, weight: FontWeight.Bold);
        page.Text(TextMetrics.Fit(NetVoltage.Summary(simulation), SheetStyle.TextSmall, area.Width - 20), new Point(area.Left + 18, area.Top + 4), SheetStyle.TextSmall);
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
        if (NetsListed(palette) < palette.Nets.Count)
            entries.Add((p => page.Circle(p + new Point(2.4, 0), 1.3, SheetStyle.Thin, SheetStyle.Shade), $"{palette.Nets.Count} nets: each pad shows its net name"));
        foreach (var net in NetsListed(palette) < palette.Nets.Count ? [] : palette.Nets)
        {
            var name = net;
            var facts = project.FindNet(net);
            entries.Add((p =>
            {
                page.Line(p - new Point(3.5, 0), p + new Point(1, 0), palette.StrokeOf(name, 0.5));
                page.Circle(p + new Point(2.4, 0), 1.3, Stroke.Solid(palette.InkOf(name), 0.45), palette.InkOf(name).Tint(0.82));
            }, name + VoltageText(facts, simulation)));
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

    /// <summary>The simulated voltage, or the stated one or an upper bound, each marked as what it is (<see cref="NetVoltage"/>).</summary>
    internal static string VoltageText(Net? net, SimulationResult? simulation) => NetVoltage.Short(net, simulation);
}
