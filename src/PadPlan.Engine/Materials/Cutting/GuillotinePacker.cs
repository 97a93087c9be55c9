using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>
/// Nests rectangular pieces on stock pieces so that every cut runs straight across the part of the board it divides, as a
/// guillotine, hand shear or saw cuts. Method: Jylänki, "A Thousand Ways to Pack the Bin" (2010), section 3 (Guillotine):
/// pieces sorted by area, largest first (DESCA); each goes in the free rectangle it fills best (Best Area Fit), turned a
/// quarter when that fits better; the leftover is split along the shorter leftover axis (SLAS). Jylänki's optional
/// rectangle merge is left out on purpose: it can join free space across an earlier cut, and the plan then cannot be
/// cut with straight through-cuts (the property tests found such a case). Stock pieces are filled in the order given:
/// a piece goes on the first stock piece it fits on (first fit over bins), so later offcuts stay whole where possible.
/// </summary>
public static class GuillotinePacker
{
    // Millimetre tolerance for "fits": below what a builder can mark or cut.
    private const double Eps = 1e-9;

    /// <summary>
    /// Packs the pieces; pieces go only on stock of their own thickness. The kerf (width of material a cut removes) is
    /// allowed for by growing every piece and every stock piece by one kerf in both directions: each piece then carries
    /// the cut on its far side, and the last piece at a stock edge needs no cut beyond it.
    /// </summary>
    public static CuttingPlan Pack(IEnumerable<CutPiece> pieces, IReadOnlyList<StockPiece> stock, double kerf)
    {
        if (!(kerf >= 0) || !double.IsFinite(kerf)) throw new ArgumentOutOfRangeException(nameof(kerf), kerf, "kerf must be zero or more millimetres.");
        var dup = stock.GroupBy(s => s.Id, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new ArgumentException($"stock id '{dup.Key}' appears twice.", nameof(stock));

        var free = new List<FreeRect>();
        for (var i = 0; i < stock.Count; i++) free.Add(new FreeRect(i, 0, 0, stock[i].Width + kerf, stock[i].Height + kerf));
        var placed = new List<PlacedPiece>();
        var unplaced = new List<CutPiece>();
        foreach (var piece in Order(pieces))
        {
            var choice = Choose(free, stock, piece, kerf);
            if (choice is null)
            {
                unplaced.Add(piece);
                continue;
            }
            var (index, turned) = choice.Value;
            var rect = free[index];
            var w = (turned ? piece.Height : piece.Width) + kerf;
            var h = (turned ? piece.Width : piece.Height) + kerf;
            placed.Add(new PlacedPiece(piece, stock[rect.Stock].Id, rect.X, rect.Y, turned));
            free.RemoveAt(index);
            Split(free, rect, w, h);
        }
        return new CuttingPlan(stock.ToValueList(), placed.ToValueList(), unplaced.ToValueList(), kerf);
    }

    // DESCA, with longer side and id as tie-breaks so the same input always packs the same way.
    private static IEnumerable<CutPiece> Order(IEnumerable<CutPiece> pieces) => pieces
        .OrderByDescending(p => p.Area)
        .ThenByDescending(p => Math.Max(p.Width, p.Height))
        .ThenBy(p => p.Id, StringComparer.Ordinal);

    // Best Area Fit within the first stock piece (in the order given) that can take the piece at all.
    private static (int Index, bool Turned)? Choose(List<FreeRect> free, IReadOnlyList<StockPiece> stock, CutPiece piece, double kerf)
    {
        for (var s = 0; s < stock.Count; s++)
        {
            if (!stock[s].IsThickness(piece.Thickness)) continue;
            (int Index, bool Turned)? best = null;
            var bestScore = double.MaxValue;
            for (var i = 0; i < free.Count; i++)
            {
                var f = free[i];
                if (f.Stock != s) continue;
                foreach (var turned in piece.Width == piece.Height ? [false] : new[] { false, true })
                {
                    var w = (turned ? piece.Height : piece.Width) + kerf;
                    var h = (turned ? piece.Width : piece.Height) + kerf;
                    if (w > f.Width + Eps || h > f.Height + Eps) continue;
                    var score = f.Area - w * h;
                    if (score < bestScore - Eps)
                    {
                        bestScore = score;
                        best = (i, turned);
                    }
                }
            }
            if (best is not null) return best;
        }
        return null;
    }

    // Jylänki's SplitFreeRectAlongAxis with the SLAS rule: the cut runs along the shorter leftover, so the larger
    // leftover stays in one piece.
    private static void Split(List<FreeRect> free, FreeRect f, double w, double h)
    {
        var leftoverW = f.Width - w;
        var leftoverH = f.Height - h;
        var horizontal = leftoverW <= leftoverH;
        var bottom = new FreeRect(f.Stock, f.X, f.Y + h, horizontal ? f.Width : w, leftoverH);
        var right = new FreeRect(f.Stock, f.X + w, f.Y, leftoverW, horizontal ? h : f.Height);
        if (bottom.Width > Eps && bottom.Height > Eps) free.Add(bottom);
        if (right.Width > Eps && right.Height > Eps) free.Add(right);
    }
}
