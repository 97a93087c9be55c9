using Xunit;
using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Tests.Rules.Shapes;

public class CopperGeometryTests
{
    private static Island Round(double x, double y, double d) => new("r", null, new Point(x, y), d, d, IslandShape.Round);
    private static Island Rect(double x, double y, double w, double h) => new("q", null, new Point(x, y), w, h, IslandShape.Rect);

    public static TheoryData<Island, Island, double> Gaps => new()
    {
        // Plane geometry: centre distance less the radii.
        { Round(0, 0, 4), Round(5, 0, 2), 2 },
        { Round(0, 0, 4), Round(3, 0, 2), 0 },       // touching
        { Round(0, 0, 4), Round(2, 0, 2), -1 },      // overlapping
        // Axis-aligned rectangles: side by side, and corner to corner (3-4-5 triangle).
        { Rect(0, 0, 2, 2), Rect(4, 0, 2, 2), 2 },
        { Rect(0, 0, 2, 2), Rect(5, 6, 2, 2), 5 },
        { Rect(0, 0, 4, 4), Rect(3, 0, 4, 4), -1 },
        // Disc beside a rectangle, and off its corner (3-4-5 triangle from the corner).
        { Round(5, 0, 2), Rect(0, 0, 4, 4), 2 },
        { Round(5, 6, 2), Rect(0, 0, 4, 4), 4 },
    };

    [Theory]
    [MemberData(nameof(Gaps))]
    public void Gap_between_islands(Island a, Island b, double gap)
    {
        Assert.Equal(gap, CopperGeometry.Gap(a, b), 9);
        Assert.Equal(gap, CopperGeometry.Gap(b, a), 9);
    }

    [Theory]
    [InlineData(0, 0, -2)]     // centre of a 4 mm disc: 2 mm deep
    [InlineData(1.5, 0, -0.5)]
    [InlineData(3, 4, 3)]      // 5 mm from the centre, 3 mm outside
    public void Signed_distance_to_a_disc(double x, double y, double d) =>
        Assert.Equal(d, CopperGeometry.SignedDistance(Round(0, 0, 4), new Point(x, y)), 9);

    [Theory]
    [InlineData(0, 0, -1)]     // centre of a 4 x 2 rectangle: 1 mm from the long edge
    [InlineData(1.8, 0, -0.2)]
    [InlineData(5, 5, 5)]      // 3-4-5 from the corner (2, 1)
    public void Signed_distance_to_a_rectangle(double x, double y, double d) =>
        Assert.Equal(d, CopperGeometry.SignedDistance(Rect(0, 0, 4, 2), new Point(x, y)), 9);
}
