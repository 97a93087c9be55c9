using PadPlan.Model;

namespace PadPlan.Rules.Shapes;

/// <summary>The board outline (a rectangle with optionally rounded corners) and the usable area inside its margin.</summary>
public sealed record BoardArea(double Width, double Height, double CornerRadius, double Margin)
{
    public static BoardArea Of(Board board) => board.IsAuto
        ? throw new InvalidOperationException("an automatic-size board has no outline yet; place the plan first.")
        : new BoardArea(board.Width!.Value, board.Height!.Value, board.CornerRadius, board.Margin);

    /// <summary>How far (mm) a disc of the given radius around the point reaches past the usable area; zero or less when it fits.</summary>
    public double Overhang(Point p, double radius = 0)
    {
        var inset = Margin + radius;
        var corner = Math.Max(CornerRadius - inset, 0);
        var x0 = inset + corner;
        var x1 = Width - inset - corner;
        var y0 = inset + corner;
        var y1 = Height - inset - corner;
        // Points inside the core get a negative overhang of at least -corner; the exact depth is not needed.
        var q = new Point(Math.Clamp(p.X, Math.Min(x0, x1), Math.Max(x0, x1)), Math.Clamp(p.Y, Math.Min(y0, y1), Math.Max(y0, y1)));
        var outside = p.DistanceTo(q) - corner;
        return x0 > x1 || y0 > y1 ? Math.Max(outside, 0.0001) : outside;
    }

    /// <summary>How far an island reaches past the usable area; zero or less when it fits.</summary>
    public double Overhang(Island island) => island.Shape == IslandShape.Round
        ? Overhang(island.Center, island.Width / 2)
        : CopperGeometry.Corners(island).Max(c => Overhang(c));

    /// <summary>How far a polygon reaches past the usable area (the area is convex, so its vertices decide).</summary>
    public double Overhang(IReadOnlyList<Point> polygon) => polygon.Max(p => Overhang(p));

    /// <summary>The board edge as a polygon, clockwise as seen (y down), each rounded corner drawn with the given number of straight pieces.</summary>
    public IReadOnlyList<Point> Outline(int piecesPerCorner = 8)
    {
        if (CornerRadius <= 0) return [new(0, 0), new(Width, 0), new(Width, Height), new(0, Height)];
        var r = CornerRadius;
        var centres = new[] { new Point(Width - r, r), new Point(Width - r, Height - r), new Point(r, Height - r), new Point(r, r) };
        var points = new List<Point>();
        for (var c = 0; c < 4; c++)
        {
            // Corner c sweeps from -90 + 90c to 90c degrees (y down, so this runs clockwise on the board).
            var start = -90.0 + 90 * c;
            for (var i = 0; i <= piecesPerCorner; i++)
            {
                var a = (start + 90.0 * i / piecesPerCorner) * Math.PI / 180;
                points.Add(new Point(centres[c].X + r * Math.Cos(a), centres[c].Y + r * Math.Sin(a)));
            }
        }
        return points;
    }
}
