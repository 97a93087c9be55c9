using PadPlan.Model;

namespace PadPlan.Output.Drawing;

/// <summary>One element of a drawing page, in page millimetres (origin top-left, y down).</summary>
public abstract record Shape
{
    /// <summary>What the shape stands for, when a reader of the output must know it (written into SVG as data attributes; the other back ends ignore it).</summary>
    public ShapeTag? Tag { get; init; }
}

/// <summary>
/// What a drawn shape is, for checks of the rendered output: a pad or strip ("pad"), a part body ("body") or a
/// piece of stock ("piece") with its id; or a text ("label") with the ids of the objects it names, which it may
/// cover. SVG carries it as data-kind, data-id and data-names.
/// </summary>
public sealed record ShapeTag(string Kind, string? Id = null, Model.ValueList<string>? Names = null)
{
    public const string PadKind = "pad";
    public const string BodyKind = "body";
    public const string PieceKind = "piece";
    public const string LabelKind = "label";

    public static ShapeTag Pad(string id) => new(PadKind, id);
    public static ShapeTag Body(string id) => new(BodyKind, id);
    public static ShapeTag Piece(string id) => new(PieceKind, id);
    public static ShapeTag Label(params IEnumerable<string?> names) => new(LabelKind, null, names.OfType<string>().Distinct().ToValueList());
}
