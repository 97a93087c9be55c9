using System.Numerics;
using PadPlan.Rules.Shapes;
using SharpGLTF.Schema2;

namespace PadPlan.Model3D;

/// <summary>Writes a <see cref="BoardModel"/> as binary glTF 2.0 (.glb) with SharpGLTF.</summary>
/// <remarks>Units and axes follow the glTF 2.0 specification (section 3.4): metres, right-handed, +Y up. The board's
/// top-left corner is the origin; glTF +X is the board's x (to the right), +Y is up from the plane's copper face, and
/// +Z is the board's y (toward the builder, the template's bottom edge). So the file's (X, Y, Z) is (x, z, y) / 1000.
/// Every node is named: "board", each pad id (a strip's segments are its children, named by segment id), each part
/// reference (its leads are children named "R1.2" by part and pin; a ground landing's solder joint is the lead's child
/// "R1.2 joint"), each jumper id.</remarks>
public static class GlbFile
{
    /// <summary>The asset's generator field: names PadPlan (so an export can tell its own files) and the library that writes them.</summary>
    public const string Generator = "PadPlan (SharpGLTF)";

    /// <summary>The glb bytes of the model: the same model gives the same bytes.</summary>
    public static byte[] Write(BoardModel model)
    {
        var root = ModelRoot.CreateModel();
        root.Asset.Generator = Generator;
        var scene = root.UseScene(model.Name);
        var materials = new Dictionary<Finish, Material>();
        foreach (var node in model.Nodes) Add(root, materials, scene.CreateNode(node.Name), node);
        using var stream = new MemoryStream();
        root.WriteGLB(stream);
        return stream.ToArray();
    }

    /// <summary>The first bytes of a file are a binary glTF that PadPlan wrote: the glb magic, and its generator in the JSON chunk that follows.</summary>
    public static bool IsOwn(ReadOnlySpan<byte> head) =>
        head.StartsWith("glTF"u8) && head.IndexOf(System.Text.Encoding.UTF8.GetBytes($"\"generator\":\"{Generator}\"")) >= 0;

    /// <summary>A point of the board model in the file's frame (metres, Y up).</summary>
    public static Vector3 ToFile(Point3 p) => new((float)(p.X / 1000), (float)(p.Z / 1000), (float)(p.Y / 1000));

    /// <summary>A point of the file's frame back in board millimetres.</summary>
    public static Point3 FromFile(Vector3 v) => new(v.X * 1000.0, v.Z * 1000.0, v.Y * 1000.0);

    private static void Add(ModelRoot root, Dictionary<Finish, Material> materials, Node target, ModelNode node)
    {
        if (node.Meshes.Count > 0)
        {
            var mesh = root.CreateMesh(node.Name);
            foreach (var m in node.Meshes)
            {
                var primitive = mesh.CreatePrimitive();
                primitive.SetVertexAccessor("POSITION", Vectors(root, m.Positions, ToFile));
                primitive.SetVertexAccessor("NORMAL", Vectors(root, m.Normals, n => new Vector3((float)n.X, (float)n.Z, (float)n.Y)));
                primitive.SetIndexAccessor(Indices(root, m.Indices));
                primitive.Material = MaterialOf(root, materials, m.Finish);
            }
            target.Mesh = mesh;
        }
        foreach (var child in node.Children) Add(root, materials, target.CreateNode(child.Name), child);
    }

    private static Accessor Vectors(ModelRoot root, IReadOnlyList<Point3> points, Func<Point3, Vector3> map)
    {
        var bytes = new byte[points.Count * 12];
        var floats = new Span<float>(new float[points.Count * 3]);
        for (var i = 0; i < points.Count; i++)
        {
            var v = map(points[i]);
            (floats[3 * i], floats[3 * i + 1], floats[3 * i + 2]) = (v.X, v.Y, v.Z);
        }
        System.Runtime.InteropServices.MemoryMarshal.AsBytes(floats).CopyTo(bytes);
        var view = root.UseBufferView(bytes, 0, null, 0, BufferMode.ARRAY_BUFFER);
        var accessor = root.CreateAccessor();
        accessor.SetVertexData(view, 0, points.Count, SharpGLTF.Memory.AttributeFormat.Float3);
        return accessor;
    }

    private static Accessor Indices(ModelRoot root, IReadOnlyList<int> indices)
    {
        var bytes = new byte[indices.Count * 4];
        for (var i = 0; i < indices.Count; i++) BitConverter.TryWriteBytes(bytes.AsSpan(4 * i), (uint)indices[i]);
        var view = root.UseBufferView(bytes, 0, null, 0, BufferMode.ELEMENT_ARRAY_BUFFER);
        var accessor = root.CreateAccessor();
        accessor.SetIndexData(view, 0, indices.Count, IndexEncodingType.UNSIGNED_INT);
        return accessor;
    }

    private static Material MaterialOf(ModelRoot root, Dictionary<Finish, Material> materials, Finish finish)
    {
        if (materials.TryGetValue(finish, out var material)) return material;
        material = root.CreateMaterial(finish.ToString().ToLowerInvariant());
        material.InitializePBRMetallicRoughness();
        var (r, g, b) = Finishes.Colour(finish);
        var colour = material.FindChannel("BaseColor")!.Value;
        colour.Color = new Vector4((float)r, (float)g, (float)b, 1);
        var metal = material.FindChannel("MetallicRoughness")!.Value;
        // Only half metallic: a viewer without an environment map shows fully metallic surfaces nearly black.
        metal.SetFactor("MetallicFactor", Finishes.IsMetal(finish) ? 0.45f : 0f);
        metal.SetFactor("RoughnessFactor", Finishes.IsMetal(finish) ? 0.45f : 0.7f);
        materials[finish] = material;
        return material;
    }
}
