using PadPlan.Model.Standards;
using System.Text;
using System.Text.Json;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Rules.Physics;
using PadPlan.Rules.Shapes;

namespace PadPlan.Output.Geometry;

/// <summary>The resolved geometry of a plan as JSON (format "padplan-geometry/1"), so other scripts and tools can check or reuse it.</summary>
public static class GeometryExport
{
    public const string FormatTag = "padplan-geometry/1";

    /// <summary>The first bytes of a file are a geometry export of PadPlan's (any version of the format).</summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) => head.IndexOf("\"format\": \"padplan-geometry/"u8) >= 0;

    /// <summary>Builds the document; the project must have a layout and a board of known size.</summary>
    public static GeometryDocument Build(Project project)
    {
        if (project.Layout is null) throw new ArgumentException($"project {project.Name} has no layout yet; run 'padplan place' first.", nameof(project));
        if (project.Board.IsAuto) throw new ArgumentException($"the board of {project.Name} has no size yet; run 'padplan place' or give it a width and height.", nameof(project));
        var plan = ResolvedPlan.Of(project);
        var area = BoardArea.Of(project.Board);
        return new GeometryDocument
        {
            Project = project.Name,
            Board = new BoardGeometry
            {
                Width = R(area.Width),
                Height = R(area.Height),
                CornerRadius = R(area.CornerRadius),
                Outline = area.Outline().Select(Xy).ToList(),
                Margin = R(area.Margin),
                Thickness = R(project.Board.Thickness),
                Keepouts = project.Board.Keepouts.Select(Keepout).ToList(),
            },
            Nets = project.Nets.Select(n => new NetGeometry
            {
                Name = n.Name,
                Ground = n.Ground,
                Class = n.Class.ToString().ToLowerInvariant(),
                Voltage = n.Voltage,
                Current = n.Current,
                MaxLead = R(project.Rules.MaxLeadFor(n)),
            }).ToList(),
            Pads = plan.Copper.Select(c =>
            {
                var shape = Shape(c.Island);
                shape.Strip = c.Segment >= 0 ? c.Pad.Id : null;
                shape.StockThickness = R(c.StockThickness);
                return shape;
            }).ToList(),
            Parts = plan.Parts.Select(Part).ToList(),
            Jumpers = project.Layout.Jumpers.Select(j => Jumper(plan, j)).ToList(),
            Rules = Rules(project),
        };
    }

    /// <summary>UTF-8 JSON, LF line ends, ending in a newline: the same plan always gives the same bytes.</summary>
    public static byte[] ToBytes(GeometryDocument document)
    {
        var json = JsonSerializer.Serialize(document, GeometryJsonContext.Default.GeometryDocument);
        return Encoding.UTF8.GetBytes(json.ReplaceLineEndings("\n") + "\n");
    }

    /// <summary>Writes the export atomically.</summary>
    public static void Write(Project project, string path) => AtomicFile.WriteAllBytes(path, ToBytes(Build(project)));

    private static PartGeometry Part(PlacedPart part) => new()
    {
        Ref = part.Ref,
        Value = part.Part.Value,
        Footprint = part.Footprint.Name,
        Position = Xy(part.Placement.Position),
        Rotation = part.Placement.Rotation.Degrees(),
        Body = part.Body.Select(Xy).ToList(),
        Leads = part.Leads.Where(l => l.Landing is not null).Select(l => new LeadGeometry
        {
            Pin = l.Pin,
            Net = l.Net,
            Exit = Xy(l.Exit),
            Landing = Xy(l.Landing!.At),
            Pad = l.Landing.Pad,
            Diameter = R(l.Lead.Diameter),
            Reach = R(l.Reach),
            MinReach = R(l.Lead.MinReach),
            MaxReach = R(l.Lead.MaxReach),
        }).ToList(),
    };

    private static JumperGeometry Jumper(ResolvedPlan plan, Jumper j)
    {
        var path = new List<double[]>();
        if (plan.CopperById(j.From) is { } from) path.Add(Xy(from.Island.Center));
        path.AddRange(j.Path.Select(Xy));
        if (plan.CopperById(j.To) is { } to) path.Add(Xy(to.Island.Center));
        return new JumperGeometry { Id = j.Id, From = j.From, To = j.To, Path = path };
    }

    private static RulesGeometry Rules(Project project)
    {
        var r = project.Rules;
        return new RulesGeometry
        {
            PadGap = R(r.PadGap),
            GroundGap = R(r.GroundGap),
            BoardMargin = R(project.Board.Margin),
            MaxLead = new Dictionary<string, double>
            {
                ["general"] = R(r.MaxLeadGeneral),
                ["rf"] = R(r.MaxLeadRf),
                ["audio"] = R(r.MaxLeadAudio),
                ["power"] = R(r.MaxLeadPower),
                ["hv"] = R(r.MaxLeadHv),
            },
            TempRise = R(r.TempRise),
            CopperThickness = R(r.CopperThickness),
            StockPermittivity = R(project.Toolkit.StockPermittivity),
            LeadCapacity = project.Toolkit.LeadCapacities.Select(c => new LeadCapacityGeometry { PadSize = R(c.PadSize), Leads = c.MaxLeads }).ToList(),
            LeadSpacing = R(project.Toolkit.LeadSpacing),
            HighVoltageTable = ConductorSpacing.Revision + ", column B2",
        };
    }

    private static ShapeGeometry Shape(Island island) => island.Shape == IslandShape.Round
        ? new ShapeGeometry { Id = island.Id, Net = island.Net, Shape = "round", X = R(island.Center.X), Y = R(island.Center.Y), D = R(island.Width) }
        : new ShapeGeometry { Id = island.Id, Net = island.Net, Shape = "rect", X = R(island.Center.X), Y = R(island.Center.Y), W = R(island.Width), H = R(island.Height) };

    // Keep-outs call a round shape a circle, as the project file does.
    private static ShapeGeometry Keepout(Keepout keepout)
    {
        var shape = Shape(CopperGeometry.Shape(keepout));
        if (keepout is CircleKeepout) shape.Shape = "circle";
        return shape;
    }

    private static double[] Xy(Point p) => [R(p.X), R(p.Y)];

    // A tenth of a micrometre: far below any tool's reach, and it keeps binary-fraction noise out of the file.
    private static double R(double mm) => Math.Round(mm, 4) + 0.0;
}
