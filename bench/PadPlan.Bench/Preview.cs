using PadPlan.Model;
using PadPlan.ProjectFiles;
using SkiaSharp;

namespace PadPlan.Bench;

/// <summary>A rough PNG of a placed project for eyeballing the placer's work (`--preview PROJECT OUT.png`); the real sheets are another command's job.</summary>
internal static class Preview
{
    private const float Scale = 12; // pixels per mm

    public static void Write(string projectPath, string pngPath)
    {
        var project = ProjectFile.Read(projectPath);
        var layout = project.Layout ?? throw new InvalidOperationException("the project has no layout");
        var (w, h) = ((float)project.Board.Width!.Value, (float)project.Board.Height!.Value);
        using var surface = SKSurface.Create(new SKImageInfo((int)(w * Scale), (int)(h * Scale)));
        var c = surface.Canvas;
        c.Clear(new SKColor(205, 140, 80));
        c.Scale(Scale);
        using var pad = new SKPaint { Color = new SKColor(235, 190, 120), IsAntialias = true };
        using var edge = new SKPaint { Color = SKColors.SaddleBrown, Style = SKPaintStyle.Stroke, StrokeWidth = 0.1f, IsAntialias = true };
        using var body = new SKPaint { Color = new SKColor(40, 60, 140, 150), IsAntialias = true };
        using var lead = new SKPaint { Color = SKColors.Silver, Style = SKPaintStyle.Stroke, StrokeWidth = 0.5f, IsAntialias = true };
        using var ground = new SKPaint { Color = SKColors.Black, IsAntialias = true };
        using var jumper = new SKPaint { Color = SKColors.Red, Style = SKPaintStyle.Stroke, StrokeWidth = 0.4f, IsAntialias = true };
        var m = (float)project.Board.Margin;
        c.DrawRect(m, m, w - 2 * m, h - 2 * m, edge);
        foreach (var island in layout.Islands())
        {
            if (island.Shape == IslandShape.Round) { c.DrawCircle((float)island.Center.X, (float)island.Center.Y, (float)island.Width / 2, pad); c.DrawCircle((float)island.Center.X, (float)island.Center.Y, (float)island.Width / 2, edge); }
            else { c.DrawRect((float)island.Left, (float)island.Top, (float)island.Width, (float)island.Height, pad); c.DrawRect((float)island.Left, (float)island.Top, (float)island.Width, (float)island.Height, edge); }
        }
        foreach (var placement in layout.Placements)
        {
            var part = project.FindPart(placement.Ref)!;
            var fp = project.FootprintOf(part);
            var pts = fp.Body.Select(placement.ToBoard).ToList();
            using var path = SKPath.ParseSvgPathData("M" + string.Join(" L", pts.Select(p => FormattableString.Invariant($"{p.X} {p.Y}"))) + " Z");
            c.DrawPath(path, body);
            foreach (var landing in placement.Leads)
            {
                var exit = placement.ToBoard(fp.LeadForPin(landing.Pin, part.Variant)!.Exit);
                c.DrawLine((float)exit.X, (float)exit.Y, (float)landing.At.X, (float)landing.At.Y, lead);
                c.DrawCircle((float)landing.At.X, (float)landing.At.Y, landing.Pad is null ? 0.45f : 0.3f, landing.Pad is null ? ground : lead);
            }
        }
        var islands = layout.Islands().ToDictionary(i => i.Id);
        foreach (var j in layout.Jumpers)
            c.DrawLine((float)islands[j.From].Center.X, (float)islands[j.From].Center.Y, (float)islands[j.To].Center.X, (float)islands[j.To].Center.Y, jumper);
        using var image = surface.Snapshot();
        using var data = image.Encode(SKEncodedImageFormat.Png, 90);
        File.WriteAllBytes(pngPath, data.ToArray());
    }
}
