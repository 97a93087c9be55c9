using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Model3D;

/// <summary>A triangle mesh of one finish in board millimetres (x right, y down, z up from the plane's copper face).
/// Each triangle lists its corners counter-clockwise as seen from outside (from +z for a face looking up), with a unit normal per corner.</summary>
public sealed class Mesh
{
    public Mesh(Finish finish, IReadOnlyList<Point3> positions, IReadOnlyList<Point3> normals, IReadOnlyList<int> indices)
    {
        if (positions.Count != normals.Count) throw new ArgumentException("every position needs a normal.", nameof(normals));
        if (indices.Count % 3 != 0 || indices.Any(i => i < 0 || i >= positions.Count)) throw new ArgumentException("indices must come in threes and name existing corners.", nameof(indices));
        Finish = finish;
        Positions = positions;
        Normals = normals;
        Indices = indices;
    }

    public Finish Finish { get; }
    public IReadOnlyList<Point3> Positions { get; }
    public IReadOnlyList<Point3> Normals { get; }
    public IReadOnlyList<int> Indices { get; }
}

/// <summary>One named thing of the model (the board, a pad, a part body, a lead, a joint) and the meshes that draw it.</summary>
public sealed record ModelNode(string Name, ModelNodeKind Kind, IReadOnlyList<Mesh> Meshes, IReadOnlyList<ModelNode> Children)
{
    /// <summary>For a lead: the point where it ends on its landing; null for everything else.</summary>
    public Point3? End { get; init; }
    /// <summary>The part reference or pad id the node belongs to, for sharing a selection with the flat views.</summary>
    public string Item { get; init; } = Name;
}

public enum ModelNodeKind { Board, Pad, Island, Part, Lead, Joint }
