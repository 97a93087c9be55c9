using PadPlan.Model;

namespace PadPlan.Materials.Cutting;

/// <summary>Turns a layout's pads into a cut list and a cutting plan on the builder's stock.</summary>
public static class CutListBuilder
{
    public static CutList Build(Layout layout, CutOptions options)
    {
        var rounds = layout.Pads.OfType<RoundPad>()
            .GroupBy(p => (Diameter: Math.Round(p.Diameter, 2), Thickness: Math.Round(p.StockThickness, 2)))
            .OrderBy(g => g.Key.Thickness).ThenBy(g => g.Key.Diameter)
            .Select(g => new PunchGroup(g.Key.Diameter, g.Key.Thickness, g.Select(p => p.Id).Order(StringComparer.Ordinal).ToValueList()))
            .ToValueList();
        var pieces = layout.Pads.Select(PieceOf).OfType<CutPiece>().ToValueList();
        var thicknesses = rounds.Select(r => r.Thickness).Concat(pieces.Select(p => p.Thickness)).Distinct().Order().ToList();
        var defaulted = options.Stock.Count == 0;
        var stock = defaulted
            ? thicknesses.Select((t, i) => new StockPiece($"S{i + 1}", CutOptions.DefaultStockWidth, CutOptions.DefaultStockHeight, t)).ToValueList()
            : options.Stock;
        var punchStrips = rounds.SelectMany(g => PunchStrips(g, stock, options.PunchMargin)).ToValueList();
        var plan = GuillotinePacker.Pack(pieces.Concat(punchStrips), stock, options.Kerf);
        var copper = layout.Islands().Sum(i => i.Area);
        return new CutList(rounds, pieces, punchStrips, plan, copper, defaulted);
    }

    /// <summary>A rectangle or scored strip as a piece, its length along X; null for round pads (they are punched).</summary>
    public static CutPiece? PieceOf(Pad pad) => pad switch
    {
        RectPad r => new CutPiece(r.Id, CutPieceKind.Rect, r.Width, r.Height, r.StockThickness, ValueList.Of(r.Id)),
        StripPad s => new CutPiece(s.Id, CutPieceKind.Strip, s.Length, s.Width, s.StockThickness,
            s.Segments.Select(x => x.Id).ToValueList(), ScorePositions(s), s.ScoreWidth),
        _ => null,
    };

    /// <summary>Score centres from the strip's start end (mm): one between each pair of segments.</summary>
    public static ValueList<double> ScorePositions(StripPad strip)
    {
        var positions = new List<double>();
        var along = 0.0;
        for (var i = 0; i < strip.Segments.Count - 1; i++)
        {
            along += strip.Segments[i].Length;
            positions.Add(along);
        }
        return positions.ToValueList();
    }

    /// <summary>
    /// Strips to punch one group's discs from: width d + margin, one disc every d + margin along, as many discs per
    /// strip as the longest stock side of that thickness holds (at least one, so a too-small stock shows as unplaced).
    /// </summary>
    public static IEnumerable<CutPiece> PunchStrips(PunchGroup group, IReadOnlyList<StockPiece> stock, double margin)
    {
        var pitch = group.Diameter + margin;
        var longest = stock.Where(s => s.IsThickness(group.Thickness)).Select(s => Math.Max(s.Width, s.Height)).DefaultIfEmpty(0).Max();
        var perStrip = Math.Max(1, (int)Math.Floor(longest / pitch + 1e-9));
        var chunks = group.Pads.Chunk(perStrip).ToList();
        for (var i = 0; i < chunks.Count; i++)
        {
            var pads = chunks[i];
            var id = FormattableString.Invariant($"D{group.Diameter:0.##}/{group.Thickness:0.##}-{i + 1}");
            var centres = Enumerable.Range(0, pads.Length).Select(k => pitch * (k + 0.5)).ToValueList();
            yield return new CutPiece(id, CutPieceKind.PunchStrip, pitch * pads.Length, pitch, group.Thickness, pads.ToValueList(), centres);
        }
    }
}
