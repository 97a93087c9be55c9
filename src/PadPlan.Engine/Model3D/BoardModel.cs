using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Rules.Shapes;

namespace PadPlan.Model3D;

/// <summary>The planned board as a 3D model: the board with its copper face, every pad glued on, every part body at its
/// height and turn, every lead bent from its body down to its landing, ground landings soldered to the plane, and the jumpers.</summary>
/// <remarks>Coordinates are board millimetres, z up from the plane's copper face (so the board itself lies below z = 0).
/// Heights come from <see cref="Solids"/>, the same figures the height rules judge.</remarks>
public sealed class BoardModel
{
    /// <summary>Diameter of the solder cone at a ground landing, and its height (mm): a small fillet (common practice, no source).</summary>
    public const double JointDiameter = 2.0, JointHeight = 0.6;
    /// <summary>Tinned copper jumper wire, 0.6 mm (about 22 AWG; from memory), and how high it arches over the pads.</summary>
    public const double JumperDiameter = 0.6, JumperRise = 1.0;

    private BoardModel(string name, BoardArea area, double thickness, IReadOnlyList<ModelNode> nodes)
    {
        Name = name;
        Area = area;
        Thickness = thickness;
        Nodes = nodes;
    }

    public string Name { get; }
    public BoardArea Area { get; }
    public double Thickness { get; }
    /// <summary>The board first, then pads in layout order, parts in netlist order (each with its leads and joints), then jumpers.</summary>
    public IReadOnlyList<ModelNode> Nodes { get; }

    /// <summary>Every node, depth first.</summary>
    public IEnumerable<ModelNode> All => Nodes.SelectMany(Walk);

    /// <summary>Builds the model of a placed project with a known board size.</summary>
    public static BoardModel Of(Project project)
    {
        if (project.Layout is null) throw new ArgumentException($"project {project.Name} has no layout yet; run 'padplan place' first.", nameof(project));
        if (project.Board.IsAuto) throw new ArgumentException($"the board of {project.Name} has no size yet; run 'padplan place' or give it a width and height.", nameof(project));
        var plan = ResolvedPlan.Of(project);
        var area = BoardArea.Of(project.Board);
        var nodes = new List<ModelNode> { Board(area, project.Board.Thickness) };
        nodes.AddRange(project.Layout.Pads.Select(pad => Pad(plan, pad)));
        nodes.AddRange(Solids.Of(plan).Select(Part));
        nodes.AddRange(project.Layout.Jumpers.Select(j => Jumper(plan, j)).OfType<ModelNode>());
        return new BoardModel(project.Name, area, project.Board.Thickness, nodes);
    }

    private static IEnumerable<ModelNode> Walk(ModelNode node) => new[] { node }.Concat(node.Children.SelectMany(Walk));

    private static ModelNode Board(BoardArea area, double thickness)
    {
        var b = new MeshBuilder();
        b.Prism(area.Outline(), -thickness, 0, Finish.Laminate, Finish.Plane, Finish.Laminate);
        return new ModelNode("board", ModelNodeKind.Board, b.Build(), []);
    }

    private static ModelNode Pad(ResolvedPlan plan, Pad pad)
    {
        var islands = pad.Islands();
        if (pad is not StripPad) return new ModelNode(pad.Id, ModelNodeKind.Pad, Island(islands[0], pad.StockThickness), []);
        var segments = islands.Select(i => new ModelNode(i.Id, ModelNodeKind.Island, Island(i, pad.StockThickness), []) { Item = pad.Id }).ToList();
        return new ModelNode(pad.Id, ModelNodeKind.Pad, [], segments);
    }

    private static IReadOnlyList<Mesh> Island(Island island, double thickness)
    {
        var b = new MeshBuilder();
        if (island.Shape == IslandShape.Round)
            b.Cylinder(new Point3(island.Center, 0), new Point3(island.Center, thickness), island.Width / 2, island.Width / 2, Finish.Laminate, Finish.Copper, 24);
        else
            b.Prism(CopperGeometry.Corners(island), 0, thickness, Finish.Laminate, Finish.Copper, Finish.Laminate);
        return b.Build();
    }

    private static ModelNode Part(PartSolid solid)
    {
        var b = new MeshBuilder();
        Body(b, solid);
        var leads = solid.Leads.Select(Lead).ToList();
        return new ModelNode(solid.Ref, ModelNodeKind.Part, b.Build(), leads);
    }

    private static ModelNode Lead(LeadPath path)
    {
        var b = new MeshBuilder();
        b.Wire(path.Points, path.Radius, Finish.Lead);
        var children = new List<ModelNode>();
        if (path.OnPlane)
        {
            var j = new MeshBuilder();
            var at = path.End;
            j.Cylinder(at, new Point3(at.X, at.Y, at.Z + JointHeight), JointDiameter / 2, path.Radius * 1.2, Finish.Solder, Finish.Solder, 16);
            children.Add(new ModelNode($"{path.Lead.Name} joint", ModelNodeKind.Joint, j.Build(), []) { Item = path.Lead.Ref });
        }
        return new ModelNode(path.Lead.Name, ModelNodeKind.Lead, b.Build(), children) { End = path.End, Item = path.Lead.Ref };
    }

