using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>Edge-to-edge distance between two copper islands in plan view (0 when they touch or overlap).</summary>
public static class IslandGap
{
    public static double Between(Island a, Island b)
    {
        if (a.Shape == IslandShape.Round && b.Shape == IslandShape.Round)
            return Math.Max(0, a.Center.DistanceTo(b.Center) - a.Width / 2 - b.Width / 2);
        if (a.Shape == IslandShape.Round) return RoundToRect(a, b);
        if (b.Shape == IslandShape.Round) return RoundToRect(b, a);
        var dx = Math.Max(0, Math.Max(a.Left - b.Right, b.Left - a.Right));
        var dy = Math.Max(0, Math.Max(a.Top - b.Bottom, b.Top - a.Bottom));
        return Math.Sqrt(dx * dx + dy * dy);
    }

    private static double RoundToRect(Island round, Island rect)
    {
        var nearest = new Point(Math.Clamp(round.Center.X, rect.Left, rect.Right), Math.Clamp(round.Center.Y, rect.Top, rect.Bottom));
        return Math.Max(0, round.Center.DistanceTo(nearest) - round.Width / 2);
    }
}
