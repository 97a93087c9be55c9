using Xunit;
using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Tests.Rules.Shapes;

public class PolygonsTests
{
    private static Point[] Box(double x0, double y0, double x1, double y1) => [new(x0, y0), new(x1, y0), new(x1, y1), new(x0, y1)];

    // An L shape (not convex): the notch at the top right is empty.
    private static readonly Point[] L = [new(0, 0), new(2, 0), new(2, 2), new(4, 2), new(4, 4), new(0, 4)];

    [Theory]
    [InlineData(0, 0, 2, 2, 1, 1, 3, 3, true)]     // overlapping squares
    [InlineData(0, 0, 2, 2, 2, 0, 4, 2, false)]    // sharing an edge only
    [InlineData(0, 0, 2, 2, 3, 0, 5, 2, false)]    // apart
    [InlineData(0, 0, 4, 4, 1, 1, 2, 2, true)]     // one inside the other
    [InlineData(0, 0, 2, 2, 0, 0, 2, 2, true)]     // the same square
    public void Boxes(double a0, double a1, double a2, double a3, double b0, double b1, double b2, double b3, bool overlap) =>
        Assert.Equal(overlap, Polygons.Overlap(Box(a0, a1, a2, a3), Box(b0, b1, b2, b3)));

    [Theory]
    [InlineData(2.5, 0.5, 3.5, 1.5, false)]  // in the notch of the L
    [InlineData(2.5, 2.5, 3.5, 3.5, true)]   // in the L's arm
    [InlineData(1, -1, 3, 1, true)]          // across the top corner
    public void A_shape_that_is_not_convex(double x0, double y0, double x1, double y1, bool overlap) =>
        Assert.Equal(overlap, Polygons.Overlap(L, Box(x0, y0, x1, y1)));

    [Theory]
    [InlineData(3, 1, 2, false)]     // disc of 2 mm touching the box edge x = 2
    [InlineData(2.9, 1, 2, true)]
    [InlineData(1, 1, 0.4, true)]    // inside
    public void Box_against_a_disc(double x, double y, double d, bool overlap) =>
        Assert.Equal(overlap, Polygons.Overlap(Box(0, 0, 2, 2), new Island("k", null, new Point(x, y), d, d, IslandShape.Round)));
}
