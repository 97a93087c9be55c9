using PadPlan.Model;
using PadPlan.Model3D;
using PadPlan.Output.Drawing;
using PadPlan.Rules.Shapes;

namespace PadPlan.Output.Sheets;

/// <summary>The 3D model of the board drawn as an isometric picture for the report pages: filled triangles, flat-shaded,
/// painted back to front (the painter's order); the board itself first, since everything else stands on it.</summary>
internal static class ModelPicture
{
    /// <summary>Tallest the picture may be on the page (mm).</summary>
    public const double MaxHeight = 110;

    // Seen from the board's front-left corner (the builder's side, y large, x small), 35.26 degrees above the board: the isometric view.
    private static readonly Point3 Right = Unit(new Point3(1, 1, 0));
    private static readonly Point3 Up = Unit(new Point3(1, -1, 2));
    private static readonly Point3 Away = Unit(new Point3(1, -1, -1));
    private static readonly Point3 Light = Unit(new Point3(-0.4, 0.6, 1));

    public static void Draw(ReportFlow flow, Project project)
    {
        if (project.Layout is null || project.Board.IsAuto) return;
        var model = BoardModel.Of(project);
        var faces = Faces(model).ToList();
        if (faces.Count == 0) return;
        double minU = faces.Min(f => f.Corners.Min(c => c.X)), maxU = faces.Max(f => f.Corners.Max(c => c.X));
        double minV = faces.Min(f => f.Corners.Min(c => c.Y)), maxV = faces.Max(f => f.Corners.Max(c => c.Y));
        var scale = Math.Min(flow.Body.Width / (maxU - minU), MaxHeight / (maxV - minV));
        var height = (maxV - minV) * scale;
        // The heading and its note stay on the page with the picture (about 16 mm for the two).
        if (!flow.Fits(height + 4 + 16)) flow.NewPage();
        flow.Heading("The finished board", SheetStyle.TextHeading);
        flow.Paragraph("An isometric view of the 3D model (padplan export --model), seen from the front-left corner: part bodies at their footprint heights, leads bent down to their landings. Not to scale with the template.", SheetStyle.TextSmall);
        var top = flow.Take(height + 4);
        var left = flow.Body.Left + (flow.Body.Width - (maxU - minU) * scale) / 2;
        var page = flow.Page;
        foreach (var face in faces)
        {
            var corners = face.Corners.Select(c => new Point(left + (c.X - minU) * scale, top + (c.Y - minV) * scale)).ToList();
            page.Poly(corners, true, Stroke.Solid(face.Ink, 0.08), face.Ink);
        }
        flow.Space(2);
    }

    private sealed record Face(IReadOnlyList<Point> Corners, double Depth, Ink Ink);

    // Every triangle that faces the viewer, projected (u right, v down the page, in model mm), board first, then back to front.
    private static IEnumerable<Face> Faces(BoardModel model)
    {
        var board = new List<Face>();
        var rest = new List<Face>();
        foreach (var node in model.All)
            foreach (var mesh in node.Meshes)
                for (var t = 0; t < mesh.Indices.Count; t += 3)
                {
                    var (a, b, c) = (mesh.Positions[mesh.Indices[t]], mesh.Positions[mesh.Indices[t + 1]], mesh.Positions[mesh.Indices[t + 2]]);
                    var n = Unit(Add(Add(mesh.Normals[mesh.Indices[t]], mesh.Normals[mesh.Indices[t + 1]]), mesh.Normals[mesh.Indices[t + 2]]));
                    if (Dot(n, Away) >= 0) continue;
                    var corners = new[] { Project(a), Project(b), Project(c) };
                    var area = Math.Abs((corners[1].X - corners[0].X) * (corners[2].Y - corners[0].Y) - (corners[2].X - corners[0].X) * (corners[1].Y - corners[0].Y)) / 2;
                    if (area < 1e-6) continue;
                    var depth = (Dot(a, Away) + Dot(b, Away) + Dot(c, Away)) / 3;
                    (node.Kind == ModelNodeKind.Board ? board : rest).Add(new Face(corners, depth, Shade(mesh.Finish, n)));
                }
        return board.Concat(rest.OrderByDescending(f => f.Depth));
    }

    private static Point Project(Point3 p) => new(Dot(p, Right), -Dot(p, Up));

    private static Ink Shade(Finish finish, Point3 normal)
    {
        var (r, g, b) = Finishes.Colour(finish);
        var light = 0.45 + 0.55 * Math.Max(0, Dot(normal, Light));
        // The finishes are linear colours (as glTF has them); the page wants sRGB (IEC 61966-2-1, approximated by a 1/2.2 power).
        static byte Channel(double linear, double light) => (byte)Math.Round(255 * Math.Pow(Math.Clamp(linear * light, 0, 1), 1 / 2.2));
        return new Ink(Channel(r, light), Channel(g, light), Channel(b, light));
    }

    private static Point3 Add(Point3 a, Point3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);
    private static double Dot(Point3 a, Point3 b) => a.X * b.X + a.Y * b.Y + a.Z * b.Z;
    private static Point3 Unit(Point3 a)
    {
        var len = Math.Sqrt(Dot(a, a));
        return new Point3(a.X / len, a.Y / len, a.Z / len);
    }
}
