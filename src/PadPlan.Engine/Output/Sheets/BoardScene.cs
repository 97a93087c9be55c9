using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>A pad or strip segment as the assembly view shows it (page mm).</summary>
public sealed record ScenePad(string Id, string? Net, Box Box, bool Round)
{
    public Zone Zone => Round ? new DiscZone(Box.Center, Box.Width / 2) : new BoxZone(Box);
}

/// <summary>A placed part's body outline (page mm).</summary>
public sealed record ScenePart(string Ref, string Value, ValueList<Point> Outline)
{
    public PolygonZone Zone { get; } = new(Outline);
}

/// <summary>One lead from where it leaves the body to where it lands: on a pad (Pad = its id) or on the plane (Pad null).</summary>
public sealed record SceneLead(string Ref, string Pin, string? Net, Point Exit, Point Landing, string? Pad)
{
    public bool OnPlane => Pad is null;
    public string Name => $"{Ref}.{Pin}";
}

/// <summary>A polarity or orientation mark drawn on a part (band, notch, dot, winding start) as a filled or outlined polygon, page mm.</summary>
public sealed record SceneMark(string Ref, string Lead, MarkKind Kind, ValueList<Point> Shape, bool Filled)
{
    public Box Bounds => new(Shape.Min(p => p.X), Shape.Min(p => p.Y), Shape.Max(p => p.X), Shape.Max(p => p.Y));
}

/// <summary>What a label says about its object.</summary>
public enum LabelRole
{
    PadId,
    NetName,
    PartName,
    /// <summary>A number in place of a reference that found no room; the parts table beside the view says which part it is.</summary>
    PartKey,
    PinName,
}

/// <summary>A placed label: one or two lines of text in a box, what it belongs to, and its leader line if it has one.</summary>
public sealed record SceneLabel(LabelRole Role, LabelTarget Target, string TargetId, string Text, string? Second, Box Box, Point? LeaderFrom = null, Point? LeaderTo = null, bool Clear = true)
{
    public bool HasLeader => LeaderFrom is not null;
}

