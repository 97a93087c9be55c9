using PadPlan.Materials;
using PadPlan.Output;
using PadPlan.Model;
using PadPlan.Output.Tables;
using PadPlan.Materials.Cutting;

namespace PadPlan.Output.Tables;

/// <summary>The cut list as report tables: round pads by punch, pieces to cut with their cuts, and the cutting plan on stock.</summary>
public static class CutListTables
{
    /// <summary>Title of the cutting-plan table; the report pages draw the plan on its stock right after it.</summary>
    public const string PlanTitle = "Cutting plan (corner of each piece from the stock's corner; Turned = lies across)";

    public static IReadOnlyList<ReportTable> From(CutList list) => [Rounds(list), Pieces(list), Plan(list)];

    public static ReportTable Rounds(CutList list) => ReportTable.Create(
        "Round pads to punch",
        ["Punch (mm)", "Board (mm)", "Count", "Pads"],
        list.Rounds.Select(g => new[] { Mm.Of(g.Diameter), Mm.Of(g.Thickness), g.Count.ToString(), string.Join(" ", g.Pads.Order(NaturalOrder.Comparer)) }),
        [$"{list.Rounds.Sum(g => g.Count)} round pads in all. Punch each disc from a punching strip (see the pieces below), copper side up."]);

    public static ReportTable Pieces(CutList list) => ReportTable.Create(
        "Rectangles and strips to cut",
        ["Piece", "Kind", "Board (mm)", "Length x width (mm)", "Cuts", "Gives"],
        list.AllPieces.Select(p => new[] { p.Id, KindName(p.Kind), Mm.Of(p.Thickness), Mm.Size(p.Width, p.Height), Cuts(p), string.Join(" ", p.Pads.Order(NaturalOrder.Comparer)) }),
        [
            "Positions are millimetres from the start end of the piece (the left end, or the top end of a vertical strip on the board).",
            $"Copper-clad needed: {Mm.Area(list.StockAreaNeeded)} before kerf, {Mm.Area(list.StockAreaWithKerf)} at most with a {Mm.Of(list.Plan.Kerf)} mm kerf; pad copper on the board: {Mm.Area(list.PadCopperArea)}.",
        ]);

    public static ReportTable Plan(CutList list)
    {
        var plan = list.Plan;
        var rows = plan.Stock.SelectMany(s => plan.On(s)
            .OrderBy(p => p.Y).ThenBy(p => p.X)
            .Select(p => new[] { s.Id, p.Piece.Id, $"{Mm.Of(p.X)}, {Mm.Of(p.Y)}", Mm.Size(p.Width, p.Height), p.Turned ? "yes" : "" }));
        var notes = new List<string>();
        foreach (var s in plan.Stock)
        {
            var count = plan.On(s).Count();
            notes.Add(count == 0
                ? $"{s.Id} ({Mm.Size(s.Width, s.Height)} mm, {Mm.Of(s.Thickness)} mm board): not needed."
                : $"{s.Id} ({Mm.Size(s.Width, s.Height)} mm, {Mm.Of(s.Thickness)} mm board): {count} pieces, {Mm.Percent(plan.UtilisationOf(s))} of it used; {ExtentText(plan, s)}");
        }
        notes.Add($"Utilisation of the stock used: {Mm.Percent(plan.Utilisation)}, with a {Mm.Of(plan.Kerf)} mm kerf allowed between pieces.");
        if (list.DefaultStock)
            notes.Add($"No stock given: one {Mm.Size(CutOptions.DefaultStockWidth, CutOptions.DefaultStockHeight)} mm offcut (a common board size) of each thickness is assumed. Give yours with --stock WxH or WxHxT.");
        foreach (var p in plan.Unplaced)
            notes.Add(plan.Stock.Any(s => s.IsThickness(p.Thickness))
                ? $"DOES NOT FIT: {p.Id} ({Mm.Size(p.Width, p.Height)} mm, {Mm.Of(p.Thickness)} mm board): the stock is too small. Add a larger piece with --stock."
                : $"DOES NOT FIT: {p.Id} needs {Mm.Of(p.Thickness)} mm board and no stock of that thickness is given. Add one with --stock WxHx{Mm.Of(p.Thickness)}.");
        notes.Add("Every cut runs straight from edge to edge of the part being cut: start with a cut right across the stock that no piece straddles, then divide each part the same way.");
        notes.Add("Caution: " + Cautions.GlassFibre);
        return ReportTable.Create(PlanTitle,
            ["Stock", "Piece", "At x, y (mm)", "Size on stock (mm)", "Turned"], rows, notes);
    }

    // Builders cut small pads from a large offcut: say how much of its corner the pieces take, so the rest stays whole.
    private static string ExtentText(CuttingPlan plan, StockPiece stock)
    {
        var (w, h) = plan.Extent(stock);
        var area = plan.On(stock).Sum(p => p.Piece.Area);
        return $"all its pieces lie in the {Mm.Size(w, h)} mm corner at 0, 0 ({Mm.Percent(area / (w * h))} of that corner used); saw that corner off first.";
    }

    private static string KindName(CutPieceKind kind) => kind switch
    {
        CutPieceKind.Rect => "rectangle",
        CutPieceKind.Strip => "scored strip",
        _ => "punching strip",
    };

    private static string Cuts(CutPiece piece) => piece.Kind switch
    {
        CutPieceKind.Strip => piece.Positions.Count == 0 ? "one segment, no score" : $"score across at {Mm.List(piece.Positions)}, each {Mm.Of(piece.ScoreWidth)} mm wide",
        CutPieceKind.PunchStrip => $"punch at {Mm.List(piece.Positions)}",
        _ => "",
    };
}