    private static ModelNode? Jumper(ResolvedPlan plan, Jumper jumper)
    {
        var from = End(plan, jumper.From);
        var to = End(plan, jumper.To);
        if (from is null || to is null) return null;
        var level = Math.Max(from.Value.Z, to.Value.Z) + JumperRise;
        var path = new List<Point3> { from.Value, new(from.Value.Plan, level) };
        path.AddRange(jumper.Path.Select(p => new Point3(p, level)));
        path.Add(new Point3(to.Value.Plan, level));
        path.Add(to.Value);
        var b = new MeshBuilder();
        b.Wire(path, JumperDiameter / 2, Finish.Lead);
        return new ModelNode(jumper.Id, ModelNodeKind.Lead, b.Build(), []) { End = to.Value };
    }

    private static Point3? End(ResolvedPlan plan, string id)
    {
        if (plan.CopperById(id) is { } c) return new Point3(c.Island.Center, c.StockThickness);
        var pad = plan.Layout.Pads.FirstOrDefault(p => p.Id == id);
        return pad is null ? null : new Point3(pad.Islands()[0].Center, pad.StockThickness);
    }

    private static void Body(MeshBuilder b, PartSolid solid)
    {
        var f = solid.Footprint;
        var outline = solid.Part.Body;
        var box = Bounds.Of(outline);
        var (w, d) = (box.Right - box.Left, box.Bottom - box.Top);
        var centre = new Point((box.Left + box.Right) / 2, (box.Top + box.Bottom) / 2);
        var (z0, z1) = (solid.Bottom, solid.Top);
        var finish = FinishOf(f);
        switch (f.Shape)
        {
            case BodyShape.Wires:
                return;
            case BodyShape.Lying:
            {
                var r = Math.Min(Math.Min(w, d), z1 - z0) / 2;
                var zc = (z0 + z1) / 2;
                var (a, c) = w >= d
                    ? (new Point3(box.Left, centre.Y, zc), new Point3(box.Right, centre.Y, zc))
                    : (new Point3(centre.X, box.Top, zc), new Point3(centre.X, box.Bottom, zc));
                b.Cylinder(a, c, r, r, finish, finish, 20);
                return;
            }
            case BodyShape.Cylinder:
            {
                var r = Math.Min(w, d) / 2;
                b.Cylinder(new Point3(centre, z0), new Point3(centre, z1), r, r, finish, finish, 24);
                return;
            }
            case BodyShape.Disc:
            {
                var diameter = Math.Min(Math.Max(w, d), z1 - z0);
                var half = Math.Min(w, d) / 2;
                var zc = z0 + diameter / 2;
                var (a, c) = w >= d
                    ? (new Point3(centre.X, centre.Y - half, zc), new Point3(centre.X, centre.Y + half, zc))
                    : (new Point3(centre.X - half, centre.Y, zc), new Point3(centre.X + half, centre.Y, zc));
                b.Cylinder(a, c, diameter / 2, diameter / 2, finish, finish, 24);
                return;
            }
            case BodyShape.Toroid:
            {
                var outer = Math.Min(w, d) * 0.9 / 2;
                var minor = Math.Min((z1 - z0) / 2, outer / 3);
                b.Torus(new Point3(centre, z0 + minor), outer - minor, minor, finish);
                return;
            }
            case BodyShape.Trimmer:
            {
                b.Prism(outline, z0, z1, finish, finish, finish);
                var screw = Math.Min(w, d) / 4;
                b.Cylinder(new Point3(centre, z1), new Point3(centre, z1 + 0.5), screw, screw, Finish.Metal, Finish.Metal, 16, capA: false);
                return;
            }
            default:
                b.Prism(outline, z0, z1, finish, finish, finish);
                return;
        }
    }

    private static Finish FinishOf(Footprint f)
    {
        var family = f.Family.ToLowerInvariant();
        var name = f.Name.ToLowerInvariant();
        return f.Shape switch
        {
            BodyShape.Can => Finish.Metal,
            BodyShape.Toroid => Finish.Winding,
            BodyShape.Trimmer => Finish.TrimmerBody,
            BodyShape.Disc => Finish.Ceramic,
            BodyShape.Dip or BodyShape.To92 => Finish.BlackPlastic,
            BodyShape.Lying when family.Contains("resistor") => Finish.ResistorBody,
            BodyShape.Lying when family.Contains("choke") => Finish.Winding,
            BodyShape.Cylinder when name.Contains("led") || family.Contains("led") => Finish.LedEpoxy,
            BodyShape.Cylinder when family.Contains("choke") => Finish.Winding,
            BodyShape.Cylinder => Finish.CanSleeve,
            BodyShape.Box when family.Contains("capacitor") => Finish.FilmBox,
            _ => Finish.BlackPlastic,
        };
    }
}
