using System.Globalization;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The view to build from, enlarged to fill the page for small boards: pads tinted by net, parts with reference and
/// value, each lead drawn from the body to where it lands, net names at the pads, ground landings, and a legend.
/// </summary>
internal static class AssemblySheet
{
    /// <summary>Enlargements offered, so the printed scale is a round figure.</summary>
    private static readonly double[] Scales = [0.25, 0.4, 0.5, 0.6, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8];
    private const double LegendRow = 4.2;
    private const double LegendColumn = 46;
    private const double Room = 8;

    public static SheetDraft Build(Project project, SheetOptions options)
    {
        var palette = new NetPalette(project);
        var (width, height) = (project.Board.Width!.Value, project.Board.Height!.Value);
        var best = new[] { false, true }
            .Select(landscape => Fit(new PageFrame(options.Paper, landscape), palette, width, height, options.MaxAssemblyScale))
            .OrderByDescending(f => f.Scale).ThenBy(f => f.Frame.Landscape != width > height).First();
        var (frame, area, scale, legend) = best;
        var origin = new Point(area.Left + (area.Width - width * scale) / 2, area.Top + (area.Height - height * scale) / 2);
        var view = new BoardView(origin, scale);
        var page = new PageBuilder();
        DrawBoard(page, project, view, palette);
        DrawLegend(page, legend, project, palette);
        var caption = $"Assembly view, scale {ScaleText(scale)} (not for measuring)";
        return new SheetDraft(SheetKind.Assembly, frame, caption, page.Shapes(), view);
    }

    private static (PageFrame Frame, Box Area, double Scale, Box Legend) Fit(PageFrame frame, NetPalette palette, double width, double height, double maxScale)
    {
        var body = frame.Body;
        var entries = palette.Nets.Count + 3;
        var columns = Math.Max(1, (int)Math.Floor(body.Width / LegendColumn));
        var legendHeight = 6 + Math.Ceiling(entries / (double)columns) * LegendRow;
        var legend = body with { Top = body.Bottom - legendHeight };
        var area = new Box(body.Left + Room, body.Top + Room, body.Right - Room, legend.Top - Room);
        var fit = Math.Min(area.Width / width, area.Height / height);
        var scale = Scales.LastOrDefault(s => s <= fit + 1e-9 && s <= maxScale + 1e-9);
        if (scale == 0) scale = Math.Min(fit, maxScale);
        return (frame, area, scale, legend);
    }

    internal static string ScaleText(double scale) => scale >= 1
        ? string.Create(CultureInfo.InvariantCulture, $"{scale:0.##} : 1")
        : string.Create(CultureInfo.InvariantCulture, $"1 : {1 / scale:0.##}");

