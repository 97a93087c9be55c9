using System.Numerics;
using PadPlan.Model;
using PadPlan.Model3D;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Rules.Shapes;
using PadPlan.Tests.Output;
using SharpGLTF.Schema2;

namespace PadPlan.Tests.Model3D;

/// <summary>The glTF file of the 3D model, checked from outside: the Khronos glTF validator on every example, and the file
/// read back with SharpGLTF against the plan (glTF 2.0 specification: metres, +Y up).</summary>
public class ModelFileTests
{
    public static readonly string[] Examples = ["tiny-buffer", "cw-filter", "jfet-preamp", "valve-stage", "xtal-osc-40m"];

    private static readonly Project Tiny = ProjectFile.Read(TestPaths.TinyBuffer);

    [GltfValidatorFact]
    public void Every_example_model_passes_the_Khronos_glTF_validator()
    {
        var dir = TestPaths.NewTempDir();
        var files = Examples.Select(name =>
        {
            var file = Path.Combine(dir, name + ".glb");
            File.WriteAllBytes(file, GlbFile.Write(BoardModel.Of(ExampleProjects.Placed(name))));
            return file;
        }).ToList();
        var reports = GltfValidator.Validate(files);
        foreach (var file in files)
        {
            var (errors, _, messages) = reports[file];
            // Khronos glTF-Validator: an asset with 0 errors is valid glTF 2.0.
            Assert.True(errors == 0, $"{Path.GetFileName(file)}: {errors} error(s)\n{string.Join("\n", messages)}");
        }
    }

    [Fact]
    public void The_models_bounds_are_the_board_outline()
    {
        foreach (var project in new[] { Tiny, ExampleProjects.Placed("xtal-osc-40m") })
        {
            var root = ModelRoot.ParseGLB(GlbFile.Write(BoardModel.Of(project)));
            var all = WorldPositions(root.LogicalNodes).SelectMany(x => x.Points).ToList();
            var (w, h, t) = (project.Board.Width!.Value, project.Board.Height!.Value, project.Board.Thickness);
            // glTF 2.0 section 3.4: metres; the file's X is the board's x, Z the board's y, Y up from the copper face.
            Assert.Equal(0, all.Min(p => p.X) * 1000, 2);
            Assert.Equal(w, all.Max(p => p.X) * 1000, 2);
            Assert.Equal(0, all.Min(p => p.Z) * 1000, 2);
            Assert.Equal(h, all.Max(p => p.Z) * 1000, 2);
            Assert.Equal(-t, all.Min(p => p.Y) * 1000, 2);
        }
    }

    [Fact]
    public void Every_lead_ends_on_its_landing_point()
    {
        foreach (var project in new[] { Tiny, ExampleProjects.Placed("jfet-preamp") })
        {
            var plan = ResolvedPlan.Of(project);
            var root = ModelRoot.ParseGLB(GlbFile.Write(BoardModel.Of(project)));
            var wires = WorldPositions(root.LogicalNodes).ToDictionary(x => x.Node.Name, x => x.Points);
            var landed = plan.Leads.Where(l => l.Landing is not null).ToList();
            Assert.NotEmpty(landed);
            foreach (var lead in landed)
            {
                Assert.True(wires.TryGetValue(lead.Name, out var points), $"no node named {lead.Name}");
                // The wire's lowest ring is its end, lying flat on the surface it lands on: its centre is the landing point.
                var low = points!.Min(p => p.Y);
                var end = points.Where(p => p.Y < low + 1e-6f).ToList();
                var at = lead.Landing!.At;
                var surface = plan.CopperAt(at, Polygons.Tolerance) is { Count: > 0 } under ? under[0].StockThickness : 0;
                Assert.True(Math.Abs(end.Average(p => p.X) * 1000 - at.X) < 0.01, $"{lead.Name} ends at x {end.Average(p => p.X) * 1000:0.###}, lands at {at.X}");
                Assert.True(Math.Abs(end.Average(p => p.Z) * 1000 - at.Y) < 0.01, $"{lead.Name} ends at y {end.Average(p => p.Z) * 1000:0.###}, lands at {at.Y}");
                Assert.True(Math.Abs(low * 1000 - surface) < 0.01, $"{lead.Name} ends {low * 1000:0.###} mm up, its landing surface is {surface} mm up");
            }
        }
    }

    [Fact]
    public void Nodes_are_named_by_part_reference_and_pad_id()
    {
        var root = ModelRoot.ParseGLB(GlbFile.Write(BoardModel.Of(Tiny)));
        var names = root.LogicalNodes.Select(n => n.Name).ToHashSet();
        Assert.Contains("board", names);
        Assert.All(Tiny.Parts, p => Assert.Contains(p.Ref, names));
        Assert.All(Tiny.Layout!.Pads, p => Assert.Contains(p.Id, names));
    }

    [Fact]
    public void The_same_plan_gives_the_same_bytes()
    {
        Assert.Equal(GlbFile.Write(BoardModel.Of(Tiny)), GlbFile.Write(BoardModel.Of(ProjectFile.Read(TestPaths.TinyBuffer))));
    }

    private static IEnumerable<(Node Node, List<Vector3> Points)> WorldPositions(IEnumerable<Node> nodes) =>
        nodes.Where(n => n.Mesh is not null).Select(n => (n, n.Mesh.Primitives
            .SelectMany(p => p.GetVertexAccessor("POSITION").AsVector3Array())
            .Select(v => Vector3.Transform(v, n.WorldMatrix)).ToList()));
}
