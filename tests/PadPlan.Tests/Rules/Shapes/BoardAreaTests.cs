using Xunit;
using PadPlan.Model;
using PadPlan.Rules.Shapes;

namespace PadPlan.Tests.Rules.Shapes;

public class BoardAreaTests
{
    private static readonly BoardArea Square = new(50, 40, 0, 2);
    private static readonly BoardArea Rounded = new(50, 40, 6, 2);

    [Theory]
    [InlineData(25, 20, 0, false)]
    [InlineData(2, 20, 0, false)]    // on the margin line
    [InlineData(1, 20, 0, true)]
    [InlineData(3, 20, 1.5, true)]   // a 3 mm disc reaching 0.5 mm into the margin
    [InlineData(49, 39, 0, true)]
    public void Square_board(double x, double y, double radius, bool outside) =>
        Assert.Equal(outside, Square.Overhang(new Point(x, y), radius) > 1e-9);

    [Fact]
    public void Rounded_corner_cuts_off_the_corner_of_the_margin()
    {
        // Corner radius 6 with a 2 mm margin leaves an inner corner of radius 4 centred at (6, 6).
        // The point (2.5, 2.5) lies inside the square margin but 4.95 mm from that centre: 0.95 mm outside.
        Assert.Equal(0, Square.Overhang(new Point(2.5, 2.5)), 9);
        Assert.Equal(Math.Sqrt(2 * 3.5 * 3.5) - 4, Rounded.Overhang(new Point(2.5, 2.5)), 9);
    }

    [Fact]
    public void Outline_of_a_rounded_board_stays_on_the_edge()
    {
        var outline = Rounded.Outline();
        Assert.All(outline, p => Assert.InRange(p.X, -1e-9, 50 + 1e-9));
        Assert.All(outline, p => Assert.InRange(p.Y, -1e-9, 40 + 1e-9));
        Assert.Contains(outline, p => Math.Abs(p.X - 44) < 1e-9 && Math.Abs(p.Y) < 1e-9);
    }
}