/// <summary>
/// The board as the assembly view draws it, in page millimetres, with every label already placed: pads, part outlines,
/// leads with their landing dots and plane symbols, polarity marks, and labels. Pure geometry, separate from the page
/// layout, so the tests (and any other front end) can check what is drawn without reading pixels.
/// </summary>
public sealed record BoardScene(
    BoardView View,
    Box Board,
    ValueList<ScenePad> Pads,
    ValueList<ScenePart> Parts,
    ValueList<SceneLead> Leads,
    ValueList<SceneMark> Marks,
    ValueList<SceneLabel> Labels,
    int Unresolved)
{
    /// <summary>Landing dot radius and plane-symbol size (page mm).</summary>
    public const double DotRadius = 0.55;
    public const double PlaneSymbol = 2.0;

    public Zone DotOf(SceneLead lead) => new DiscZone(lead.Landing, DotRadius);
    public Zone PlaneSymbolOf(SceneLead lead) => new BoxZone(Box.Around(lead.Landing, PlaneSymbol, PlaneSymbol));

    /// <summary>Builds the scene for a placed project at a view (origin and scale); `room` is how far labels may stray outside the board outline.</summary>
    public static BoardScene Build(Project project, BoardView view, double room)
    {
        var layout = project.Layout ?? Layout.Empty;
        var board = view.ToPage(new Box(0, 0, project.Board.Width!.Value, project.Board.Height!.Value));
        var pads = layout.Islands()
            .Select(i => new ScenePad(i.Id, i.Net, view.ToPage(TemplateSheet.IslandBox(i)), i.Shape == IslandShape.Round))
            .ToValueList();
        var parts = new List<ScenePart>();
        var leads = new List<SceneLead>();
        var marks = new List<SceneMark>();
        var pinLabels = new List<(SceneLead Lead, string Text, Box Body)>();
        foreach (var (part, footprint, placement) in TemplateSheet.PlacedParts(project))
        {
            var outline = footprint.Body.Select(p => view.ToPage(placement.ToBoard(p))).ToValueList();
            parts.Add(new ScenePart(part.Ref, part.Value, outline));
            var pins = footprint.PinNames(part.Variant);
            var bodyBox = PadPlan.Output.Sheets.Marks.BoundsOf(outline);
            for (var i = 0; i < footprint.Leads.Count; i++)
            {
                var landing = placement.Leads.FirstOrDefault(l => string.Equals(l.Pin, pins[i], StringComparison.OrdinalIgnoreCase));
                if (landing is null) continue;
                var lead = new SceneLead(part.Ref, pins[i], part.NetOf(pins[i]), view.ToPage(placement.ToBoard(footprint.Leads[i].Exit)), view.ToPage(landing.At), landing.Pad);
                leads.Add(lead);
                if (PinMarks.NamesShown(footprint, pins)) pinLabels.Add((lead, PinMarks.Display(pins[i]), bodyBox));
            }
            marks.AddRange(PinMarks.Shapes(part, footprint, placement, view));
        }
        var labels = PlaceLabels(project, view, board.Inflate(room), pads, parts, leads, marks, pinLabels, out var unresolved);
        return new BoardScene(view, board, pads, parts.ToValueList(), leads.ToValueList(), marks.ToValueList(), labels.ToValueList(), unresolved);
    }

    private static List<SceneLabel> PlaceLabels(Project project, BoardView view, Box bounds, IReadOnlyList<ScenePad> pads, IReadOnlyList<ScenePart> parts,
        IReadOnlyList<SceneLead> leads, IReadOnlyList<SceneMark> marks, IReadOnlyList<(SceneLead Lead, string Text, Box Body)> pinLabels, out int unresolved)
    {
        var placer = new LabelPlacer(bounds);
        foreach (var keepout in project.Board.Keepouts) placer.Obstacle(new BoxZone(view.ToPage(Sheets.Marks.BoundsOf(keepout))), hard: false);
        foreach (var pad in pads)
        {
            placer.Obstacle(pad.Zone, pad.Id, stopsLeaders: true);
            placer.Target(LabelTarget.Pad, pad.Id, pad.Zone);
        }
        foreach (var part in parts)
        {
            placer.Obstacle(part.Zone, part.Ref);
            placer.Target(LabelTarget.Part, part.Ref, part.Zone);
        }
        foreach (var lead in leads)
        {
            placer.Obstacle(new LineZone(lead.Exit, lead.Landing, 0.5), lead.Ref, hard: false);
            placer.Obstacle(lead.OnPlane ? new BoxZone(Box.Around(lead.Landing, PlaneSymbol, PlaneSymbol)) : new DiscZone(lead.Landing, DotRadius), stopsLeaders: true);
            placer.Target(LabelTarget.Lead, lead.Name, new DiscZone(lead.Exit, 0.01));
        }
        foreach (var mark in marks) placer.Obstacle(new BoxZone(mark.Bounds));

        var labels = new List<SceneLabel>();
        // pin names first: they must sit right at their lead, and everything else can move further
        foreach (var (lead, text, body) in pinLabels)
        {
            var (w, h) = Label.Size(text, PinSize, FontWeight.Bold);
            var exit = new DiscZone(lead.Exit, 0.01);
            // first choice: just inside the body edge nearest the lead; then on the lead's exit; then the rings round it
            var inset = body.Inflate(-0.2) is var b && b.Width > w && b.Height > h ? new Box(b.Left + w / 2, b.Top + h / 2, b.Right - w / 2, b.Bottom - h / 2) : body;
            IReadOnlyList<Box> preferred = [Box.Around(inset.Nearest(lead.Exit), w, h), Box.Around(lead.Exit, w, h)];
            var placed = placer.Place(new LabelPlacer.Request(lead.Ref, LabelTarget.Lead, lead.Name, exit, w, h, preferred, LeaderFrom: LabelPlacer.FirstLeaderRing + 2, AlsoOwns: lead.Pad is null ? null : [lead.Pad], LeaderMayCross: true));
            labels.Add(new SceneLabel(LabelRole.PinName, LabelTarget.Lead, lead.Name, text, null, placed.Box, placed.LeaderFrom, placed.LeaderTo, placed.Resolved));
        }
        // each part's reference: inside its body, else beside it or on a leader, else a key number in the same places
        var key = 0;
        foreach (var part in parts.OrderBy(p => p.Ref, NaturalOrder.Comparer))
        {
            var placed = PlaceName(placer, part, part.Ref, RefSize) ?? PlaceName(placer, part, part.Ref, MinRefSize);
            var role = LabelRole.PartName;
            var text = part.Ref;
            if (placed is null)
            {
                text = KeyPrefix + (++key).ToString(System.Globalization.CultureInfo.InvariantCulture);
                role = LabelRole.PartKey;
                placed = PlaceName(placer, part, text, KeySize) ?? placer.Place(NameRequest(part, text, KeySize) with { LeaderMayCross = true });
            }
            labels.Add(new SceneLabel(role, LabelTarget.Part, part.Ref, text, null, placed.Box, placed.LeaderFrom, placed.LeaderTo, placed.Resolved));
        }
        // pad ids and net names where there is room: the template carries every pad id, the legend and the leads table every net
        foreach (var pad in pads)
        {
            var (w, h) = Label.Size(pad.Id, SheetStyle.TextTiny);
            IReadOnlyList<Box> inside = [.. new[] { -0.28, 0.28, 0 }.Select(f => Box.Around(pad.Box.Center + new Point(0, f * pad.Box.Height), w, h)).Where(b => InsidePad(pad, b))];
            if (placer.TryPlace(new LabelPlacer.Request(pad.Id, LabelTarget.Pad, pad.Id, pad.Zone, w, h, inside)) is { } placed)
                labels.Add(new SceneLabel(LabelRole.PadId, LabelTarget.Pad, pad.Id, pad.Id, null, placed.Box, placed.LeaderFrom, placed.LeaderTo));
        }
        foreach (var pad in pads.Where(p => p.Net is not null))
        {
            var (w, h) = Label.Size(pad.Net!, SheetStyle.TextSmall, FontWeight.Bold);
            if (placer.TryPlace(new LabelPlacer.Request(pad.Id, LabelTarget.Pad, pad.Id, pad.Zone, w, h, LeaderFrom: LabelPlacer.FirstLeaderRing + 1)) is { } placed)
                labels.Add(new SceneLabel(LabelRole.NetName, LabelTarget.Pad, pad.Id, pad.Net!, null, placed.Box, placed.LeaderFrom, placed.LeaderTo));
        }
        unresolved = placer.Unresolved;
        return labels;
    }

    /// <summary>Em size of a reference on the view, and the least it shrinks to before a key number takes its place (2 mm on paper, the issue's floor for readable labels).</summary>
    public const double RefSize = SheetStyle.TextNormal;
    public const double MinRefSize = 2.0;
    /// <summary>Em size of a key number: as small as a pin name, since it is one or two digits.</summary>
    public const double KeySize = PinSize;
    /// <summary>Key numbers read "#3", so that they are not taken for pin numbers.</summary>
    public const string KeyPrefix = "#";

    private static LabelPlacer.Request NameRequest(ScenePart part, string text, double size)
    {
        var (w, h) = Label.Size(text, size, FontWeight.Bold);
        // inside the body: the middle first, then slid towards each end and side, clear of pads the body stands over
        var room = part.Zone.Bounds.Inflate(-0.15);
        var (dx, dy) = (Math.Max(0, (room.Width - w) / 2), Math.Max(0, (room.Height - h) / 2));
        var inside = new[] { (0.0, 0.0), (-dx, 0.0), (dx, 0.0), (0.0, -dy), (0.0, dy), (-dx, -dy), (dx, -dy), (-dx, dy), (dx, dy) }
            .Select(o => Box.Around(room.Center + new Point(o.Item1, o.Item2), w, h))
            .Where(b => room.Contains(b) && Geometry2D.Corners(b).All(c => Geometry2D.Inside(c, part.Outline) || part.Zone.DistanceTo(Box.Around(c, 0, 0)) < 1e-6))
            .Distinct().ToList();
        return new LabelPlacer.Request(part.Ref, LabelTarget.Part, part.Ref, part.Zone, w, h, inside);
    }

    private static LabelPlacer.Placed? PlaceName(LabelPlacer placer, ScenePart part, string text, double size) => placer.TryPlace(NameRequest(part, text, size));

    /// <summary>Em size of pin names on the view (page mm).</summary>
    public const double PinSize = 1.8;

    private static bool InsidePad(ScenePad pad, Box box) => pad.Round
        ? Geometry2D.Corners(box).All(c => c.DistanceTo(pad.Box.Center) <= pad.Box.Width / 2 - 0.1)
        : pad.Box.Inflate(-0.1).Contains(box);
}
