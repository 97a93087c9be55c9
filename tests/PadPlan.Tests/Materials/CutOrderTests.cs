using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using PadPlan.Materials.Cutting;
using Point = PadPlan.Model.Point;
using ValueList = PadPlan.Model.ValueList;

namespace PadPlan.Tests.Materials;

/// <summary>
/// The cut order against the packing: replayed cut by cut on the stock, every cut must run straight from edge to edge
/// of the part of the board it divides and cross no piece, and at the end every piece must be free on its own. That is
/// the defining property of guillotine cutting (Jylänki, "A Thousand Ways to Pack the Bin", 2010, section 3).
/// </summary>
public sealed class CutOrderTests
{
    private const double Tol = 1e-6;

    private static CutPiece Piece(string id, double w, double h) => new(id, CutPieceKind.Rect, w, h, 1.6, ValueList.Of(id));

    // Hand-worked: stock 10 x 10, kerf 1. The 10 x 6 piece goes at 0, 0 and the 10 x 3 piece below it at 0, 7
    // (6 + 1 kerf); the 10 x 3 piece ends on the stock's far edge (7 + 3 = 10). One cut across at y = 6.5 frees both.
    [Fact]
    public void Two_pieces_filling_the_stock_need_one_cut_across_the_kerf()
    {
        var plan = GuillotinePacker.Pack([Piece("A", 10, 6), Piece("B", 10, 3)], [new StockPiece("S1", 10, 10, 1.6)], kerf: 1);
        var cuts = plan.CutsOn(plan.Stock[0]);
        var cut = Assert.Single(cuts);
        Assert.Equal(1, cut.Number);
        Assert.False(cut.Vertical);
        Assert.Equal(6.5, cut.At, 9);
        Assert.Equal(new Point(0, 6.5), cut.Start);
        Assert.Equal(new Point(10, 6.5), cut.End);
    }

    // Hand-worked: stock 100 x 60, kerf 0, one 30 x 20 piece at the corner. Freeing it takes two cuts; the larger offcut
    // is cut away first, so the rest of the stock stays whole: 70 x 60 right of x = 30 (4200 mm², more than the 100 x 40
    // = 4000 mm² below y = 20), then across the 30 x 60 left part at y = 20.
    [Fact]
    public void A_corner_piece_is_freed_by_two_cuts_the_larger_offcut_first()
    {
        var plan = GuillotinePacker.Pack([Piece("A", 30, 20)], [new StockPiece("S1", 100, 60, 1.6)], kerf: 0);
        var cuts = plan.CutsOn(plan.Stock[0]);
        Assert.Equal(2, cuts.Count);
        Assert.Equal((true, 30.0, 0.0, 60.0), (cuts[0].Vertical, cuts[0].At, cuts[0].Start.Y, cuts[0].End.Y));
        Assert.Equal((false, 20.0, 0.0, 30.0), (cuts[1].Vertical, cuts[1].At, cuts[1].Start.X, cuts[1].End.X));
    }

    [Fact]
    public void A_stock_piece_with_nothing_on_it_has_no_cuts()
    {
        var plan = GuillotinePacker.Pack([Piece("A", 30, 20)], [new StockPiece("S1", 100, 60, 1.6), new StockPiece("S2", 100, 60, 1.6)], kerf: 1);
        Assert.Empty(plan.CutsOn(plan.Stock[1]));
    }

    [Property(MaxTest = 200)]
    public Property Every_cut_is_a_through_cut_of_its_part_and_the_cuts_free_every_piece() =>
        Prop.ForAll(GuillotinePackerTests.Cases(), c =>
        {
            var plan = GuillotinePacker.Pack(c.Pieces, c.Stock, c.Kerf);
            var problem = plan.Stock.Select(s => Replay(plan, s)).FirstOrDefault(p => p is not null);
            return (problem is null).Label(problem ?? "");
        });

    /// <summary>Cuts the stock as the builder would, in the order given; the first thing wrong, or null.</summary>
    public static string? Replay(CuttingPlan plan, StockPiece stock)
    {
        var pieces = plan.On(stock).ToList();
        var cuts = plan.CutsOn(stock);
        if (!cuts.Select(c => c.Number).SequenceEqual(Enumerable.Range(1, cuts.Count))) return $"{stock.Id}: cuts are not numbered 1..{cuts.Count}";
        var parts = new List<(double L, double T, double R, double B)> { (0, 0, stock.Width, stock.Height) };
        foreach (var cut in cuts)
        {
            // the part this cut divides: the one whose opposite edges it joins
            var i = parts.FindIndex(p => cut.Vertical
                ? Near(cut.Start.Y, p.T) && Near(cut.End.Y, p.B) && cut.At > p.L + Tol && cut.At < p.R - Tol
                : Near(cut.Start.X, p.L) && Near(cut.End.X, p.R) && cut.At > p.T + Tol && cut.At < p.B - Tol);
            if (i < 0) return $"{stock.Id}: cut {cut.Number} does not run from edge to edge of any remaining part";
            var part = parts[i];
            foreach (var p in pieces)
            {
                var (lo, hi) = cut.Vertical ? (p.X, p.Right) : (p.Y, p.Bottom);
                var inPart = p.X >= part.L - Tol && p.Right <= part.R + Tol && p.Y >= part.T - Tol && p.Bottom <= part.B + Tol;
                // straight through the part without entering a piece (kerf spacing is PlanGeometry's check)
                if (inPart && lo < cut.At - Tol && hi > cut.At + Tol) return $"{stock.Id}: cut {cut.Number} at {cut.At} runs through piece {p.Piece.Id}";
            }
            parts.RemoveAt(i);
            parts.Add(cut.Vertical ? (part.L, part.T, cut.At, part.B) : (part.L, part.T, part.R, cut.At));
            parts.Add(cut.Vertical ? (cut.At, part.T, part.R, part.B) : (part.L, cut.At, part.R, part.B));
        }
        foreach (var p in pieces)
        {
            var holding = parts.Where(q => p.X >= q.L - Tol && p.Right <= q.R + Tol && p.Y >= q.T - Tol && p.Bottom <= q.B + Tol).ToList();
            if (holding.Count != 1) return $"{stock.Id}: piece {p.Piece.Id} is not inside exactly one part after the cuts";
            var q = holding[0];
            // freed: nothing but kerf (at most one kerf) left on any side of the piece
            if (p.X - q.L > plan.Kerf / 2 + Tol || q.R - p.Right > plan.Kerf / 2 + Tol || p.Y - q.T > plan.Kerf / 2 + Tol || q.B - p.Bottom > plan.Kerf / 2 + Tol)
                return $"{stock.Id}: piece {p.Piece.Id} is still joined to waste after the last cut";
            if (pieces.Count(o => o != p && o.X < q.R - Tol && o.Right > q.L + Tol && o.Y < q.B - Tol && o.Bottom > q.T + Tol) > 0)
                return $"{stock.Id}: piece {p.Piece.Id} shares its part with another piece";
        }
        return null;
    }

    private static bool Near(double a, double b) => Math.Abs(a - b) < Tol;
}
