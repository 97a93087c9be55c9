using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>A placed part in three dimensions: its body as the plan outline raised from <see cref="Bottom"/> to <see cref="Top"/>, and each landed lead as a bent wire.</summary>
/// <param name="Seat">Height of the surface the part stands on: the highest pad top (or the plane) its leads land on, mm.</param>
public sealed record PartSolid(PlacedPart Part, double Seat, double Bottom, double Top, ValueList<LeadPath> Leads)
{
    public string Ref => Part.Ref;
    public Footprint Footprint => Part.Footprint;

    /// <summary>Whether two bodies share some height: the first condition for meeting in 3D (the plan outlines must overlap too).</summary>
    public bool SharesHeight(PartSolid other) =>
        Bottom < other.Top - Polygons.Tolerance && other.Bottom < Top - Polygons.Tolerance;
}

/// <summary>One landed lead as a wire: from where it leaves the body, through its bends, down to its landing point (the last point).</summary>
/// <param name="OnPlane">The lead lands on the ground plane (no pad under it): the model solders it there.</param>
public sealed record LeadPath(PlacedLead Lead, ValueList<Point3> Points, bool OnPlane)
{
    public Point3 End => Points[^1];
    public double Radius => Lead.Lead.Diameter / 2;
}
