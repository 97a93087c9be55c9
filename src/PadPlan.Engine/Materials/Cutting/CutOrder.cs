using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>
/// The order of the straight cuts that free every piece of a guillotine cutting plan (Jylänki, "A Thousand Ways to Pack
/// the Bin", 2010, section 3: each cut runs right across the part of the board it divides). The packer records where
/// pieces lie, not its cuts, so the cuts are found again from the placement: the stock is divided recursively, each
/// time by a cut through the current part that crosses no piece. Waste is cut off first (the largest offcut first),
/// so the rest of the stock stays whole; then the part is divided at the lowest such cut, rows before columns.
/// </summary>
public static class CutOrder
{
    // Millimetre tolerance for "on the edge": below what a builder can mark or cut.
    private const double Eps = 1e-6;

    /// <summary>The cuts on one stock piece, numbered 1..n in the order to make them; empty when nothing is cut from it.</summary>
    public static ValueList<StockCut> On(CuttingPlan plan, StockPiece stock)
    {
        var cuts = new List<(bool Vertical, Point Start, Point End)>();
        var pieces = plan.On(stock).ToList();
        if (pieces.Count > 0) Divide(new Part(stock.Width, stock.Height), pieces, plan.Kerf, cuts);
        return cuts.Select((c, i) => new StockCut(stock.Id, i + 1, c.Vertical, c.Start, c.End)).ToValueList();
    }

    /// <summary>Every stock piece's cuts, stock by stock in the plan's order.</summary>
    public static ValueList<StockCut> All(CuttingPlan plan) => plan.Stock.SelectMany(s => On(plan, s)).ToValueList();

    // A part of the board still to divide: its material edges, and where the cuts that made it run (the middle of their
    // kerf), which is where a cut across it starts and ends.
    private readonly record struct Part(double Left, double Top, double Right, double Bottom, double LineLeft, double LineTop, double LineRight, double LineBottom)
    {
        public Part(double width, double height) : this(0, 0, width, height, 0, 0, width, height) { }
    }

    // One candidate cut: at the kerf's middle, with the two parts it leaves.
    private readonly record struct Candidate(bool Vertical, double At, Part First, Part Second, List<PlacedPiece> InFirst, List<PlacedPiece> InSecond)
    {
        public bool Trim => InFirst.Count == 0 || InSecond.Count == 0;
        public double Waste => InFirst.Count == 0 ? Area(First) : Area(Second);
    }

    private static double Area(Part p) => (p.Right - p.Left) * (p.Bottom - p.Top);

    private static void Divide(Part part, List<PlacedPiece> pieces, double kerf, List<(bool, Point, Point)> cuts)
    {
        if (pieces.Count == 0) return;
        if (pieces.Count == 1 && Fills(pieces[0], part)) return;
        var options = Candidates(part, pieces, kerf).ToList();
        if (options.Count == 0)
            throw new InvalidOperationException($"the pieces on a stock part at {part.Left}, {part.Top} cannot be separated by a straight through-cut; the plan is not a guillotine plan.");
        var best = options.Where(c => c.Trim).OrderByDescending(c => c.Waste).ThenBy(c => c.Vertical).ThenBy(c => c.At).FirstOrDefault();
        if (best.InFirst is null) best = options.OrderBy(c => c.At - (c.Vertical ? part.Left : part.Top)).ThenBy(c => c.Vertical).First();
        cuts.Add(best.Vertical
            ? (true, new Point(best.At, part.LineTop), new Point(best.At, part.LineBottom))
            : (false, new Point(part.LineLeft, best.At), new Point(part.LineRight, best.At)));
        Divide(best.First, best.InFirst, kerf, cuts);
        Divide(best.Second, best.InSecond, kerf, cuts);
    }

    private static bool Fills(PlacedPiece p, Part part) =>
        Math.Abs(p.X - part.Left) < Eps && Math.Abs(p.Y - part.Top) < Eps && Math.Abs(p.Right - part.Right) < Eps && Math.Abs(p.Bottom - part.Bottom) < Eps;

    // Cuts just past a piece's far edge or just before its near edge, along both axes, that cross no piece. Where the
    // board left beyond a piece is narrower than the kerf, the cut takes only that sliver.
    private static IEnumerable<Candidate> Candidates(Part part, List<PlacedPiece> pieces, double kerf)
    {
        foreach (var vertical in new[] { false, true })
        {
            var lo = vertical ? part.Left : part.Top;
            var hi = vertical ? part.Right : part.Bottom;
            var seen = new HashSet<double>();
            foreach (var p in pieces)
            {
                var near = vertical ? p.X : p.Y;
                var far = vertical ? p.Right : p.Bottom;
                var edges = new List<(double End, double Start)>();
                if (far < hi - Eps) edges.Add((far, far + Math.Min(kerf, hi - far)));
                if (near > lo + Eps) edges.Add((near - Math.Min(kerf, near - lo), near));
                foreach (var (end, start) in edges)
                {
                    var at = (end + start) / 2;
                    if (!seen.Add(Math.Round(at, 6))) continue;
                    var first = pieces.Where(q => (vertical ? q.Right : q.Bottom) <= end + Eps).ToList();
                    var second = pieces.Where(q => (vertical ? q.X : q.Y) >= start - Eps).ToList();
                    if (first.Count + second.Count != pieces.Count) continue;
                    var a = vertical ? part with { Right = end, LineRight = at } : part with { Bottom = end, LineBottom = at };
                    var b = vertical ? part with { Left = start, LineLeft = at } : part with { Top = start, LineTop = at };
                    yield return new Candidate(vertical, at, a, b, first, second);
                }
            }
        }
    }
}
