using System.Globalization;
using PadPlan.Model;
using PadPlan.Output.Drawing;

namespace PadPlan.Output.Sheets;

/// <summary>
/// The parts table beside the assembly view, keyed by reference: the key number a part carries on the view when its
/// reference found no room there, its value, and which way round it goes (pin 1, polarity, pin order). Flows down
/// as many columns as the page gives it, the header repeated at the top of each.
/// </summary>
internal sealed record PartsKey(ValueList<PartsKey.Row> Rows, double KeyWidth, double RefWidth, double ValueWidth, double NoteWidth)
{
    /// <summary>One part: its key number on the view ("" when the view prints the reference), reference, value and note.</summary>
    internal sealed record Row(string Key, string Ref, string Value, string Note);

    public const double Size = 1.8;
    public const double RowHeight = 2.5;
    private const double CellGap = 1.2;
    private const double TitleHeight = 4.2;
    private const double MaxValue = 32;
    private const double MaxNote = 30;

    public double ColumnWidth => KeyWidth + RefWidth + ValueWidth + NoteWidth + 3 * CellGap;
    public int Keyed => Rows.Count(r => r.Key.Length > 0);

    /// <summary>Rows a column of this height holds below its title and header.</summary>
    public int RowsIn(double height) => Math.Max(0, (int)Math.Floor((height - TitleHeight - RowHeight + 1e-9) / RowHeight));
    public double RowsHeight(int rows) => TitleHeight + (rows + 1) * RowHeight;

    public static PartsKey Of(Project project)
    {
        var rows = TemplateSheet.PlacedParts(project)
            .OrderBy(p => p.Part.Ref, NaturalOrder.Comparer)
            .Select(p => new Row("", p.Part.Ref, p.Part.Value, Note(p.Part, p.Footprint, p.Placement)))
            .ToValueList();
        double Widest(IEnumerable<string> cells, string header, FontWeight weight = FontWeight.Regular) =>
            Math.Max(TextMetrics.Width(header, Size, FontWeight.Bold), cells.Select(c => TextMetrics.Width(c, Size, weight)).DefaultIfEmpty(0).Max()) + 0.2;
        var keyWidth = Widest([BoardScene.KeyPrefix + rows.Count.ToString(CultureInfo.InvariantCulture)], "#", FontWeight.Bold);
        var refWidth = Widest(rows.Select(r => r.Ref), "Part", FontWeight.Bold);
        var valueWidth = Math.Min(MaxValue, Widest(rows.Select(r => r.Value), "Value"));
        var noteWidth = Math.Min(MaxNote, Widest(rows.Select(r => r.Note), "Which way round"));
        return new PartsKey(rows, keyWidth, refWidth, valueWidth, noteWidth);
    }

    /// <summary>The same table with the key numbers the view gave out.</summary>
    public PartsKey WithKeys(BoardScene scene)
    {
        var keys = scene.Labels.Where(l => l.Role == LabelRole.PartKey).ToDictionary(l => l.TargetId, l => l.Text);
        return this with { Rows = Rows.Select(r => keys.TryGetValue(r.Ref, out var k) ? r with { Key = k } : r).ToValueList() };
    }

    /// <summary>
    /// Which way round a part goes, from its footprint's marks and pin names: the cathode band, the pin-1 notch or dot,
    /// the winding-start dots, where the + or anode lead lands, and the pin order of a part with three or more leads.
    /// </summary>
    internal static string Note(Part part, Footprint footprint, Placement placement)
    {
        var notes = new List<string>();
        var pins = footprint.PinNames(part.Variant);
        string Lands(string pin) => placement.Leads.FirstOrDefault(l => string.Equals(l.Pin, pin, StringComparison.OrdinalIgnoreCase)) is { } l
            ? (l.Pad ?? "plane") : "?";
        foreach (var mark in footprint.Marks)
        {
            var pin = pins[Math.Max(0, footprint.Leads.ToList().FindIndex(l => string.Equals(l.Name, mark.Lead, StringComparison.Ordinal)))];
            notes.Add(mark.Kind switch
            {
                MarkKind.Band => $"band = {PinMarks.Display(pin)} end, on {Lands(pin)}",
                MarkKind.Plus => $"+ on {Lands(pin)}",
                MarkKind.Notch or MarkKind.Dot => "notch/dot = pin 1",
                MarkKind.Winding => $"dot = start of {PinMarks.Display(pin)}",
                _ => "",
            });
        }
        if (footprint.Marks.Count == 0 && footprint.Leads.Count == 2 && pins.Any(p => !p.All(char.IsAsciiDigit)))
            notes.Add($"{PinMarks.Display(pins[0])} on {Lands(pins[0])}");
        if (footprint.Leads.Count >= 3 && footprint.Leads.Count <= 4 && footprint.Marks.Count == 0)
            notes.Add("pins " + string.Join(" ", pins.Select(PinMarks.Display)));
        return string.Join("; ", notes.Where(n => n.Length > 0).Distinct());
    }

    /// <summary>Draws the table down the given columns, a title over the first.</summary>
    public static void Draw(PageBuilder page, PartsKey key, IReadOnlyList<Box> slots)
    {
        var row = 0;
        for (var c = 0; c < slots.Count && row < key.Rows.Count; c++)
        {
            var slot = slots[c];
            var y = slot.Top;
            page.Text(c == 0 ? "Parts" : "Parts (continued)", new Point(slot.Left, y + 3), SheetStyle.TextNormal, weight: FontWeight.Bold).Tag(ShapeTag.Label());
            y += TitleHeight;
            key.DrawRow(page, slot.Left, y, new Row("#", "Part", "Value", "Which way round"), FontWeight.Bold);
            page.Line(new Point(slot.Left, y + RowHeight - 0.2), new Point(slot.Left + key.ColumnWidth, y + RowHeight - 0.2), SheetStyle.Rule);
            y += RowHeight;
            for (var n = key.RowsIn(slot.Height); n > 0 && row < key.Rows.Count; n--, row++, y += RowHeight)
                key.DrawRow(page, slot.Left, y, key.Rows[row], FontWeight.Regular);
        }
    }

    private void DrawRow(PageBuilder page, double left, double top, Row row, FontWeight weight)
    {
        var baseline = top + Size * 0.95;
        var x = left;
        foreach (var (text, width, bold) in new[] { (row.Key, KeyWidth, true), (row.Ref, RefWidth, true), (row.Value, ValueWidth, false), (row.Note, NoteWidth, false) })
        {
            var w = bold || weight == FontWeight.Bold ? FontWeight.Bold : FontWeight.Regular;
            if (text.Length > 0) page.Text(TextMetrics.Fit(text, Size, width, w), new Point(x, baseline), Size, weight: w).Tag(ShapeTag.Label());
            x += width + CellGap;
        }
    }
}
