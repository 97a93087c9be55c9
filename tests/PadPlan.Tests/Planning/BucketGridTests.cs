using PadPlan.Planning;
using Xunit;

namespace PadPlan.Tests.Planning;

/// <summary>
/// The grid a move's searches read. A search along a long slanting lead path reads only the cells near the path instead of
/// every entry; it must still meet every entry that comes within reach, or the placer would miss a crossing.
/// Checked against a brute-force test of every entry (Liang-Barsky clipping of the segment by each widened box).
/// </summary>
public class BucketGridTests
{
    private const double Reach = 1.2;

    [Fact]
    public void A_walk_along_a_segment_meets_every_entry_within_reach()
    {
        var (grid, boxes) = Filled(seed: 1);
        var rng = new Random(2);
        var alongCells = 0;
        for (var k = 0; k < 2000; k++)
        {
            var (ax, ay) = (rng.NextDouble() * 340 - 20, rng.NextDouble() * 240 - 20);
            var (bx, by) = (k % 4) switch
            {
                0 => (ax, ay + rng.NextDouble() * 150 - 75), // vertical
                1 => (ax + rng.NextDouble() * 150 - 75, ay), // level
                2 => (ax + rng.NextDouble() * 6 - 3, ay + rng.NextDouble() * 6 - 3), // short
                _ => (ax + rng.NextDouble() * 200 - 100, ay + rng.NextDouble() * 200 - 100), // long and slanting
            };
            var walk = grid.AlongSegment(ax, ay, bx, by, Reach, boxes.Length);
            if (walk.ByCells) alongCells++;
            var met = new HashSet<int>();
            foreach (var e in walk) met.Add(e);
            for (var e = 0; e < boxes.Length; e++)
            {
                var (x0, y0, x1, y1) = boxes[e];
                var (wx0, wy0, wx1, wy1) = (x0 - Reach, y0 - Reach, x1 + Reach, y1 + Reach);
                var near = Geometry.ClippedLength(ax, ay, bx, by, wx0, wy0, wx1, wy1) > 0 || InBox(ax, ay, wx0, wy0, wx1, wy1) || InBox(bx, by, wx0, wy0, wx1, wy1);
                Assert.True(!near || met.Contains(e), $"segment {k} ({ax:0.##}, {ay:0.##})-({bx:0.##}, {by:0.##}) passes within reach of entry {e} and never met it");
            }
        }
        Assert.True(alongCells > 300, $"only {alongCells} walks read the cells along their segment: the check proves little");
    }

    [Fact]
    public void A_short_segment_is_walked_exactly_as_its_box()
    {
        var (grid, boxes) = Filled(seed: 3);
        var rng = new Random(4);
        for (var k = 0; k < 500; k++)
        {
            var (ax, ay) = (rng.NextDouble() * 300, rng.NextDouble() * 200);
            var (bx, by) = (ax + rng.NextDouble() * 10 - 5, ay + rng.NextDouble() * 10 - 5);
            var along = new List<int>();
            var walk = grid.AlongSegment(ax, ay, bx, by, Reach, boxes.Length);
            Assert.False(walk.ByCells);
            foreach (var e in walk) along.Add(e);
            var around = new List<int>();
            foreach (var e in grid.Around(Math.Min(ax, bx) - Reach, Math.Min(ay, by) - Reach, Math.Max(ax, bx) + Reach, Math.Max(ay, by) + Reach, boxes.Length)) around.Add(e);
            Assert.Equal(around, along);
        }
    }

    private static bool InBox(double x, double y, double x0, double y0, double x1, double y1) => x >= x0 && x <= x1 && y >= y0 && y <= y1;

    /// <summary>A 300 x 200 mm region with 3,000 entries: small boxes like short lead paths, and some long ones on the wide list.</summary>
    private static (BucketGrid Grid, (double X0, double Y0, double X1, double Y1)[] Boxes) Filled(int seed)
    {
        var rng = new Random(seed);
        var grid = new BucketGrid(new Region(0, 0, 300, 200), 4.0, 3000);
        var boxes = new (double, double, double, double)[3000];
        for (var e = 0; e < boxes.Length; e++)
        {
            var (x, y) = (rng.NextDouble() * 320 - 10, rng.NextDouble() * 220 - 10);
            var (w, h) = e % 50 == 0 ? (rng.NextDouble() * 60, rng.NextDouble() * 60) : (rng.NextDouble() * 5, rng.NextDouble() * 5);
            boxes[e] = (x, y, x + w, y + h);
            grid.File(e, x, y, x + w, y + h);
        }
        return (grid, boxes);
    }
}