    private static void DrawBoard(PageBuilder page, Project project, BoardView view, NetPalette palette)
    {
        var layout = project.Layout ?? Layout.Empty;
        var boardBox = view.ToPage(new Box(0, 0, project.Board.Width!.Value, project.Board.Height!.Value));
        page.Rect(boardBox, SheetStyle.Heavy, null, view.Length(project.Board.CornerRadius));
        foreach (var keepout in project.Board.Keepouts) Marks.Keepout(page, keepout, view);

        var placer = new LabelPlacer(boardBox.Inflate(-0.4));
        foreach (var keepout in project.Board.Keepouts) placer.Block(view.ToPage(Marks.BoundsOf(keepout)));
        foreach (var island in layout.Islands())
        {
            var box = view.ToPage(TemplateSheet.IslandBox(island));
            var ink = palette.InkOf(island.Net);
            if (island.Shape == IslandShape.Round) page.Circle(box.Center, box.Width / 2, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
            else page.Rect(box, Stroke.Solid(ink, 0.45), ink.Tint(0.82));
            placer.Block(box.Inflate(0.3));
        }
        foreach (var jumper in layout.Jumpers) DrawJumper(page, layout, jumper, view, palette);

        var parts = TemplateSheet.PlacedParts(project).ToList();
        foreach (var (part, footprint, placement) in parts)
            foreach (var landing in placement.Leads)
            {
                var lead = footprint.LeadForPin(landing.Pin, part.Variant);
                var net = part.NetOf(landing.Pin);
                var to = view.ToPage(landing.At);
                if (lead is not null)
                    page.Line(view.ToPage(placement.ToBoard(lead.Exit)), to, palette.StrokeOf(landing.OnPlane ? null : net, 0.5));
                if (landing.OnPlane) continue;
                page.Circle(to, 0.55, null, palette.InkOf(net));
            }
        foreach (var (_, footprint, placement) in parts)
        {
            var body = Marks.BodyOf(footprint, placement).Select(view.ToPage).ToList();
            page.Poly(body, true, SheetStyle.Normal, Ink.White);
            placer.Block(Marks.BoundsOf(body));
        }
        foreach (var landing in layout.Placements.SelectMany(p => p.Leads).Where(l => l.OnPlane))
        {
            var at = view.ToPage(landing.At);
            Marks.Ground(page, at, 2.0, SheetStyle.Thin, Ink.White);
            placer.Block(Box.Around(at, 2.4, 2.4));
        }

        LabelPads(page, layout, view, palette, placer);
        LabelParts(page, parts, view, placer);
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

    /// <summary>Pad id inside the pad where it fits; the net name beside it, in the net's colour.</summary>
    private static void LabelPads(PageBuilder page, Layout layout, BoardView view, NetPalette palette, LabelPlacer placer)
    {
        foreach (var island in layout.Islands())
        {
            var box = view.ToPage(TemplateSheet.IslandBox(island));
            var idSize = SheetStyle.TextTiny;
            // in the upper part of the pad, clear of the lead landings, which mostly sit at its centre
            if (TextMetrics.Width(island.Id, idSize) < box.Width * 0.7 && idSize * 3.2 < box.Height)
                page.Text(island.Id, new Point(box.Center.X, box.Top + idSize * (island.Shape == IslandShape.Round ? 1.6 : 1.2)), idSize, TextAnchor.Middle, ink: SheetStyle.Mid);
            if (island.Net is null) continue;
            var (w, h) = Label.Size(island.Net, SheetStyle.TextSmall, FontWeight.Bold);
            var chosen = placer.Place(LabelPlacer.Around(box, w, h, 0.4));
            Label.Draw(page, chosen, island.Net, SheetStyle.TextSmall, FontWeight.Bold, palette.InkOf(island.Net));
        }
    }

    /// <summary>Reference (bold) over value, inside the body when it fits, else beside it.</summary>
    private static void LabelParts(PageBuilder page, IReadOnlyList<(Part Part, Footprint Footprint, Placement Placement)> parts, BoardView view, LabelPlacer placer)
    {
        foreach (var (part, footprint, placement) in parts)
        {
            var body = Marks.BoundsOf(Marks.BodyOf(footprint, placement).Select(view.ToPage));
            var value = TextMetrics.Fit(part.Value, SheetStyle.TextSmall, 40);
            var w = Math.Max(TextMetrics.Width(part.Ref, SheetStyle.TextNormal, FontWeight.Bold), TextMetrics.Width(value, SheetStyle.TextSmall)) + 0.4;
            var h = SheetStyle.TextNormal + (value.Length > 0 ? SheetStyle.TextSmall * 1.15 : 0);
            var inside = Box.Around(body.Center, w, h);
            var box = body.Contains(inside) ? inside : placer.Place(LabelPlacer.Around(body, w, h, 0.6));
            if (body.Contains(inside)) placer.Block(inside);
            page.Text(part.Ref, new Point(box.Center.X, box.Top + SheetStyle.TextNormal * 0.8), SheetStyle.TextNormal, TextAnchor.Middle, FontWeight.Bold);
            if (value.Length > 0) page.Text(value, new Point(box.Center.X, box.Bottom - SheetStyle.TextSmall * 0.22), SheetStyle.TextSmall, TextAnchor.Middle);
        }
    }

    private static void DrawLegend(PageBuilder page, Box area, Project project, NetPalette palette)
    {
        page.Line(new Point(area.Left, area.Top), new Point(area.Right, area.Top), SheetStyle.Rule);
        page.Text("Legend", new Point(area.Left, area.Top + 4), SheetStyle.TextNormal, weight: FontWeight.Bold);
        var columns = Math.Max(1, (int)Math.Floor(area.Width / LegendColumn));
        var entries = new List<(Action<Point> Symbol, string Text)>
        {
            (p => { page.Rect(Box.Around(p, 7, 3), SheetStyle.Normal, Ink.White); }, "Part body"),
            (p => Marks.Ground(page, p, 2.0, SheetStyle.Thin, Ink.White), "Lead to the ground plane"),
            (p => page.Line(p - new Point(3.5, 0), p + new Point(3.5, 0), Stroke.Solid(Ink.Black, 0.5)), "Ground lead"),
        };
        foreach (var net in palette.Nets)
        {
            var name = net;
            var facts = project.FindNet(net);
            var volts = facts?.Voltage is { } v ? string.Create(CultureInfo.InvariantCulture, $" ({v:0.#} V)") : "";
            entries.Add((p =>
            {
                page.Line(p - new Point(3.5, 0), p + new Point(1, 0), palette.StrokeOf(name, 0.5));
                page.Circle(p + new Point(2.4, 0), 1.3, Stroke.Solid(palette.InkOf(name), 0.45), palette.InkOf(name).Tint(0.82));
            }, name + volts));
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
}
