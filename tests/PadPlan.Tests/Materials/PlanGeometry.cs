using PadPlan.Materials.Cutting;

namespace PadPlan.Tests.Materials;

/// <summary>Independent geometric checks of a cutting plan: inside the stock, kerf apart, and cuttable by straight through-cuts.</summary>
public static class PlanGeometry
{
    private const double Tol = 1e-6;

    /// <summary>The first thing wrong with the plan, or null when it is sound.</summary>
    public static string? Problem(CuttingPlan plan)
    {
        foreach (var p in plan.Placed)
        {
            var stock = plan.Stock.Single(s => s.Id == p.StockId);
            if (p.X < -Tol || p.Y < -Tol || p.Right > stock.Width + Tol || p.Bottom > stock.Height + Tol)
                return $"{p.Piece.Id} at ({p.X}, {p.Y}) size {p.Width} x {p.Height} leaves stock {stock.Id} ({stock.Width} x {stock.Height})";
            if (!stock.IsThickness(p.Piece.Thickness)) return $"{p.Piece.Id} is {p.Piece.Thickness} mm but stock {stock.Id} is {stock.Thickness} mm";
        }
        foreach (var group in plan.Placed.GroupBy(p => p.StockId))
        {
            var list = group.ToList();
            for (var i = 0; i < list.Count; i++)
                for (var j = i + 1; j < list.Count; j++)
                {
                    var a = list[i];
                    var b = list[j];
                    // Apart means a gap of at least one kerf along x or along y.
                    var apartX = a.Right + plan.Kerf <= b.X + Tol || b.Right + plan.Kerf <= a.X + Tol;
                    var apartY = a.Bottom + plan.Kerf <= b.Y + Tol || b.Bottom + plan.Kerf <= a.Y + Tol;
                    if (!apartX && !apartY) return $"{a.Piece.Id} and {b.Piece.Id} overlap or lie closer than the kerf on stock {group.Key}";
                }
            if (!Guillotine(list, plan.Kerf)) return $"the pieces on stock {group.Key} cannot be cut with straight through-cuts";
        }
        return null;
    }

    /// <summary>Whether the pieces can be separated by a sequence of straight cuts running right across each part of the board.</summary>
    public static bool Guillotine(IReadOnlyList<PlacedPiece> pieces, double kerf)
    {
        if (pieces.Count <= 1) return true;
        foreach (var vertical in new[] { true, false })
            foreach (var cut in pieces.Select(p => (vertical ? p.Right : p.Bottom) + kerf / 2))
            {
                var before = pieces.Where(p => (vertical ? p.Right : p.Bottom) <= cut + Tol).ToList();
                var after = pieces.Where(p => (vertical ? p.X : p.Y) >= cut - Tol).ToList();
                if (before.Count == 0 || after.Count == 0 || before.Count + after.Count != pieces.Count) continue;
                return Guillotine(before, kerf) && Guillotine(after, kerf);
            }
        return false;
    }
}
