using PadPlan.Model;
using PadPlan.Rules.Shapes;
using Xunit;

namespace PadPlan.Tests.Rules.Shapes;

/// <summary>Distances between lead paths, checked against cases worked by hand (elementary plane geometry).</summary>
public class SegmentsTests
{
    [Theory]
    // crossing diagonals of a 4 x 4 square: they meet at (2, 2)
    [InlineData(0, 0, 4, 4, 0, 4, 4, 0, 0)]
    // parallel, 3 apart, overlapping in x
    [InlineData(0, 0, 10, 0, 2, 3, 8, 3, 3)]
    // one ends on the other (a T): touching
    [InlineData(0, 0, 10, 0, 5, 0, 5, 6, 0)]
    // collinear and overlapping (leads swapped along one line)
    [InlineData(0, 0, 10, 0, 2, 0, 12, 0, 0)]
    // end to end along one line, 2 apart
    [InlineData(0, 0, 3, 0, 5, 0, 9, 0, 2)]
    // 3-4-5: the end (3, 4) of one to the start (0, 0) of a segment pointing away
    [InlineData(-5, 0, 0, 0, 3, 4, 3, 9, 5)]
    public void Distance_between_two_paths(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy, double expected)
    {
        Assert.Equal(expected, Segments.Distance(new Point(ax, ay), new Point(bx, by), new Point(cx, cy), new Point(dx, dy)), 9);
        Assert.Equal(expected, Segments.Distance(new Point(cx, cy), new Point(dx, dy), new Point(ax, ay), new Point(bx, by)), 9);
    }
}
