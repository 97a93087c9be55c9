using System.Diagnostics;
using PadPlan.Editor.Edits;
using PadPlan.Model;
using PadPlan.Output.Geometry;
using PadPlan.Output.Sheets;
using PadPlan.Rules;

namespace PadPlan.Editor.View;

/// <summary>Builds the page's view of a plan: runs the real checker (the same call as `padplan check`) and the geometry export the sheets share.</summary>
public static class PlanViews
{
    public static PlanView Build(Project project)
    {
        var clock = Stopwatch.StartNew();
        var report = Checker.Check(project);
        var ms = clock.Elapsed.TotalMilliseconds;
        var layout = project.Layout;
        var drawable = layout is not null && !project.Board.IsAuto;
        return new PlanView
        {
            Project = project.Name,
            Geometry = drawable ? GeometryExport.Build(project) : null,
            Pads = (layout?.Pads ?? ValueList<Pad>.Empty).Select(Anchor).ToList(),
            HeldParts = project.Parts.Where(p => p.Locked).Select(p => p.Ref).ToList(),
            NetNames = project.Nets.Select(n => n.Name).ToList(),
            Punches = project.Toolkit.PunchDiameters.ToList(),
            Findings = report.Findings.Select(f => new FindingView
            {
                Rule = f.RuleId,
                Severity = f.Severity.ToString().ToLowerInvariant(),
                Message = f.Message,
                Hint = f.Hint,
                At = f.Location is { } at ? [at.X, at.Y] : null,
                Items = [.. f.Items],
            }).ToList(),
            Open = layout is null ? [] : OpenThreads(project, layout, report),
            Marks = layout is null ? [] : MarksOf(project, layout),
            NamedPins = project.Parts.Where(p => PinMarks.NamesShown(project.FootprintOf(p), project.FootprintOf(p).PinNames(p.Variant))).Select(p => p.Ref).ToList(),
            Errors = report.Errors,
            Warnings = report.Warnings,
            CheckMilliseconds = Math.Round(ms, 1),
        };
    }

    // The same marks the assembly view prints (Output/Sheets/PinMarks), at board scale.
    private static List<MarkView> MarksOf(Project project, Layout layout)
    {
        var board = new BoardView(Point.Origin, 1);
        return layout.Placements.Where(p => project.FindPart(p.Ref) is not null)
            .SelectMany(p => PinMarks.Shapes(project.FindPart(p.Ref)!, project.FootprintOf(project.FindPart(p.Ref)!), p, board))
            .Select(m => new MarkView
            {
                Ref = m.Ref, Lead = m.Lead, Kind = m.Kind.ToString().ToLowerInvariant(), Filled = m.Filled,
                Points = m.Shape.Select(q => new[] { Math.Round(q.X, 3), Math.Round(q.Y, 3) }).ToList(),
            }).ToList();
    }

    private static PadAnchor Anchor(Pad pad) => new()
    {
        Id = pad.Id,
        Kind = pad switch { RoundPad => "round", RectPad => "rect", _ => "strip" },
        X = pad switch { RoundPad r => r.Center.X, RectPad r => r.Center.X, StripPad s => s.Start.X, _ => 0 },
        Y = pad switch { RoundPad r => r.Center.Y, RectPad r => r.Center.Y, StripPad s => s.Start.Y, _ => 0 },
        Held = pad.Locked,
        Islands = pad.Islands().Select(i => i.Id).ToList(),
    };

    // Drawing help only: the check has already said which net is open and which leads it names; this draws the shortest
    // lines that would join the pieces those leads land in (pieces by island, joined by jumpers).
    private static List<OpenThread> OpenThreads(Project project, Layout layout, CheckReport report)
    {
        var threads = new List<OpenThread>();
        var landings = layout.Placements.SelectMany(p => p.Leads.Select(l => (Name: $"{p.Ref}.{l.Pin}", l.At))).ToDictionary(x => x.Name, x => x.At, StringComparer.Ordinal);
        foreach (var finding in report.Findings.Where(f => f.RuleId == RuleIds.Open && f.Items.Count > 0))
        {
            var net = finding.Items[0];
            var points = finding.Items.Skip(1).Where(landings.ContainsKey).Select(n => landings[n]).ToList();
            var pieces = Pieces(layout, points);
            threads.AddRange(Join(pieces).Select(pair => new OpenThread { Net = net, From = [pair.A.X, pair.A.Y], To = [pair.B.X, pair.B.Y] }));
        }
        return threads;
    }

    private static List<List<Point>> Pieces(Layout layout, List<Point> points)
    {
        var key = new Dictionary<string, string>(StringComparer.Ordinal);
        string Root(string id) => key.TryGetValue(id, out var up) && up != id ? key[id] = Root(up) : id;
        foreach (var j in layout.Jumpers) key[Root(j.From)] = Root(j.To);
        return points.Select((p, i) => (p, Piece: EditApplier.IslandAt(layout, p) is { } island ? Root(island) : $"plane {i}"))
            .GroupBy(x => x.Piece, StringComparer.Ordinal)
            .Select(g => g.Select(x => x.p).ToList())
            .ToList();
    }

    // Grows one tree from the first piece, always adding the nearest piece not yet joined.
    private static IEnumerable<(Point A, Point B)> Join(List<List<Point>> pieces)
    {
        if (pieces.Count < 2) yield break;
        var joined = new List<Point>(pieces[0]);
        var rest = pieces.Skip(1).ToList();
        while (rest.Count > 0)
        {
            var best = rest.SelectMany(piece => piece.SelectMany(b => joined.Select(a => (Piece: piece, A: a, B: b))))
                .MinBy(x => x.A.DistanceTo(x.B));
            yield return (best.A, best.B);
            joined.AddRange(best.Piece);
            rest.Remove(best.Piece);
        }
    }
}
