namespace PadPlan.Model;

/// <summary>The solid a part's body is drawn as in the 3D model. The checker treats every shape as its plan outline raised
/// from the body's underside to its top (see <see cref="Footprint.BodyBottom"/>), so the shape only changes the picture.</summary>
public enum BodyShape
{
    /// <summary>A cylinder lying along the longer side of the outline, leads out of its ends (axial resistors, diodes, chokes).</summary>
    Lying,
    /// <summary>A cylinder standing on end (radial electrolytics, drum chokes, LEDs, upright resistors).</summary>
    Cylinder,
    /// <summary>A disc standing on edge, its face along the longer side of the outline (ceramic disc capacitors).</summary>
    Disc,
    /// <summary>A block the shape of the outline (film capacitors, TO-126, TO-220, generic parts).</summary>
    Box,
    /// <summary>The TO-92 half-cylinder: flat face to the front, round back.</summary>
    To92,
    /// <summary>A dual in-line package: a block with a row of leads down each long side.</summary>
    Dip,
    /// <summary>A wound ring lying flat on the board.</summary>
    Toroid,
    /// <summary>A crystal can: a flat can with rounded ends standing on its leads (HC-49).</summary>
    Can,
    /// <summary>A trimmer: a low block with an adjusting screw on top.</summary>
    Trimmer,
    /// <summary>Off-board wire ends (landings): no body is drawn and leads may pass, but body-overlap keeps other bodies out of the landing's outline up to its height, the room the wires take.</summary>
    Wires,
}
