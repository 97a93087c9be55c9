using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>How a board is laid over template pages: one page when it fits, else a grid of tiles that overlap by at least the set amount, spread evenly.</summary>
public sealed record TilePlan(bool Landscape, int Rows, int Columns, ValueList<Tile> Tiles)
{
    public bool IsTiled => Tiles.Count > 1;

    /// <summary>The tile at a grid place.</summary>
    public Tile At(int row, int column) => Tiles[row * Columns + column];

    /// <summary>Tiles the board over windows of the given size (portrait and landscape), keeping the orientation that needs fewer pages (portrait on a tie).</summary>
    public static TilePlan For(double boardWidth, double boardHeight, Func<bool, (double Width, double Height)> window, double overlap)
    {
        var portrait = Make(false, boardWidth, boardHeight, window(false), overlap);
        var landscape = Make(true, boardWidth, boardHeight, window(true), overlap);
        return landscape.Tiles.Count < portrait.Tiles.Count ? landscape : portrait;
    }

    private static TilePlan Make(bool landscape, double boardWidth, double boardHeight, (double Width, double Height) window, double overlap)
    {
        var columns = Spans(boardWidth, window.Width, overlap);
        var rows = Spans(boardHeight, window.Height, overlap);
        var tiles = new List<Tile>();
        for (var r = 0; r < rows.Count; r++)
            for (var c = 0; c < columns.Count; c++)
                tiles.Add(new Tile(r, c, new Box(columns[c].From, rows[r].From, columns[c].To, rows[r].To)));
        return new TilePlan(landscape, rows.Count, columns.Count, tiles.ToValueList());
    }

    /// <summary>Spans of at most `window` covering 0..length, neighbours overlapping by at least `overlap`, spread evenly.</summary>
    internal static IReadOnlyList<(double From, double To)> Spans(double length, double window, double overlap)
    {
        if (window <= overlap) throw new ArgumentException($"the page leaves {window:0.#} mm for the board, not more than the {overlap:0.#} mm overlap; use larger paper.");
        if (length <= window + 1e-9) return [(0, length)];
        var count = (int)Math.Ceiling((length - window) / (window - overlap) - 1e-9) + 1;
        var step = (length - window) / (count - 1);
        return Enumerable.Range(0, count).Select(i => (i * step, i * step + window)).ToList();
    }
}
